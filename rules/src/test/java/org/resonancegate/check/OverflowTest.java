package org.resonancegate.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.resonancegate.report.SpecResult;
import org.resonancegate.report.SpecStatus;

/** A model whose k/m overflows a double is an error that says what to look at, never a pass. */
class OverflowTest {

    @TempDir
    Path project;

    @Test
    void anOverflowingModelIsAnErrorWithAHint() throws IOException {
        Path file = project.resolve("src/vibration/p.json");
        Files.createDirectories(file.getParent());
        Files.writeString(file, """
                {"format": "resonance-gate/1", "id": "P",
                 "model": {"kind": "single", "mass": "1e-300 kg", "stiffness": "1e300 N/m", "damping": {"ratio": 0.05}},
                 "operation": {"speed": "1000 rpm"},
                 "excitations": [{"name": "f", "kind": "force", "order": 1, "amplitude": "100 N"}],
                 "criteria": [{"id": "SEP", "rule": "separation", "margin": "20 %"}]}
                """);
        SpecResult spec = CheckRun.run(new CheckRequest(project, List.of(file),
                Clock.fixed(Instant.parse("2026-12-02T00:00:00Z"), ZoneOffset.UTC))).specs().get(0);
        assertEquals(SpecStatus.ERROR, spec.status());
        assertTrue(spec.errors().stream().anyMatch(e -> e.message().contains("plausible units")), spec.errors()::toString);
    }
}
