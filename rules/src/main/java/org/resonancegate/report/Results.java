package org.resonancegate.report;

import java.util.List;
import java.util.Optional;

/**
 * The record of one run: every spec, ordered by file path, and, when the run was compared with a
 * Git baseline, that comparison. Every report is drawn from this.
 */
public record Results(List<SpecResult> specs, Optional<Comparison> baseline) {

    public Results {
        specs = List.copyOf(specs);
    }

    public Results(List<SpecResult> specs) {
        this(specs, Optional.empty());
    }

    /** The same run with a comparison attached. */
    public Results withBaseline(Comparison comparison) {
        return new Results(specs, Optional.of(comparison));
    }
}
