package org.resonancegate.check;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.resonancegate.report.CheckResult;
import org.resonancegate.report.Results;

/** A speed the user wrote comes back in the results as written, not with a conversion residue. */
class ReportedSpeedTest {

    @TempDir
    Path project;

    @Test
    void aWrittenSpeedIsReportedExactly() throws IOException {
        Path file = project.resolve("src/vibration/p.json");
        Files.createDirectories(file.getParent());
        // f_n = √(1e6/1000)/2π = 5.03 Hz, far below 1000 rpm = 16.67 Hz: every value governs at 1000 rpm
        Files.writeString(file, """
                {"format": "resonance-gate/1", "id": "P",
                 "model": {"kind": "single", "mass": "1000 kg", "stiffness": "1 MN/m", "damping": {"ratio": 0.05}},
                 "operation": {"speed": "1000 rpm"},
                 "excitations": [{"name": "f", "kind": "force", "order": 3, "amplitude": "100 N"}],
                 "criteria": [{"id": "SEP", "rule": "separation", "margin": "20 %"},
                              {"id": "VEL", "rule": "velocity", "max": "4.5 mm/s"}]}
                """);
        Results results = CheckRun.run(new CheckRequest(project, List.of(file),
                Clock.fixed(Instant.parse("2026-12-02T00:00:00Z"), ZoneOffset.UTC)));
        for (CheckResult check : results.specs().get(0).checks()) {
            assertEquals(1000.0, check.speedRpm().getAsDouble(), 0.0, check.criterion());
            assertEquals(50.0, check.frequencyHz().getAsDouble(), 0.0, check.criterion());
        }
    }
}
