package org.resonancegate.maven;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.resonancegate.report.Results;
import org.resonancegate.report.SpecResult;
import org.resonancegate.report.SpecStatus;

/**
 * What a run means for the build, worked out in one place for every goal; each goal then decides
 * whether it fails the build on it ({@code check}) or only says so ({@code report}).
 *
 * @param nothingChecked why nothing was checked (no spec directory, no file matching, only
 *                       profiles), or empty when at least one spec was read
 * @param violations     what would break the build ("1 spec failed, 2 specs have errors"), or empty
 */
record Verdict(Optional<String> nothingChecked, Optional<String> violations) {

    /** @param nothing why nothing was checked, or {@code ""} */
    static Verdict of(Results results, String nothing) {
        long failed = results.specs().stream().map(SpecResult::status).filter(s -> s == SpecStatus.FAIL).count();
        long broken = results.specs().stream().map(SpecResult::status).filter(s -> s == SpecStatus.ERROR).count();
        List<String> parts = new ArrayList<>();
        if (failed > 0) {
            parts.add(failed + (failed == 1 ? " spec failed" : " specs failed"));
        }
        if (broken > 0) {
            parts.add(broken + (broken == 1 ? " spec has errors" : " specs have errors"));
        }
        return new Verdict(nothing.isEmpty() ? Optional.empty() : Optional.of(nothing),
                parts.isEmpty() ? Optional.empty() : Optional.of(String.join(", ", parts)));
    }
}
