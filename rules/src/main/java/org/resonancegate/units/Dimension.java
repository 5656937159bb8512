package org.resonancegate.units;

/**
 * The physical dimensions a spec value can have. Each knows its SI unit, shown in
 * {@code results.json} as the {@code unit} of a value.
 */
public enum Dimension {
    MASS("kg"),
    LENGTH("m"),
    STIFFNESS("N/m"),
    FORCE("N"),
    FREQUENCY("rad/s"),
    SPEED("rad/s"),
    VELOCITY("m/s"),
    ACCELERATION("m/s²"),
    INERTIA("kg·m²"),
    DAMPING_COEFFICIENT("N·s/m"),
    UNBALANCE("kg·m"),
    RATE("rad/s²"),
    TORSIONAL_STIFFNESS("N·m/rad"),
    TORQUE("N·m"),
    TORSIONAL_DAMPING("N·m·s/rad"),
    ANGLE("rad"),
    ANGULAR_VELOCITY("rad/s");

    private final String siUnit;

    Dimension(String siUnit) {
        this.siUnit = siUnit;
    }

    public String siUnit() {
        return siUnit;
    }
}
