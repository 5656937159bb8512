package org.resonancegate.report;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.resonancegate.spec.SourceLocation;

/**
 * One thing a reviewer must look at: a criterion that is not a plain pass, or a diagnostic. The
 * short reports (Markdown, SARIF) list these; passing criteria are only counted.
 *
 * @param status   {@code fail}, {@code warning}, {@code waived} or {@code error} (a diagnostic)
 * @param check    the criterion, absent for a diagnostic
 */
record ReportRow(SpecResult spec, String status, Optional<CheckResult> check, SourceLocation location,
                 String message) {

    /** The spec's id, or its file when it could not be read far enough to have one. */
    String specName() {
        return spec.id().orElse(spec.file());
    }

    /**
     * The spec file, when the location is elsewhere (a criterion from a shared profile): the file
     * a reviewer opens next to the line.
     */
    Optional<String> judgedFile() {
        return location.file().equals(spec.file()) ? Optional.empty() : Optional.of(spec.file());
    }

    /** Every row of a run, in spec order; within a spec diagnostics first, then criteria in their order. */
    static List<ReportRow> of(Results results) {
        List<ReportRow> rows = new ArrayList<>();
        for (SpecResult spec : results.specs()) {
            for (ErrorEntry error : spec.errors()) {
                rows.add(new ReportRow(spec, "error", Optional.empty(), error.location(), error.message()));
            }
            for (CheckResult check : spec.checks()) {
                if (check.status() != CheckStatus.PASS) {
                    rows.add(new ReportRow(spec, check.status().key(), Optional.of(check), check.location(),
                            check.message()));
                }
            }
        }
        return List.copyOf(rows);
    }

    /** The same rows, the most serious first (error, fail, warning, waived), keeping spec order within each. */
    static List<ReportRow> bySeriousness(Results results) {
        List<String> order = List.of("error", "fail", "warning", "waived");
        return of(results).stream().sorted(Comparator.comparingInt(r -> order.indexOf(r.status()))).toList();
    }
}
