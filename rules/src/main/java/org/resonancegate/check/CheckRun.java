package org.resonancegate.check;

import org.resonancegate.report.Results;
import org.resonancegate.spec.SpecLoader;

/** The engine's entry point for a front end: read the spec files, judge each, return the results. */
public final class CheckRun {

    private CheckRun() {
    }

    /** Reads {@code request.specFiles()} with the spec reader and judges them on the request clock's local date. */
    public static Results run(CheckRequest request) {
        return CheckRunner.run(request, SpecLoader::load);
    }
}
