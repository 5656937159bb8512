package org.resonancegate.report;

import java.util.List;
import java.util.Optional;

/** Everything known about one spec file after a run. */
public record SpecResult(String file, Optional<String> id, SpecStatus status, List<ModeResult> modes,
                         List<CheckResult> checks, List<ErrorEntry> errors) {

    public SpecResult {
        modes = List.copyOf(modes);
        checks = List.copyOf(checks);
        errors = List.copyOf(errors);
    }
}
