package org.resonancegate.report;

import java.util.List;
import java.util.Optional;

/**
 * What a reader's report shows of a spec beyond its verdict: who it is, what went in, and the data
 * of its plots, all worked out during the check so no report recomputes anything. Empty for a spec
 * that could not be read or solved.
 */
public record SpecDetails(Optional<String> title, Optional<String> revision, List<InputValue> inputs,
                          Optional<Interference> interference, List<ResponseCurve> curves) {

    public static final SpecDetails NONE = new SpecDetails(Optional.empty(), Optional.empty(), List.of(),
            Optional.empty(), List.of());

    public SpecDetails {
        inputs = List.copyOf(inputs);
        curves = List.copyOf(curves);
    }
}
