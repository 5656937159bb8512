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

    @Test
    void aLargeRunShowsAHundredSpecsInFullWorstFirstAndJudgesEveryOneTheSame() throws IOException {
        List<Path> files = new ArrayList<>();
        SpecGenerator generator = new SpecGenerator(7L);
        for (int i = 0; i < 130; i++) {
            Path file = project.resolve("src/vibration/s-" + (1000 + i) + ".json");
            Files.createDirectories(file.getParent());
            String text = generator.any("BIG-" + i);
            Files.writeString(file, i % 20 == 19 ? text.replace("\"kind\": ", "\"knid\": ") : text);
            files.add(file);
        }
        Results plain = CheckRunner.run(new CheckRequest(project, files, Pipeline.CLOCK, false), SpecLoader::load, true);
        Results full = CheckRunner.run(new CheckRequest(project, files, Pipeline.CLOCK, true), SpecLoader::load, true);
        java.util.Set<String> shown = org.resonancegate.report.DetailedSpecs.files(full.specs());
        assertEquals(org.resonancegate.report.DetailedSpecs.LIMIT, shown.size());
        for (int i = 0; i < full.specs().size(); i++) {
            var spec = full.specs().get(i);
            assertEquals(plain.specs().get(i).checks(), spec.checks(), "the verdict does not depend on the plot data");
            if (spec.status() != SpecStatus.PASS) {
                assertTrue(shown.contains(spec.file()), "a spec that is not a clean pass comes first: " + spec.file());
            }
            if (!shown.contains(spec.file())) {
                assertTrue(spec.details().curves().isEmpty(), "no curves for a spec not shown: " + spec.file());
            }
        }
        assertTrue(full.specs().stream().anyMatch(s -> shown.contains(s.file()) && !s.details().curves().isEmpty()));
        String html = org.resonancegate.report.html.HtmlReport.render(full);
        assertEquals(org.resonancegate.report.DetailedSpecs.LIMIT, html.split("<section class=\"spec ", -1).length - 1);
        assertTrue(html.contains("Shown in full below: 100 of 130 specs"), "the page says what it leaves out");
    }
}
