package org.resonancegate.spec;

/**
 * Three values along x, y and z (a mount's stiffness, or its damping per axis). A value written
 * once for all axes is stored three times.
 */
public record AxisValues(double x, double y, double z, SourceLocation location) {

    public double get(Axis axis) {
        return switch (axis) {
            case X -> x;
            case Y -> y;
            case Z -> z;
        };
    }

    public static AxisValues all(double value, SourceLocation location) {
        return new AxisValues(value, value, value, location);
    }
}
