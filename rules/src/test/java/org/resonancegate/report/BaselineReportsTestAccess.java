package org.resonancegate.report;

import java.nio.file.Path;

/** Lets the HTML tests build the same judged comparison as {@link BaselineReportsTest}. */
public final class BaselineReportsTestAccess {

    private BaselineReportsTestAccess() {
    }

    public static Results judged(Path dir) throws Exception {
        return BaselineReportsTest.judged(dir);
    }
}
