package org.resonancegate.spec;

import java.util.List;
import java.util.Optional;

/**
 * The outcome of reading one spec file: either a {@link Spec} and no diagnostics, or no spec and
 * at least one diagnostic. {@code id} is known whenever the file got far enough to say it.
 */
public record LoadedSpec(String file, Optional<String> id, Optional<Spec> spec, List<Diagnostic> diagnostics) {

    public LoadedSpec {
        diagnostics = List.copyOf(diagnostics);
        if (spec.isPresent() == !diagnostics.isEmpty()) {
            throw new IllegalArgumentException("a loaded spec has either a spec or diagnostics, not both or neither");
        }
    }
}
