package org.resonancegate.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.resonancegate.spec.Severity;

/**
 * Console lines against the shape the build notes fix: {@code path:line:col: <spec id> <criterion>
 * <rule>: <message>} (the form IDE and CI log matchers recognise), one summary line and the caution.
 */
class ConsoleReportTest {

    private static ConsoleLine info(String text) {
        return new ConsoleLine(ConsoleLevel.INFO, text);
    }

    private static ConsoleLine error(String text) {
        return new ConsoleLine(ConsoleLevel.ERROR, text);
    }

    private static ConsoleLine warning(String text) {
        return new ConsoleLine(ConsoleLevel.WARNING, text);
    }

    @Test
    void failingCriterionAndDiagnosticAreOneLineEachWithTheirLocation() {
        assertEquals(List.of(
                info("file                   id   status  pass  fail  waived  warning  errors"),
                info("src/vibration/p1.json  P-1  fail       0     1       0        0       0"),
                info("src/vibration/p2.json  -    error      0     0       0        0       1"),
                error("src/vibration/p1.json:9:5: P-1 SEP separation: mode 1 too close to 1x"),
                error("src/vibration/p2.json:3:7: src/vibration/p2.json unknown key \"mas\"; did you mean \"mass\"?"),
                error("2 specs: 0 pass, 1 fail, 1 error; 1 criterion failed"),
                info(ConsoleReport.CAUTION)),
                ConsoleReport.lines(Fixtures.small()));
    }

    @Test
    void warningsAndWaiversAreWarningsAndExpiredWaiversSaySo() {
        CheckResult passing = Fixtures.check("ISO", "isolation", CheckStatus.PASS, "T = 0.1", 15);
        CheckResult warned = new CheckResult("SD", "static-deflection", Severity.WARNING, CheckStatus.WARNING, 0.001,
                0.002, "m", OptionalDouble.empty(), OptionalDouble.empty(), "deflection 1 mm below 2 mm",
                Fixtures.at("src/vibration/profiles/plant.json", 22, 7), Optional.empty(), Optional.empty());
        CheckResult waived = new CheckResult("SEP", "separation", Severity.ERROR, CheckStatus.WAIVED, 0.1, 0.2, "1",
                OptionalDouble.of(1480), OptionalDouble.of(24.67), "mode 1 too close to 1x; waived through 2027-03-31: start-up only",
                Fixtures.at("src/vibration/a/p1.json", 9, 5), Optional.empty(),
                Optional.of(Fixtures.waiver("start-up only", "2027-03-31", true)));
        CheckResult expired = new CheckResult("VEL", "velocity", Severity.ERROR, CheckStatus.FAIL, 0.004, 0.0028,
                "m/s", OptionalDouble.of(1480), OptionalDouble.of(24.67), "4 mm/s above 2.8 mm/s; waiver expired on 2026-11-30",
                Fixtures.at("src/vibration/p1.json", 30, 7), Optional.empty(),
                Optional.of(Fixtures.waiver("until the new mounts arrive", "2026-11-30", false)));
        SpecResult ok = new SpecResult("src/vibration/a/p1.json", Optional.of("P-1"), SpecStatus.WAIVED, List.of(),
                List.of(passing, warned, waived), List.of());
        SpecResult bad = new SpecResult("src/vibration/p1.json", Optional.of("P-3"), SpecStatus.FAIL, List.of(),
                List.of(expired), List.of());
        SpecResult fine = new SpecResult("src/vibration/z.json", Optional.of("Z"), SpecStatus.PASS, List.of(),
                List.of(passing), List.of());
        List<ConsoleLine> lines = ConsoleReport.lines(new Results(List.of(ok, bad, fine)));
        assertEquals(List.of(
                info("file                     id   status  pass  fail  waived  warning  errors"),
                info("src/vibration/a/p1.json  P-1  waived     1     0       1        1       0"),
                info("src/vibration/p1.json    P-3  fail       0     1       0        0       0"),
                info("src/vibration/z.json     Z    pass       1     0       0        0       0"),
                // a criterion from a profile: its definition, then the spec it was judged for
                warning("src/vibration/profiles/plant.json:22:7: P-1 [src/vibration/a/p1.json] SD static-deflection:"
                        + " deflection 1 mm below 2 mm"
                        + " (severity warning: does not fail the spec)"),
                // a waived failure is a warning, an expired waiver fails: each said once
                warning("src/vibration/a/p1.json:9:5: P-1 SEP separation: mode 1 too close to 1x;"
                        + " waived through 2027-03-31: start-up only"),
                error("src/vibration/p1.json:30:7: P-3 VEL velocity: 4 mm/s above 2.8 mm/s;"
                        + " waiver expired on 2026-11-30"),
                error("3 specs: 1 pass, 1 waived, 1 fail, 0 error; 1 criterion failed, 1 waived, 1 warning"),
                info(ConsoleReport.CAUTION)),
                lines);
    }

