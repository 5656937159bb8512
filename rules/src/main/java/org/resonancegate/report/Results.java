package org.resonancegate.report;

import java.util.List;

/** The record of one run: every spec, ordered by file path. Every report is drawn from this. */
public record Results(List<SpecResult> specs) {

    public Results {
        specs = List.copyOf(specs);
    }
}
