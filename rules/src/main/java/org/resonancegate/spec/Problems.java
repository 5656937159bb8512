package org.resonancegate.spec;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/** Collects the diagnostics of one file (and the profiles it reaches), so all are reported at once. */
final class Problems {

    /**
     * A key typed wrong is both unknown and, when it stood for a required key, that key is
     * missing: one slip, two lines. The missing-key line is left out when an unknown key in the
     * same object is taken for it ("did you mean"), since that line already names the fix.
     */
    private record Explained(SourceLocation object, String key) {
    }

    private final List<Diagnostic> diagnostics = new ArrayList<>();
    private final Map<Diagnostic, Explained> missing = new HashMap<>();
    private final Set<Explained> guessed = new HashSet<>();

    void add(SourceLocation at, String message) {
        diagnostics.add(new Diagnostic(at, message));
    }

    /** A required key not in the object at {@code object}. */
    void missingKey(SourceLocation object, String key, String message) {
        Diagnostic d = new Diagnostic(object, message);
        diagnostics.add(d);
        missing.put(d, new Explained(object, key));
    }

    /** An unknown key in the object at {@code object}, taken for {@code suggestion} when there is one. */
    void unknownKey(SourceLocation at, SourceLocation object, Optional<String> suggestion, String message) {
        diagnostics.add(new Diagnostic(at, message));
        suggestion.ifPresent(s -> guessed.add(new Explained(object, s)));
    }

    void addAll(List<Diagnostic> more) {
        diagnostics.addAll(more);
    }

    boolean isEmpty() {
        return diagnostics.isEmpty();
    }

    int count() {
        return diagnostics.size();
    }

    List<Diagnostic> all() {
        if (missing.isEmpty() || guessed.isEmpty()) {
            return List.copyOf(diagnostics);
        }
        List<Diagnostic> out = new ArrayList<>();
        for (Diagnostic d : diagnostics) {
            Explained e = missing.get(d);
            if (e == null || !guessed.contains(e)) {
                out.add(d);
            }
        }
        return List.copyOf(out);
    }
}
