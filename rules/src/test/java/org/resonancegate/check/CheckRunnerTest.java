package org.resonancegate.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.resonancegate.fixtures.Specs.range;
import static org.resonancegate.fixtures.Specs.separation;
import static org.resonancegate.fixtures.Specs.single;
import static org.resonancegate.fixtures.Specs.unbalance;
import static org.resonancegate.fixtures.Specs.waiver;

import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneId;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.resonancegate.report.CheckStatus;
import org.resonancegate.report.Results;
import org.resonancegate.report.SpecStatus;
import org.resonancegate.spec.Diagnostic;
import org.resonancegate.spec.LoadedSpec;
import org.resonancegate.spec.SourceLocation;
import org.resonancegate.spec.Spec;
import org.resonancegate.spec.Tolerances;

/** The run over loaded specs, with a stand-in reader. */
class CheckRunnerTest {

    private static Spec named(String file, LocalDate waiverExpires) {
        Spec s = org.resonancegate.fixtures.Specs.spec(single(1850, 2.4e6, 0.05), range(300, 1500),
                List.of(unbalance("impeller", 1, 500)), List.of(separation("SEP", 0.2)), Tolerances.none(),
                List.of(waiver("SEP", waiverExpires)));
        return new Spec(file, s.id(), s.title(), s.revision(), s.model(), s.operation(), s.excitations(),
                s.criteria(), s.tolerances(), s.waivers());
    }

    @Test
    void brokenSpecsAreErrorsAndResultsAreSortedByFile() {
        SourceLocation where = new SourceLocation("src/vibration/a-broken.json", 12, 5);
        LoadedSpec broken = new LoadedSpec("src/vibration/a-broken.json", Optional.of("HDC-AHU-3"), Optional.empty(),
                List.of(new Diagnostic(where, "\"mass\": \"5 N/m\" has the wrong dimension; write a mass such as \"1850 kg\"")));
        LoadedSpec good = new LoadedSpec("src/vibration/z-pump.json", Optional.of("HDC-P-01"),
                Optional.of(named("src/vibration/z-pump.json", LocalDate.of(2027, 3, 31))), List.of());
        LoadedSpec other = new LoadedSpec("src/vibration/m-fan.json", Optional.of("HDC-P-01"),
                Optional.of(named("src/vibration/m-fan.json", LocalDate.of(2026, 1, 31))), List.of());
        // The build's clock: its local date, 2027-03-31, is the last day of one waiver.
        Clock clock = Clock.fixed(Instant.parse("2027-03-31T10:00:00Z"), ZoneId.of("Europe/Lisbon"));
        SpecSource source = (base, files) -> List.of(good, broken, other);
        Results results = CheckRunner.run(new CheckRequest(Path.of("."), List.of(), clock), source);
        assertEquals(List.of("src/vibration/a-broken.json", "src/vibration/m-fan.json", "src/vibration/z-pump.json"),
                results.specs().stream().map(s -> s.file()).toList());
        var b = results.specs().get(0);
        assertEquals(SpecStatus.ERROR, b.status());
        assertTrue(b.modes().isEmpty() && b.checks().isEmpty());
        assertEquals(where, b.errors().get(0).location());
        assertEquals(Optional.of("HDC-AHU-3"), b.id());
        assertEquals(CheckStatus.FAIL, results.specs().get(1).checks().get(0).status(), "waiver expired in 2026");
        assertEquals(CheckStatus.WAIVED, results.specs().get(2).checks().get(0).status(), "valid on its last day");
    }
}
