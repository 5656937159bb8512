package org.resonancegate.spec;

/**
 * A direction written as a vector {@code {"x", "y", "z"}} of plain numbers, kept normalised to
 * unit length. The default for base motion is straight up.
 */
public record Direction(double x, double y, double z, SourceLocation location) {

    public Direction {
        double n = Math.sqrt(x * x + y * y + z * z);
        if (!(n > 0) || !Double.isFinite(n)) {
            throw new IllegalArgumentException("a direction needs a finite, non-zero length");
        }
        x /= n;
        y /= n;
        z /= n;
    }

    public static Direction up(SourceLocation location) {
        return new Direction(0, 0, 1, location);
    }

    public double[] components() {
        return new double[] {x, y, z};
    }
}
