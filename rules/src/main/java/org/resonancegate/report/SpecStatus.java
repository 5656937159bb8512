package org.resonancegate.report;

/** A spec's overall verdict, in order of precedence: error, fail, waived, pass. */
public enum SpecStatus {
    PASS("pass"), FAIL("fail"), WAIVED("waived"), ERROR("error");

    private final String key;

    SpecStatus(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }
}