    @Test
    void allPassingEndsInAnInfoCountLine() {
        SpecResult fine = new SpecResult("src/vibration/z.json", Optional.of("Z"), SpecStatus.PASS, List.of(),
                List.of(Fixtures.check("SEP", "separation", CheckStatus.PASS, "ok", 9),
                        Fixtures.check("ISO", "isolation", CheckStatus.PASS, "ok", 12)), List.of());
        List<ConsoleLine> lines = ConsoleReport.lines(new Results(List.of(fine)));
        assertEquals(info("1 spec: 1 pass, 0 fail, 0 error; 0 criteria failed"), lines.get(lines.size() - 2));
        assertEquals(4, lines.size(), "table (2 rows), count, caution: passing criteria are not listed");
    }

    @Test
    void noSpecsSaysSoWithoutATable() {
        assertEquals(List.of(warning("0 specs: nothing checked"), info(ConsoleReport.CAUTION)),
                ConsoleReport.lines(new Results(List.of())));
    }

    @Test
    void cautionNamesWhatTheNumbersAreNot() {
        // wording fixed by the project owner's brief
        assertEquals("Caution: a screening aid on linear models. Final designs need a qualified engineer,"
                + " commissioning measurements and the applicable local codes and standards.", ConsoleReport.CAUTION);
    }

    /** A large run: the table lists the specs to look at first, and every failing criterion keeps its line. */
    @Test
    void aLargeRunListsTheUrgentSpecsAndEveryFinding() {
        List<SpecResult> specs = new ArrayList<>();
        for (int i = 0; i < 250; i++) {
            String file = String.format(Locale.ROOT, "src/vibration/s%03d.json", i);
            boolean fails = i % 50 == 7; // 5 failing specs among 245 passing ones
            CheckResult check = Fixtures.check("SEP", "separation", fails ? CheckStatus.FAIL : CheckStatus.PASS,
                    "mode 1 near 1x", 9);
            specs.add(new SpecResult(file, Optional.of("S-" + i), fails ? SpecStatus.FAIL : SpecStatus.PASS,
                    List.of(), List.of(check), List.of()));
        }
        List<ConsoleLine> lines = ConsoleReport.lines(new Results(specs));
        List<String> rows = lines.stream().map(ConsoleLine::text).filter(t -> t.startsWith("src/vibration/s")
                && !t.contains(":9:")).toList();
        assertEquals(DetailedSpecs.LIMIT, rows.size());
        // the failing specs come first, then passes in file order up to the limit
        for (int i = 0; i < 250; i += 50) {
            String failing = String.format(Locale.ROOT, "src/vibration/s%03d.json", i + 7);
            assertTrue(rows.stream().anyMatch(r -> r.startsWith(failing + " ")), failing);
        }
        assertTrue(rows.stream().noneMatch(r -> r.startsWith("src/vibration/s249.json")));
        assertTrue(lines.stream().anyMatch(l -> l.text().equals("(100 of 250 specs listed:"
                + " errors, failures, waivers and warnings first; the findings below and the count line cover every spec)")));
        // every failure still has its own located line
        assertEquals(5, lines.stream().filter(l -> l.level() == ConsoleLevel.ERROR && l.text().contains(".json:9:")).count());
        assertEquals(error("250 specs: 245 pass, 5 fail, 0 error; 5 criteria failed"), lines.get(lines.size() - 2));
    }
}
