package org.resonancegate.check;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.resonancegate.hardening.Pipeline;
import org.resonancegate.hardening.SpecGenerator;
import org.resonancegate.report.Results;
import org.resonancegate.report.ResultsJson;
import org.resonancegate.report.SpecStatus;
import org.resonancegate.spec.SpecLoader;

/**
 * Judging specs in parallel gives the same bytes as judging them one after another: the engine
 * shares no mutable state between specs, and the order of the results does not depend on which
 * thread finished first.
 */
class ParallelCheckTest {

    @TempDir
    Path project;

    @Test
    void parallelRunWritesTheSameResultsAsASequentialOne() throws IOException {
        List<Path> files = new ArrayList<>();
        SpecGenerator generator = new SpecGenerator(20261202L);
        for (int i = 0; i < 150; i++) {
            // names whose order differs from the order written, so sorting is exercised too
            Path file = project.resolve("src/vibration/area-" + (i % 7) + "/item-" + (997 * i % 150) + ".json");
            Files.createDirectories(file.getParent());
            String text = generator.any("GEN-" + i);
            // every tenth file broken, so errors travel the same path as results
            Files.writeString(file, i % 10 == 3 ? text.replace("\"kind\": ", "\"knid\": ") : text);
            files.add(file);
        }
        CheckRequest request = new CheckRequest(project, files, Pipeline.CLOCK);
        Results sequential = CheckRunner.run(request, SpecLoader::load, false);
        Results parallel = CheckRunner.run(request, SpecLoader::load, true);
        assertEquals(150, sequential.specs().size());
        assertTrue(sequential.specs().stream().filter(s -> s.status() == SpecStatus.ERROR).count() >= 15);
        assertTrue(sequential.specs().stream().anyMatch(s -> s.status() != SpecStatus.ERROR));
        assertArrayEquals(ResultsJson.toBytes(sequential), ResultsJson.toBytes(parallel));
        // and again, now that every class is loaded and the threads race harder
        assertArrayEquals(ResultsJson.toBytes(sequential), ResultsJson.toBytes(CheckRunner.run(request, SpecLoader::load, true)));
    }
}
