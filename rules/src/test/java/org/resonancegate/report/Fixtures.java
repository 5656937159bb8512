package org.resonancegate.report;

import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.resonancegate.spec.Severity;
import org.resonancegate.spec.SourceLocation;

/**
 * Hand-built results for the report tests. The numbers are invented placeholders (these tests are
 * about the shape of the output, not the physics), written so every optional is both present and
 * empty somewhere.
 */
final class Fixtures {

    private Fixtures() {
    }

    static SourceLocation at(String file, int line, int column) {
        return new SourceLocation(file, line, column);
    }

    static CheckResult check(String criterion, String rule, CheckStatus status, String message, int line) {
        return new CheckResult(criterion, rule, Severity.ERROR, status, 0.1, 0.2, "1", OptionalDouble.of(1480),
                OptionalDouble.of(24.67), message, at("src/vibration/p1.json", line, 5), Optional.empty(),
                Optional.empty());
    }

    /** A failing spec with one mode and one failing criterion, and a spec with one diagnostic. */
    static Results small() {
        SpecResult failing = new SpecResult("src/vibration/p1.json", Optional.of("P-1"), SpecStatus.FAIL,
                List.of(new ModeResult(1, 10.07, OptionalDouble.of(0.05))),
                List.of(check("SEP", "separation", CheckStatus.FAIL, "mode 1 too close to 1x", 9)),
                List.of());
        SpecResult broken = new SpecResult("src/vibration/p2.json", Optional.empty(), SpecStatus.ERROR,
                List.of(), List.of(),
                List.of(new ErrorEntry(at("src/vibration/p2.json", 3, 7), "unknown key \"mas\"; did you mean \"mass\"?")));
        return new Results(List.of(failing, broken));
    }

    static CheckResult.WaiverNote waiver(String reason, String expires, boolean valid) {
        return new CheckResult.WaiverNote(reason, LocalDate.parse(expires), valid, at("src/vibration/p1.json", 20, 7));
    }
}
