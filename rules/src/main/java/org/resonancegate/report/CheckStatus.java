package org.resonancegate.report;

/** One criterion's verdict. {@code warning}: a failing warning-severity criterion. */
public enum CheckStatus {
    PASS("pass"), FAIL("fail"), WAIVED("waived"), WARNING("warning");

    private final String key;

    CheckStatus(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }
}
