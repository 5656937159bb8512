package org.resonancegate.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

/** A throwaway project directory for tests: write spec files into it, load them, look at the outcome. */
final class TestProject {

    /** A valid single-mass spec; tests replace pieces of it to make it wrong. */
    static final String VALID = """
            {
              "format": "resonance-gate/1",
              "id": "CHW-P-02",
              "model": {"kind": "single", "mass": "1850 kg", "stiffness": "2.4 MN/m", "damping": {"ratio": 0.05}},
              "operation": {"speed": {"min": "900 rpm", "max": "1480 rpm"}},
              "excitations": [{"name": "impeller", "kind": "unbalance", "unbalance": "120 g·mm"}],
              "criteria": [{"id": "SEP", "rule": "separation", "margin": "20 %"}]
            }
            """;

    final Path base;
    private final List<Path> written = new ArrayList<>();

    TestProject(Path base) {
        this.base = base;
    }

    Path write(String relative, String content) {
        return writeBytes(relative, content.getBytes(StandardCharsets.UTF_8));
    }

    Path writeBytes(String relative, byte[] content) {
        try {
            Path file = base.resolve(relative);
            Files.createDirectories(file.getParent());
            Files.write(file, content);
            written.add(file);
            return file;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    List<LoadedSpec> loadAll() {
        return SpecLoader.load(base, written);
    }

    /** Writes one spec and loads that file alone, returning its outcome. */
    LoadedSpec loadOne(String relative, String content) {
        Path file = write(relative, content);
        List<LoadedSpec> all = SpecLoader.load(base, List.of(file));
        assertEquals(1, all.size(), () -> "expected one outcome, got " + all);
        return all.get(0);
    }

    /**
     * Where {@code snippet} first occurs in {@code text}, counted here by hand (lines split at
     * line feeds, columns in characters from 1) so tests do not rely on the reader's own counting.
     */
    static SourceLocation at(String file, String text, String snippet) {
        int index = text.indexOf(snippet);
        if (index < 0) {
            throw new IllegalArgumentException("snippet not in text: " + snippet);
        }
        int line = 1;
        int lineStart = 0;
        for (int i = 0; i < index; i++) {
            if (text.charAt(i) == '\n') {
                line++;
                lineStart = i + 1;
            }
        }
        return new SourceLocation(file, line, index - lineStart + 1);
    }

    static Spec spec(LoadedSpec loaded) {
        if (loaded.spec().isEmpty()) {
            fail("expected a spec, got diagnostics:\n" + describe(loaded.diagnostics()));
        }
        return loaded.spec().get();
    }

    static String describe(List<Diagnostic> diagnostics) {
        return diagnostics.stream().map(d -> d.location().display() + ": " + d.message())
                .collect(Collectors.joining("\n"));
    }

    /**
     * Asserts that {@code loaded} has a diagnostic at line:column whose message holds every one of
     * {@code words}; returns that diagnostic.
     */
    static Diagnostic assertDiagnostic(LoadedSpec loaded, int line, int column, String... words) {
        assertTrue(loaded.spec().isEmpty(), "expected diagnostics, but the spec was accepted");
        for (Diagnostic d : loaded.diagnostics()) {
            if (d.location().line() == line && d.location().column() == column) {
                boolean all = true;
                for (String w : words) {
                    all &= d.message().contains(w);
                }
                if (all) {
                    return d;
                }
            }
        }
        fail("no diagnostic at " + line + ":" + column + " containing " + List.of(words) + "; got:\n"
                + describe(loaded.diagnostics()));
        return null;
    }

    /** As {@link #assertDiagnostic}, and it is the only one. */
    static Diagnostic assertOnlyDiagnostic(LoadedSpec loaded, int line, int column, String... words) {
        Diagnostic d = assertDiagnostic(loaded, line, column, words);
        assertEquals(1, loaded.diagnostics().size(), () -> "expected one diagnostic; got:\n" + describe(loaded.diagnostics()));
        return d;
    }
}
