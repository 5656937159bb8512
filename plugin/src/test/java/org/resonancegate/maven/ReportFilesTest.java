package org.resonancegate.maven;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.mockito.ArgumentMatchers.any;
import static org.mockito.Mockito.never;
import static org.mockito.Mockito.verify;
import static org.resonancegate.maven.CheckMojoTest.basedir;
import static org.resonancegate.maven.CheckMojoTest.lines;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.apache.maven.api.plugin.testing.Basedir;
import org.apache.maven.api.plugin.testing.InjectMojo;
import org.apache.maven.api.plugin.testing.MojoParameter;
import org.apache.maven.api.plugin.testing.MojoTest;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.MojoFailureException;
import org.junit.jupiter.api.Test;
import org.resonancegate.report.ConsoleReport;

/**
 * The {@code formats} and {@code summaryFile} parameters of {@code check}, through the harness.
 * The failing spec's verdict rests on f_n = √(k/m)/(2π) (see CheckMojoTest): 24.03 Hz inside the
 * 23.3-25 Hz running band.
 */
@MojoTest
class ReportFilesTest {

    private static List<String> files(Path dir) throws Exception {
        try (Stream<Path> list = Files.list(dir)) {
            return list.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    @Basedir("/unit/failing")
    @InjectMojo(goal = "check", pom = "pom.xml")
    @MojoParameter(name = "formats", value = "junit, SARIF")
    @MojoParameter(name = "outputDirectory", value = "${project.basedir}/target/subset")
    void aSubsetWritesOnlyThoseFiles(CheckMojo mojo) throws Exception {
        MojoFailureException e = assertThrows(MojoFailureException.class, mojo::execute);
        assertEquals("resonance-gate: 1 spec failed; see the lines above or target/subset/results.sarif", e.getMessage());
        assertEquals(List.of("junit.xml", "results.sarif"), files(basedir().resolve("target/subset")));
        assertTrue(lines(mojo.getLog(), "info").contains("resonance-gate: report: target/subset/results.sarif (also junit.xml)"));
    }

    @Test
    @Basedir("/unit/failing")
    @InjectMojo(goal = "check", pom = "pom.xml")
    @MojoParameter(name = "formats", value = "json,sarf")
    @MojoParameter(name = "outputDirectory", value = "${project.basedir}/target/unknown-format")
    void anUnknownFormatIsAConfigurationErrorBeforeAnythingRuns(CheckMojo mojo) {
        MojoExecutionException e = assertThrows(MojoExecutionException.class, mojo::execute);
        assertTrue(e.getMessage().startsWith("resonance-gate: unknown report format 'sarf'; did you mean 'sarif'?"
                + " Known formats: json, "), e.getMessage());
        assertTrue(e.getMessage().endsWith("Fix resonance-gate.formats (a comma-separated list), or leave it out"
                + " to write every format"), e.getMessage());
        assertFalse(Files.exists(basedir().resolve("target/unknown-format")), "nothing written");
        verify(mojo.getLog(), never()).error(any(CharSequence.class));
    }

    @Test
    @Basedir("/unit/failing")
    @InjectMojo(goal = "check", pom = "pom.xml")
    @MojoParameter(name = "formats", value = "json")
    @MojoParameter(name = "outputDirectory", value = "${project.basedir}/target/with-summary")
    @MojoParameter(name = "summaryFile", value = "${project.basedir}/target/ci/step-summary.md")
    void summaryFileGetsTheSummaryAppended(CheckMojo mojo) throws Exception {
        Path summary = basedir().resolve("target/ci/step-summary.md");
        Files.createDirectories(summary.getParent());
        Files.writeString(summary, "an earlier step wrote this\n");
        assertThrows(MojoFailureException.class, mojo::execute);
        String text = Files.readString(summary);
        // the heading names the module (the harness stands in a project of its own; the IT sees the real id)
        assertTrue(text.startsWith("an earlier step wrote this\n\n### resonance-gate: "), text);
        assertTrue(text.contains("**1 spec: 0 pass, 1 fail, 0 error; 1 criterion failed**"), text);
        assertTrue(text.contains("| fail | IT-2 | SEP | separation | src/vibration/tower-fan.json:9:5 | "), text);
        assertTrue(text.endsWith("*" + ConsoleReport.CAUTION + "*\n"), text);
        assertEquals(List.of("results.json"), files(basedir().resolve("target/with-summary")),
                "the copy does not depend on the markdown format being chosen");
    }
}
