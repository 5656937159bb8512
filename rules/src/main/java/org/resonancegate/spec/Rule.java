package org.resonancegate.spec;

/** The rules a criterion can hold a design to, with the names used in spec files. */
public enum Rule {
    SEPARATION("separation"),
    ISOLATION("isolation"),
    DISPLACEMENT("displacement"),
    VELOCITY("velocity"),
    TRANSMITTED_FORCE("transmitted-force"),
    STATIC_DEFLECTION("static-deflection");

    private final String key;

    Rule(String key) {
        this.key = key;
    }

    /** The word used in spec files and reports. */
    public String key() {
        return key;
    }
}
