package org.resonancegate.hardening;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import com.code_intelligence.jazzer.junit.FuzzTest;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.resonancegate.check.CheckRequest;
import org.resonancegate.check.CheckRun;
import org.resonancegate.report.CheckResult;
import org.resonancegate.report.ErrorEntry;
import org.resonancegate.report.ModeResult;
import org.resonancegate.report.Results;
import org.resonancegate.report.ResultsJson;
import org.resonancegate.report.SpecResult;
import org.resonancegate.report.SpecStatus;

/**
 * Coverage-guided fuzzing of the reader and the whole engine: whatever bytes a spec file holds,
 * no exception escapes, and the outcome is either results or diagnostics that point into the
 * file, never an internal error, never a NaN. Without JAZZER_FUZZ this runs the seeds under
 * src/test/resources/org/resonancegate/hardening/PipelineFuzzTestInputs/ as plain tests; the
 * rules pom runs it once more in fuzzing mode, bounded by maxDuration.
 */
class PipelineFuzzTest {

    private static Path project;
    private static Path file;

    @BeforeAll
    static void scratch() throws IOException {
        project = Files.createTempDirectory("rg-fuzz");
        file = project.resolve("spec.json");
    }

    @AfterAll
    static void clean() {
        Pipeline.delete(project);
    }

    @FuzzTest(maxDuration = "40s")
    void anyBytesGiveResultsOrDiagnostics(byte[] data) throws IOException {
        Files.write(file, data);
        Results results = CheckRun.run(new CheckRequest(project, List.of(file), Pipeline.CLOCK));
        if (results.specs().isEmpty()) {
            // a profile is recognised and skipped, never judged as a spec
            assertTrue(new String(data, StandardCharsets.UTF_8).contains("resonance-gate-profile/1"));
            return;
        }
        assertEquals(1, results.specs().size());
        SpecResult r = results.specs().get(0);
        assertEquals("spec.json", r.file());
        if (r.status() == SpecStatus.ERROR) {
            assertFalse(r.errors().isEmpty(), "an error with no diagnostic");
            for (ErrorEntry e : r.errors()) {
                // the engine's own fallbacks start so; a user's text echoed inside a message does not
                assertFalse(e.message().startsWith("internal error"), e::message);
                assertTrue(e.location().line() >= 1 && e.location().column() >= 1, e::toString);
            }
        } else {
            assertTrue(r.errors().isEmpty());
            for (ModeResult m : r.modes()) {
                assertTrue(Double.isFinite(m.frequencyHz()), m::toString);
            }
            for (CheckResult c : r.checks()) {
                assertTrue(Double.isFinite(c.value()) && Double.isFinite(c.limit()), c::toString);
            }
        }
        String json = ResultsJson.toJson(results);
        assertTrue(FiniteJson.allFinite(json), json);
    }
}
