package org.resonancegate.maven;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.mockito.Mockito.verify;
import static org.resonancegate.maven.CheckMojoTest.READER_FILE;
import static org.resonancegate.maven.CheckMojoTest.basedir;
import static org.resonancegate.maven.CheckMojoTest.lines;
import static org.resonancegate.maven.CheckMojoTest.results;

import java.nio.file.Files;
import org.apache.maven.api.plugin.testing.Basedir;
import org.apache.maven.api.plugin.testing.InjectMojo;
import org.apache.maven.api.plugin.testing.MojoParameter;
import org.apache.maven.api.plugin.testing.MojoTest;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.logging.Log;
import org.junit.jupiter.api.Test;
import org.resonancegate.report.ReportFormat;

/**
 * The {@code report} goal: the same files as {@code check}, never a failed build for what they
 * say, but still an error for broken configuration. Verdicts as in CheckMojoTest (f_n = √(k/m)/(2π)).
 */
@MojoTest
class ReportMojoTest {

    @Test
    @Basedir("/unit/failing")
    @InjectMojo(goal = "report", pom = "pom.xml")
    @MojoParameter(name = "outputDirectory", value = "${project.basedir}/target/report-goal")
    void aFailingSpecIsReportedAndTheBuildPasses(ReportMojo mojo) throws Exception {
        mojo.execute();
        Log log = mojo.getLog();
        assertTrue(lines(log, "error").stream().anyMatch(l -> l.startsWith("src/vibration/tower-fan.json:9:5: IT-2 SEP separation: ")));
        verify(log).warn("resonance-gate: 1 spec failed; see target/report-goal/" + READER_FILE
                + " (the report goal does not fail the build)");
        for (ReportFormat format : ReportFormat.values()) {
            assertTrue(Files.isRegularFile(basedir().resolve("target/report-goal").resolve(format.fileName())),
                    format.fileName());
        }
        String json = Files.readString(basedir().resolve("target/report-goal/results.json"));
        assertTrue(json.contains("\"status\": \"fail\""), json);
    }

    @Test
    @Basedir("/unit/broken")
    @InjectMojo(goal = "report", pom = "pom.xml")
    void anUnreadableSpecIsReportedAndTheBuildPasses(ReportMojo mojo) throws Exception {
        mojo.execute();
        verify(mojo.getLog()).warn("resonance-gate: 1 spec has errors; see target/resonance-gate/" + READER_FILE
                + " (the report goal does not fail the build)");
        assertEquals("error", results(basedir()).get("specs").get(0).get("status").asString());
    }

    @Test
    @Basedir("/unit/passing")
    @InjectMojo(goal = "report", pom = "pom.xml")
    @MojoParameter(name = "specDirectory", value = "${project.basedir}/src/no-such-folder")
    @MojoParameter(name = "outputDirectory", value = "${project.basedir}/target/report-empty")
    void nothingToCheckIsAWarning(ReportMojo mojo) throws Exception {
        mojo.execute();
        verify(mojo.getLog()).warn("resonance-gate: no spec directory src/no-such-folder; nothing was checked"
                + " (the report goal does not fail the build)");
        assertTrue(Files.isRegularFile(basedir().resolve("target/report-empty/results.json")));
    }

    @Test
    @Basedir("/unit/failing")
    @InjectMojo(goal = "report", pom = "pom.xml")
    @MojoParameter(name = "formats", value = "html5")
    @MojoParameter(name = "outputDirectory", value = "${project.basedir}/target/report-bad-format")
    void anUnknownFormatStillStopsTheBuild(ReportMojo mojo) {
        MojoExecutionException e = assertThrows(MojoExecutionException.class, mojo::execute);
        assertTrue(e.getMessage().startsWith("resonance-gate: unknown report format 'html5'"), e.getMessage());
        assertFalse(Files.exists(basedir().resolve("target/report-bad-format")));
    }

    @Test
    @Basedir("/unit/failing")
    @InjectMojo(goal = "report", pom = "pom.xml")
    @MojoParameter(name = "skip", value = "true")
    @MojoParameter(name = "outputDirectory", value = "${project.basedir}/target/report-skipped")
    void skipWritesNothing(ReportMojo mojo) throws Exception {
        mojo.execute();
        verify(mojo.getLog()).info("Skipping resonance-gate report");
        assertFalse(Files.exists(basedir().resolve("target/report-skipped")));
    }
}
