package org.resonancegate.criteria;

/** The tie rule of the results contract: values within a relative 1e-9 of each other are equal. */
public final class Ties {

    public static final double RELATIVE = 1e-9;

    private Ties() {
    }

    public static boolean same(double a, double b) {
        return Math.abs(a - b) <= RELATIVE * Math.max(Math.abs(a), Math.abs(b));
    }
}
