package org.resonancegate.spec;

import java.util.ArrayList;
import java.util.List;

/** Collects the diagnostics of one file (and the profiles it reaches), so all are reported at once. */
final class Problems {

    private final List<Diagnostic> diagnostics = new ArrayList<>();

    void add(SourceLocation at, String message) {
        diagnostics.add(new Diagnostic(at, message));
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
        return List.copyOf(diagnostics);
    }
}
