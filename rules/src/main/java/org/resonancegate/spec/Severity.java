package org.resonancegate.spec;

/** How a failing criterion counts: {@code error} fails its spec, {@code warning} does not. */
public enum Severity {
    ERROR("error"),
    WARNING("warning");

    private final String key;

    Severity(String key) {
        this.key = key;
    }

    /** The word used in spec files and reports. */
    public String key() {
        return key;
    }
}
