package org.resonancegate.report;

import java.util.List;
import java.util.Optional;

/** Everything known about one spec file after a run. */
public record SpecResult(String file, Optional<String> id, SpecStatus status, List<ModeResult> modes,
                         List<CheckResult> checks, List<ErrorEntry> errors, SpecDetails details) {

    public SpecResult {
        modes = List.copyOf(modes);
        checks = List.copyOf(checks);
        errors = List.copyOf(errors);
    }

    /** A result without details: a spec that could not be read or solved, or a hand-made one. */
    public SpecResult(String file, Optional<String> id, SpecStatus status, List<ModeResult> modes,
                      List<CheckResult> checks, List<ErrorEntry> errors) {
        this(file, id, status, modes, checks, errors, SpecDetails.NONE);
    }
}
