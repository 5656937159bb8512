package org.resonancegate.spec;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The reader never throws and never reaches its internal-error fallback, whatever the damage:
 * every one-character deletion and every stray quote in the valid spec either still reads or
 * gives diagnostics inside the file.
 */
class DamagedInputTest {

    @TempDir
    Path base;

    @Test
    void everySingleCharacterDamageGivesASpecOrDiagnosticsNeverAnInternalError() {
        TestProject project = new TestProject(base);
        String valid = TestProject.VALID;
        int rejected = 0;
        for (int i = 0; i < valid.length(); i++) {
            for (String damaged : List.of(valid.substring(0, i) + valid.substring(i + 1),
                    valid.substring(0, i) + "\"" + valid.substring(i),
                    valid.substring(0, i) + "0" + valid.substring(i))) {
                LoadedSpec loaded = project.loadOne("p.json", damaged);
                for (Diagnostic d : loaded.diagnostics()) {
                    assertFalse(d.message().contains("internal error"), () -> d.message() + "\n" + damaged);
                    assertTrue(d.location().line() >= 1 && d.location().column() >= 1, d::toString);
                    assertTrue(d.location().file().equals("p.json"), d::toString);
                }
                if (loaded.spec().isEmpty()) {
                    rejected++;
                }
            }
        }
        // Most damage must be caught (a deleted space or a digit added to a number is harmless).
        assertTrue(rejected > valid.length(), "only " + rejected + " damaged files were refused");
    }
}
