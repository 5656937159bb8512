package org.resonancegate.dynamics;

/** Standard gravity gn (CGPM 1901, exact by definition); gravity in every static solve. */
public final class StandardGravity {

    /** gn in m/s². */
    public static final double GN = 9.80665;

    private StandardGravity() {
    }
}
