package org.resonancegate.spec;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Inputs a person could plausibly type that must be refused with the right cause and fix:
 * a damping form that amounts to ζ ≥ 1, a machine that never turns, a decimal comma in a
 * percentage.
 */
class ReviewFindingsTest {

    private static final String FILE = "src/vibration/chw-p-02.json";

    @TempDir
    Path base;

    private void expectOnly(String from, String to, String snippet, String... words) {
        String text = TestProject.VALID.replace(from, to);
        LoadedSpec loaded = new TestProject(base).loadOne(FILE, text);
        SourceLocation at = TestProject.at(FILE, text, snippet);
        TestProject.assertOnlyDiagnostic(loaded, at.line(), at.column(), words);
    }

    /** Q = 1/(2ζ) (check-values 1.11): Q = 0.01 would be ζ = 50, almost surely a ratio typed as Q. */
    @Test
    void aQualityFactorOfHalfOrLessIsOverdampedAndRefused() {
        expectOnly("{\"ratio\": 0.05}", "{\"q\": 0.01}", "0.01}", "\"q\" must lie in", "overdamped", "ratio");
    }

    /** η = 2ζ (check-values 1.11): η ≥ 2 is ζ ≥ 1. */
    @Test
    void aLossFactorOfTwoOrMoreIsOverdampedAndRefused() {
        expectOnly("{\"ratio\": 0.05}", "{\"lossFactor\": 2.5}", "2.5}", "\"lossFactor\" must lie in", "overdamped");
    }

    @Test
    void aTopSpeedOfZeroIsRefused() {
        expectOnly("\"max\": \"1480 rpm\"", "\"max\": \"0 rpm\"", "\"0 rpm\"", "\"max\" must be greater than zero");
    }

    @Test
    void aFixedSpeedOfZeroIsRefused() {
        expectOnly("{\"min\": \"900 rpm\", \"max\": \"1480 rpm\"}", "\"0 rpm\"", "\"0 rpm\"",
                "\"speed\" must be greater than zero");
    }

    @Test
    void aDecimalCommaInAPercentageGetsTheHint() {
        expectOnly("\"margin\": \"20 %\"", "\"margin\": \"2,5 %\"", "\"2,5 %\"", "decimal comma", "\"2.5 %\"");
    }

    /** Said as leaving the project, not as "not found": where it points is outside our business. */
    @Test
    void aProfilePathLeavingTheProjectIsRefusedAsSuchEvenWhenNothingIsThere() {
        expectOnly("\"id\": \"CHW-P-02\",", "\"id\": \"CHW-P-02\", \"profiles\": [\"../../../nowhere.json\"],",
                "\"../../../nowhere.json\"", "lies outside the project");
    }
}
