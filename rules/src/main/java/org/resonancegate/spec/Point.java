package org.resonancegate.spec;

/** A position in the machine's base frame (right-handed, z up); each coordinate a length. */
public record Point(Quantity x, Quantity y, Quantity z, SourceLocation location) {

    /** The coordinates in metres, as {x, y, z}. */
    public double[] si() {
        return new double[] {x.si(), y.si(), z.si()};
    }
}
