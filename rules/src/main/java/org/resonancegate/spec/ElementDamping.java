package org.resonancegate.spec;

/**
 * Damping carried by one spring or mount instead of the model: a viscous dashpot in parallel
 * (N·s/m, or N·m·s/rad in torsion), or hysteretic, the stiffness becoming k·(1 + iη). A spring
 * along a line uses the x value; all three are equal there.
 */
public sealed interface ElementDamping {

    AxisValues values();

    record Viscous(AxisValues values) implements ElementDamping {
    }

    record Hysteretic(AxisValues values) implements ElementDamping {
    }
}
