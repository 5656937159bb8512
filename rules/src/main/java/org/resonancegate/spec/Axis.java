package org.resonancegate.spec;

/** One of the three axes of the base frame, as a criterion names it ({@code "axis": "z"}). */
public enum Axis {
    X("x"), Y("y"), Z("z");

    private final String key;

    Axis(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }

    public int index() {
        return ordinal();
    }
}
