package org.resonancegate.maven;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.mockito.ArgumentMatchers.any;
import static org.mockito.Mockito.atLeastOnce;
import static org.mockito.Mockito.never;
import static org.mockito.Mockito.verify;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.List;
import java.util.stream.Collectors;
import org.apache.maven.api.plugin.testing.Basedir;
import org.apache.maven.api.plugin.testing.InjectMojo;
import org.apache.maven.api.plugin.testing.MojoExtension;
import org.apache.maven.api.plugin.testing.MojoParameter;
import org.apache.maven.api.plugin.testing.MojoTest;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.MojoFailureException;
import org.apache.maven.plugin.logging.Log;
import org.junit.jupiter.api.Test;
import org.mockito.ArgumentCaptor;
import org.resonancegate.report.ReportFormat;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The goal through the plugin-testing harness: parameters from the descriptor and a test POM, the
 * real engine on small spec files, and the lines the goal logs (the harness's Log is a spy).
 *
 * <p>The specs are single masses whose verdicts follow from the closed form f_n = √(k/m)/(2π)
 * (Thomson, Theory of Vibration with Applications, ch. 2): 500 kg on 2 MN/m gives 10.066 Hz,
 * far below the 23.3-25 Hz running band (1400-1500 rpm); on 11.4 MN/m it gives 24.03 Hz,
 * inside the band, so a 20 % separation margin fails with β = 1 (value 0).
 */
@MojoTest
class CheckMojoTest {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    /** The file the console points at when every format is written, and the others. */
    static final String READER_FILE = ReportFormat.forReaders(EnumSet.allOf(ReportFormat.class)).orElseThrow().fileName();
    static final String OTHERS = Arrays.stream(ReportFormat.values()).map(ReportFormat::fileName)
            .filter(f -> !f.equals(READER_FILE)).collect(Collectors.joining(", "));

    static Path basedir() {
        return Path.of(MojoExtension.getBasedir());
    }

    static JsonNode results(Path basedir) throws IOException {
        return JSON.readTree(basedir.resolve("target/resonance-gate/results.json").toFile());
    }

    static List<String> lines(Log log, String level) {
        ArgumentCaptor<CharSequence> captor = ArgumentCaptor.forClass(CharSequence.class);
        switch (level) {
            case "info" -> verify(log, atLeastOnce()).info(captor.capture());
            case "warn" -> verify(log, atLeastOnce()).warn(captor.capture());
            default -> verify(log, atLeastOnce()).error(captor.capture());
        }
        return captor.getAllValues().stream().map(CharSequence::toString).toList();
    }

    @Test
    @Basedir("/unit/passing")
    @InjectMojo(goal = "check", pom = "pom.xml")
    void passingSpecPassesAndWritesItsRecord(CheckMojo mojo) throws Exception {
        Files.deleteIfExists(basedir().resolve("target/resonance-gate/results.json"));
        mojo.execute();
        Log log = mojo.getLog();
        verify(log, never()).error(any(CharSequence.class));
        List<String> info = lines(log, "info");
        assertTrue(info.contains("1 spec: 1 pass, 0 fail, 0 error; 0 criteria failed"), info.toString());
        assertTrue(info.contains("resonance-gate: report: target/resonance-gate/" + READER_FILE + " (also " + OTHERS + ")"),
                info.toString());
        for (ReportFormat format : ReportFormat.values()) {
            assertTrue(Files.isRegularFile(basedir().resolve("target/resonance-gate").resolve(format.fileName())),
                    "every format by default: " + format.fileName());
        }
        assertTrue(info.stream().anyMatch(l -> l.startsWith("src/vibration/chiller-pump.json  IT-1  pass")),
                info.toString());
        JsonNode spec = results(basedir()).get("specs").get(0);
        assertEquals("src/vibration/chiller-pump.json", spec.get("file").asString());
        assertEquals("pass", spec.get("status").asString());
        assertEquals(10.066, spec.get("modes").get(0).get("frequencyHz").asDouble(), 0.001);
    }

    @Test
    @Basedir("/unit/failing")
    @InjectMojo(goal = "check", pom = "pom.xml")
    void failingSpecFailsTheBuildWithALocatedLine(CheckMojo mojo) throws Exception {
        MojoFailureException e = assertThrows(MojoFailureException.class, mojo::execute);
        assertEquals("resonance-gate: 1 spec failed; see the lines above or target/resonance-gate/" + READER_FILE,
                e.getMessage());
        List<String> errors = lines(mojo.getLog(), "error");
        assertTrue(errors.stream().anyMatch(l -> l.startsWith("src/vibration/tower-fan.json:9:5: IT-2 SEP separation: ")),
                errors.toString());
        assertTrue(errors.contains("1 spec: 0 pass, 1 fail, 0 error; 1 criterion failed"), errors.toString());
        JsonNode check = results(basedir()).get("specs").get(0).get("checks").get(0);
        assertEquals("fail", check.get("status").asString());
        assertEquals(0.0, check.get("value").asDouble(), 1e-12, "the running band contains the mode");
    }

    @Test
    @Basedir("/unit/failing")
    @InjectMojo(goal = "check", pom = "pom.xml")
    @MojoParameter(name = "failOnViolation", value = "false")
    void failOnViolationFalseReportsTheSameAndPasses(CheckMojo mojo) throws Exception {
        mojo.execute();
        Log log = mojo.getLog();
        assertTrue(lines(log, "error").stream().anyMatch(l -> l.startsWith("src/vibration/tower-fan.json:9:5: ")));
        verify(log).warn("resonance-gate: 1 spec failed; failOnViolation=false, not failing the build");
    }

    @Test
    @Basedir("/unit/failing")
    @InjectMojo(goal = "check", pom = "pom.xml")
    @MojoParameter(name = "skip", value = "true")
    @MojoParameter(name = "outputDirectory", value = "${project.basedir}/target/skipped")
    void skipReadsAndWritesNothing(CheckMojo mojo) throws Exception {
        mojo.execute();
        Log log = mojo.getLog();
        verify(log).info("Skipping resonance-gate check");
        verify(log, never()).error(any(CharSequence.class));
        verify(log, never()).warn(any(CharSequence.class));
        assertFalse(Files.exists(basedir().resolve("target/skipped")));
    }

    @Test
    @Basedir("/unit/passing")
    @InjectMojo(goal = "check", pom = "pom.xml")
    @MojoParameter(name = "specDirectory", value = "${project.basedir}/src/no-such-folder")
    @MojoParameter(name = "outputDirectory", value = "${project.basedir}/target/empty")
    void missingSpecDirectoryFailsSoATypoCannotSwitchTheGateOff(CheckMojo mojo) throws Exception {
        MojoFailureException e = assertThrows(MojoFailureException.class, mojo::execute);
        assertTrue(e.getMessage().contains("no spec directory src/no-such-folder; nothing was checked"), e.getMessage());
        assertTrue(e.getMessage().contains("resonance-gate.requireSpecs=false"), e.getMessage());
        String text = Files.readString(basedir().resolve("target/empty/results.json"));
        assertEquals("{\n  \"format\": \"resonance-gate-results/1\",\n  \"caution\": \""
                + org.resonancegate.report.ConsoleReport.CAUTION + "\",\n  \"specs\": []\n}\n", text);
    }

    @Test
    @Basedir("/unit/passing")
    @InjectMojo(goal = "check", pom = "pom.xml")
    @MojoParameter(name = "specDirectory", value = "${project.basedir}/src/no-such-folder")
    @MojoParameter(name = "requireSpecs", value = "false")
    @MojoParameter(name = "outputDirectory", value = "${project.basedir}/target/empty-allowed")
    void missingSpecDirectoryOnlyWarnsWhenSpecsAreNotRequired(CheckMojo mojo) throws Exception {
        mojo.execute();
        verify(mojo.getLog()).warn(
                "resonance-gate: no spec directory src/no-such-folder; nothing to check (requireSpecs=false)");
    }

    @Test
    @Basedir("/unit/notadir")
    @InjectMojo(goal = "check", pom = "pom.xml")
    void specDirectoryThatIsAFileIsAConfigurationError(CheckMojo mojo) {
        MojoExecutionException e = assertThrows(MojoExecutionException.class, mojo::execute);
        assertTrue(e.getMessage().contains("src/vibration is a file, not a directory"), e.getMessage());
    }

    @Test
    @Basedir("/unit/mixed")
    @InjectMojo(goal = "check", pom = "pom.xml")
    void defaultIncludesTakeJsonAtEveryDepthAndNothingElse(CheckMojo mojo) throws Exception {
        assertThrows(MojoFailureException.class, mojo::execute, "drafts/tower-fan.json fails");
        JsonNode specs = results(basedir()).get("specs");
        assertEquals(2, specs.size());
        assertEquals("src/vibration/chiller-pump.json", specs.get(0).get("file").asString());
        assertEquals("src/vibration/drafts/tower-fan.json", specs.get(1).get("file").asString());
    }

    @Test
    @Basedir("/unit/mixed")
    @InjectMojo(goal = "check", pom = "pom.xml")
    @MojoParameter(name = "excludes", value = "drafts/")
    @MojoParameter(name = "outputDirectory", value = "${project.basedir}/target/excluded")
    void excludesLeaveFilesOut(CheckMojo mojo) throws Exception {
        mojo.execute();
        JsonNode specs = JSON.readTree(basedir().resolve("target/excluded/results.json").toFile()).get("specs");
        assertEquals(1, specs.size());
        assertEquals("IT-1", specs.get(0).get("id").asString());
    }

    @Test
    @Basedir("/unit/mixed")
    @InjectMojo(goal = "check", pom = "pom.xml")
    @MojoParameter(name = "includes", value = "*.yaml")
    @MojoParameter(name = "outputDirectory", value = "${project.basedir}/target/unmatched")
    void includesMatchingNothingFail(CheckMojo mojo) {
        MojoFailureException e = assertThrows(MojoFailureException.class, mojo::execute);
        assertTrue(e.getMessage().contains("no file in src/vibration matches includes [*.yaml]; nothing was checked"),
                e.getMessage());
    }

    @Test
    @Basedir("/unit/mixed")
    @InjectMojo(goal = "check", pom = "pom.xml")
    @MojoParameter(name = "includes", value = "chiller-pump.json,chiller-pmp.json")
    @MojoParameter(name = "outputDirectory", value = "${project.basedir}/target/misnamed")
    void anIncludeNamingAFileThatIsNotThereStopsTheBuildEvenWhenAnotherMatches(CheckMojo mojo) {
        MojoExecutionException e = assertThrows(MojoExecutionException.class, mojo::execute);
        assertTrue(e.getMessage().contains("includes name [chiller-pmp.json] but no such file is in src/vibration"),
                e.getMessage());
    }

    @Test
    @Basedir("/unit/broken")
    @InjectMojo(goal = "check", pom = "pom.xml")
    void unreadableSpecFailsTheBuildWithItsDiagnostic(CheckMojo mojo) throws Exception {
        MojoFailureException e = assertThrows(MojoFailureException.class, mojo::execute);
        assertTrue(e.getMessage().startsWith("resonance-gate: 1 spec has errors"), e.getMessage());
        List<String> errors = lines(mojo.getLog(), "error");
        assertTrue(errors.stream().anyMatch(l -> l.startsWith("src/vibration/boiler-feed.json:7:5: IT-3 unknown key \"stifness\"")),
                errors.toString());
        assertEquals("error", results(basedir()).get("specs").get(0).get("status").asString());
    }

    @Test
    @Basedir("/unit/waived")
    @InjectMojo(goal = "check", pom = "pom.xml")
    void waivedFailureIsAWarningAndPasses(CheckMojo mojo) throws Exception {
        mojo.execute();
        Log log = mojo.getLog();
        verify(log, never()).error(any(CharSequence.class));
        List<String> warnings = lines(log, "warn");
        assertTrue(warnings.stream().anyMatch(l -> l.startsWith("src/vibration/tower-fan.json:9:5: IT-4 SEP separation: ")
                && l.endsWith("; waived through 2999-12-31: fan runs below 1400 rpm in service; accepted at design review 3")),
                warnings.toString());
        assertTrue(warnings.contains("1 spec: 0 pass, 1 waived, 0 fail, 0 error; 0 criteria failed, 1 waived"),
                warnings.toString());
        JsonNode spec = results(basedir()).get("specs").get(0);
        assertEquals("waived", spec.get("status").asString());
        assertTrue(spec.get("checks").get(0).get("waiver").get("valid").asBoolean());
    }

    @Test
    @Basedir("/unit/passing")
    @InjectMojo(goal = "check", pom = "pom.xml")
    @MojoParameter(name = "outputDirectory", value = "${project.basedir}/pom.xml")
    void anOutputDirectoryThatIsAFileIsAConfigurationError(CheckMojo mojo) {
        // said before any spec is read, in the same words in Maven's JVM and in a separate one
        MojoExecutionException e = assertThrows(MojoExecutionException.class, mojo::execute);
        assertEquals("resonance-gate: outputDirectory pom.xml is a file, not a directory; point"
                + " resonance-gate.outputDirectory at a folder (it is created when missing), or remove the file",
                e.getMessage());
    }
}
