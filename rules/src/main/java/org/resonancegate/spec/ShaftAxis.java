package org.resonancegate.spec;

/**
 * A signed shaft axis, {@code "x"} … {@code "-z"}: a rotating force turns about it by the right-hand
 * rule. For axis x the force is U·ω²·(cos ωt·e1 + sin ωt·e2) with (e1, e2) = (y, z); axis y: (z, x);
 * axis z: (x, y). A negative axis turns the other way: U·ω²·(cos ωt·e1 − sin ωt·e2).
 */
public enum ShaftAxis {
    X("x", Axis.X, 1), Y("y", Axis.Y, 1), Z("z", Axis.Z, 1),
    NEG_X("-x", Axis.X, -1), NEG_Y("-y", Axis.Y, -1), NEG_Z("-z", Axis.Z, -1);

    private final String key;
    private final Axis axis;
    private final int sign;

    ShaftAxis(String key, Axis axis, int sign) {
        this.key = key;
        this.axis = axis;
        this.sign = sign;
    }

    public String key() {
        return key;
    }

    public Axis axis() {
        return axis;
    }

    /** +1 for a positive axis, −1 for a negative one. */
    public int sign() {
        return sign;
    }

    /** e1 of the positive axis: y for x, z for y, x for z. */
    public Axis first() {
        return Axis.values()[(axis.index() + 1) % 3];
    }

    /** e2 of the positive axis: z for x, x for y, y for z. */
    public Axis second() {
        return Axis.values()[(axis.index() + 2) % 3];
    }
}
