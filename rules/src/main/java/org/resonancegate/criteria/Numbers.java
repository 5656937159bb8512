package org.resonancegate.criteria;

/**
 * The engine's number wording for reports outside this package: the same significant-digit
 * rounding the messages use, so a value reads alike in a message and in a table.
 */
public final class Numbers {

    private Numbers() {
    }

    /** {@code x} rounded to {@code digits} significant digits, without trailing zeros, locale-free. */
    public static String sig(double x, int digits) {
        return Display.sig(x, digits);
    }
}
