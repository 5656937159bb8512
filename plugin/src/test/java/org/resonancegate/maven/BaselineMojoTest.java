package org.resonancegate.maven;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;
import org.apache.maven.api.plugin.testing.Basedir;
import org.apache.maven.api.plugin.testing.InjectMojo;
import org.apache.maven.api.plugin.testing.MojoExtension;
import org.apache.maven.api.plugin.testing.MojoParameter;
import org.apache.maven.api.plugin.testing.MojoTest;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.MojoFailureException;
import org.eclipse.jgit.api.Git;
import org.eclipse.jgit.lib.PersonIdent;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * {@code baseline} and {@code failOn} through the harness, on a Git repository made with JGit in
 * the test project's folder. The verdicts follow from f_n = √(k/m)/(2π) (Thomson, Theory of
 * Vibration with Applications, ch. 2): 500 kg on 2 MN/m is 10.07 Hz, far below the 1400-1500 rpm
 * band (23.3-25 Hz); on 11.4 MN/m it is 24.03 Hz, inside it, so the 20 % separation fails.
 */
@MojoTest
class BaselineMojoTest {

    private static final String SPEC = "src/vibration/fan.json";

    private static String fan(String stiffness, String title) {
        return """
                {"format": "resonance-gate/1", "id": "FAN-1", "title": "%s",
                 "model": {"kind": "single", "mass": "500 kg", "stiffness": "%s", "damping": {"ratio": 0.05}},
                 "operation": {"speed": {"min": "1400 rpm", "max": "1500 rpm"}},
                 "excitations": [{"name": "rotor", "kind": "unbalance", "unbalance": "500 g·mm"}],
                 "criteria": [{"id": "SEP", "rule": "separation", "margin": "20 %%"}]}
                """.formatted(title, stiffness);
    }

    /** A fresh repository in the test project's folder: {@code before} committed, {@code after} on disk. */
    private static Path repository(String before, String after) throws Exception {
        Path base = Path.of(MojoExtension.getBasedir());
        for (String leftover : List.of(".git", "src", "target")) {
            Path p = base.resolve(leftover);
            if (Files.exists(p)) {
                try (Stream<Path> walk = Files.walk(p)) {
                    for (Path q : walk.sorted(Comparator.reverseOrder()).toList()) {
                        Files.delete(q);
                    }
                }
            }
        }
        Files.createDirectories(base.resolve("src/vibration"));
        Files.writeString(base.resolve(SPEC), before);
        try (Git git = Git.init().setDirectory(base.toFile()).setInitialBranch("main").call()) {
            git.add().addFilepattern("src").call();
            PersonIdent who = new PersonIdent("Test Engineer", "engineer@example.invalid",
                    Instant.parse("2026-11-02T09:00:00Z"), ZoneOffset.UTC);
            git.commit().setMessage("fan").setAuthor(who).setCommitter(who).setSign(false).call();
        }
        Files.writeString(base.resolve(SPEC), after);
        return base;
    }

    @Test
    @Basedir("/unit/ratchet-new")
    @InjectMojo(goal = "check", pom = "pom.xml")
    @MojoParameter(name = "baseline", value = "HEAD")
    @MojoParameter(name = "failOn", value = "new-violation")
    void aNewFailureFailsTheRatchet(CheckMojo mojo) throws Exception {
        Path base = repository(fan("2 MN/m", "fan"), fan("11.4 MN/m", "fan"));
        MojoFailureException e = assertThrows(MojoFailureException.class, mojo::execute);
        assertTrue(e.getMessage().contains("1 new failing criterion"), e.getMessage());
        List<String> errors = CheckMojoTest.lines(mojo.getLog(), "error");
        assertTrue(errors.stream().anyMatch(l -> l.startsWith(SPEC + ":5:") && l.contains("FAN-1 SEP separation (new): ")),
                errors.toString());
        List<String> info = CheckMojoTest.lines(mojo.getLog(), "info");
        assertTrue(info.stream().anyMatch(l -> l.contains("input model.stiffness: \"2 MN/m\" → \"11.4 MN/m\"")),
                info.toString());
        // f = √(k/m)/2π: 10.07 Hz → 24.03 Hz
        assertTrue(info.contains("  mode 1: 10.07 Hz → 24.03 Hz (+138.7 %)"), info.toString());
        JsonNode c = JsonMapper.builder().build().readTree(base.resolve("target/resonance-gate/results.json").toFile())
                .get("baseline").get("specs").get(0).get("criteria").get(0);
        assertEquals("new", c.get("transition").asString());
        assertEquals("pass", c.get("baselineStatus").asString());
    }

    @Test
    @Basedir("/unit/ratchet-carried")
    @InjectMojo(goal = "check", pom = "pom.xml")
    @MojoParameter(name = "baseline", value = "HEAD")
    @MojoParameter(name = "failOn", value = "new-violation")
    void aCarriedOverFailurePassesTheRatchetAndSaysSo(CheckMojo mojo) throws Exception {
        repository(fan("11.4 MN/m", "fan"), fan("11.4 MN/m", "fan on its new frame"));
        mojo.execute();
        List<String> warnings = CheckMojoTest.lines(mojo.getLog(), "warn");
        assertTrue(warnings.stream().anyMatch(l -> l.contains("FAN-1 SEP separation (carried over): ")), warnings.toString());
        assertTrue(warnings.stream().anyMatch(l -> l.contains("already failing at HEAD (carried over)")), warnings.toString());
    }

    @Test
    @Basedir("/unit/ratchet-carried")
    @InjectMojo(goal = "check", pom = "pom.xml")
    @MojoParameter(name = "baseline", value = "HEAD")
    void theSameOldFailureStillFailsTheDefaultGate(CheckMojo mojo) throws Exception {
        repository(fan("11.4 MN/m", "fan"), fan("11.4 MN/m", "fan on its new frame"));
        MojoFailureException e = assertThrows(MojoFailureException.class, mojo::execute);
        assertTrue(e.getMessage().contains("1 spec failed"), e.getMessage());
        assertTrue(CheckMojoTest.lines(mojo.getLog(), "error").stream().anyMatch(l -> l.contains("SEP separation (carried over): ")));
    }

    @Test
    @Basedir("/unit/passing")
    @InjectMojo(goal = "check", pom = "pom.xml")
    @MojoParameter(name = "failOn", value = "new-violation")
    void theRatchetWithoutABaselineIsAConfigurationError(CheckMojo mojo) {
        MojoExecutionException e = assertThrows(MojoExecutionException.class, mojo::execute);
        assertTrue(e.getMessage().contains("no baseline is set") && e.getMessage().contains("resonance-gate.baseline"),
                e.getMessage());
    }

    @Test
    @Basedir("/unit/passing")
    @InjectMojo(goal = "check", pom = "pom.xml")
    @MojoParameter(name = "failOn", value = "new-violations")
    void anUnknownFailOnNamesTheChoices(CheckMojo mojo) {
        MojoExecutionException e = assertThrows(MojoExecutionException.class, mojo::execute);
        assertTrue(e.getMessage().contains("\"new-violations\"") && e.getMessage().contains("new-violation (only"),
                e.getMessage());
    }

}
