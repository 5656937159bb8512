package org.resonancegate.baseline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.resonancegate.report.CheckStatus;
import org.resonancegate.report.ConsoleLevel;
import org.resonancegate.report.ConsoleLine;
import org.resonancegate.report.ConsoleReport;
import org.resonancegate.report.CriterionChange;
import org.resonancegate.report.InputChange;
import org.resonancegate.report.ModeChange;
import org.resonancegate.report.Results;
import org.resonancegate.report.ResultsJson;
import org.resonancegate.report.SpecChange;
import org.resonancegate.report.SpecStatus;
import org.resonancegate.report.Transition;

/**
 * Comparisons against real Git repositories built with JGit. The physics in these tests is one
 * mass on one spring, f = √(k/m)/2π (the undamped single-degree-of-freedom natural frequency,
 * e.g. S. S. Rao, Mechanical Vibrations, chapter 2; from memory), and the separation rule as
 * SPEC-FORMAT.md states it: an excitation band that contains a mode has separation 0.
 */
class BaselineRunTest {

    private static final Instant MONDAY = Instant.parse("2026-11-02T09:00:00Z");
    private static final Clock NOW = Clock.fixed(Instant.parse("2026-12-01T09:00:00Z"), ZoneOffset.UTC);
    private static final String PUMP = "src/vibration/pump.json";

    /** f = √(k/m)/2π for m = 1000 kg. */
    private static double singleMassHz(double stiffnessNPerM) {
        return Math.sqrt(stiffnessNPerM / 1000.0) / (2 * Math.PI);
    }

    private static SpecChange only(Results r) {
        List<SpecChange> specs = r.baseline().orElseThrow().specs();
        assertEquals(1, specs.size(), specs.toString());
        return specs.get(0);
    }

    private static CriterionChange sep(SpecChange s) {
        return s.criteria().stream().filter(c -> c.criterion().equals("SEP")).findFirst().orElseThrow();
    }

    @Test
    void softerSpringPullsTheModeIntoTheRunningBandAndTheFailureIsNew(@TempDir Path dir) throws Exception {
        try (GitProject repo = new GitProject(dir, "")) {
            // 40 MN/m on 1000 kg: 200 rad/s, 31.83 Hz; top of the band 1480 rpm = 24.67 Hz is 22.5 % below it.
            repo.write(PUMP, GitProject.spec("P-1", "40 MN/m", ""));
            String commit = repo.commit("pump on stiff pads", MONDAY);
            // 20 MN/m: 141.4 rad/s, 22.51 Hz, inside 900–1480 rpm (15–24.67 Hz).
            repo.write(PUMP, GitProject.spec("P-1", "20 MN/m", ""));

            Results r = repo.judge("HEAD", NOW);

            assertEquals(commit, r.baseline().orElseThrow().commit());
            SpecChange s = only(r);
            assertEquals(SpecChange.Kind.CHANGED, s.kind());
            assertEquals(Optional.of(SpecStatus.PASS), s.baselineStatus());
            assertEquals(Optional.of(SpecStatus.FAIL), s.currentStatus());
            assertEquals(List.of(new InputChange("model.stiffness", Optional.of("\"40 MN/m\""),
                    Optional.of("\"20 MN/m\""), s.inputs().get(0).location())), s.inputs());
            assertEquals(PUMP + ":4:63", s.inputs().get(0).location().orElseThrow().display());

            ModeChange mode = s.modes().get(0);
            assertEquals(1, s.modes().size());
            // f = √(k/m)/2π: 31.831 Hz before, 22.508 Hz after
            assertEquals(singleMassHz(40e6), mode.baselineHz().getAsDouble(), 1e-9 * 31.8);
            assertEquals(singleMassHz(20e6), mode.currentHz().getAsDouble(), 1e-9 * 22.5);
            assertEquals(31.831, mode.baselineHz().getAsDouble(), 5e-4);
            assertEquals(22.508, mode.currentHz().getAsDouble(), 5e-4);

            CriterionChange c = sep(s);
            assertEquals(Transition.NEW, c.transition());
            assertEquals(Optional.of(CheckStatus.PASS), c.baselineStatus());
            assertEquals(Optional.of(CheckStatus.FAIL), c.currentStatus());
            // separation at the top of the band: 1 − 24.667/31.831 = 0.2251; margin (0.2251 − 0.2)/0.2
            double before = 1 - (1480 / 60.0) / singleMassHz(40e6);
            assertEquals(before, c.baselineValue().getAsDouble(), 1e-6);
            assertEquals((before - 0.2) / 0.2, c.baselineMargin().getAsDouble(), 1e-5);
            assertEquals(0, c.currentValue().getAsDouble(), 1e-12, "the band contains the mode");
            assertEquals(-1, c.currentMargin().getAsDouble(), 1e-12);

            assertTrue(Ratchet.judge(r, FailOn.VIOLATION).fails());
            Ratchet.Verdict ratchet = Ratchet.judge(r, FailOn.NEW_VIOLATION);
            assertEquals("1 new failing criterion", ratchet.failure());

            List<String> console = ConsoleReport.lines(r, true).stream().map(ConsoleLine::text).toList();
            assertTrue(console.contains(PUMP + ":7:16: P-1 SEP separation (new): " + r.specs().get(0).checks().get(0)
                    .message()), String.join("\n", console));
            assertTrue(console.contains("  " + PUMP + ":4:63: input model.stiffness: \"40 MN/m\" → \"20 MN/m\""),
                    String.join("\n", console));
            assertTrue(console.contains("  mode 1: 31.83 Hz → 22.51 Hz (−29.29 %)"), String.join("\n", console));

            String json = new String(ResultsJson.toBytes(r), StandardCharsets.UTF_8);
            assertTrue(json.contains("\"transition\": \"new\""), json);
            assertTrue(json.contains("\"commit\": \"" + commit + "\""), json);
            assertTrue(json.contains("\"before\": \"\\\"40 MN/m\\\"\""), json);
        }
    }

    @Test
    void anOldFailureIsCarriedOverAndLetThroughOnlyByTheRatchet(@TempDir Path dir) throws Exception {
        try (GitProject repo = new GitProject(dir, "")) {
            repo.write(PUMP, GitProject.spec("P-1", "20 MN/m", ""));
            repo.commit("pump on soft pads", MONDAY);
            repo.write(PUMP, GitProject.spec("P-1", "20 MN/m", ",\n  \"title\": \"pump 1\""));

            Results r = repo.judge("HEAD", NOW);

            SpecChange s = only(r);
            assertEquals(SpecChange.Kind.CHANGED, s.kind());
            assertEquals(List.of("title"), s.inputs().stream().map(InputChange::path).toList());
            assertEquals(Optional.empty(), s.inputs().get(0).before());
            assertFalse(s.modes().get(0).moved());
            assertEquals(Transition.CARRIED_OVER, sep(s).transition());
            assertEquals("1 spec failed", Ratchet.judge(r, FailOn.VIOLATION).failure());
            Ratchet.Verdict ratchet = Ratchet.judge(r, FailOn.NEW_VIOLATION);
            assertFalse(ratchet.fails());
            assertTrue(ratchet.note().contains("carried over"), ratchet.note());
            List<ConsoleLine> ratcheted = ConsoleReport.lines(r, true);
            assertTrue(ratcheted.stream().anyMatch(l -> l.text().contains("SEP separation (carried over): ")
                    && l.level() == ConsoleLevel.WARNING), ratcheted.toString());
            assertTrue(ratcheted.contains(new ConsoleLine(ConsoleLevel.WARNING, "1 spec: 0 pass, 1 fail, 0 error;"
                    + " 1 criterion failed; since HEAD: 0 new, 1 carried over, 0 fixed")), ratcheted.toString());
            assertTrue(ConsoleReport.lines(r, false).stream().anyMatch(l -> l.text().contains("(carried over): ")
                    && l.level() == ConsoleLevel.ERROR));
        }
    }

    @Test
    void aStifferSpringFixesTheFailure(@TempDir Path dir) throws Exception {
        try (GitProject repo = new GitProject(dir, "")) {
            repo.write(PUMP, GitProject.spec("P-1", "20 MN/m", ""));
            repo.commit("soft", MONDAY);
            repo.write(PUMP, GitProject.spec("P-1", "40 MN/m", ""));
            Results r = repo.judge("main", NOW);
            assertEquals(Transition.FIXED, sep(only(r)).transition());
            assertTrue(ConsoleReport.lines(r).stream().anyMatch(l -> l.text().contains("SEP separation (fixed): passes now")));
        }
    }

    @Test
    void aWaiverThatHeldAtTheBaselineAndHasExpiredSinceMakesTheFailureNew(@TempDir Path dir) throws Exception {
        String waiver = ",\n  \"waivers\": [{\"criterion\": \"SEP\", \"reason\": \"until the new pads arrive\","
                + " \"expires\": \"2026-11-20\"}]";
        try (GitProject repo = new GitProject(dir, "")) {
            repo.write(PUMP, GitProject.spec("P-1", "20 MN/m", waiver));
            repo.commit("soft pads, waived", MONDAY); // 2026-11-02: the waiver holds
            Results r = repo.judge("HEAD", NOW); // 2026-12-01: it has expired
            SpecChange s = only(r);
            assertEquals(SpecChange.Kind.CHANGED, s.kind(), "the status moved although no input did");
            assertTrue(s.inputs().isEmpty());
            assertEquals(Optional.of(CheckStatus.WAIVED), sep(s).baselineStatus());
            assertEquals(Transition.NEW, sep(s).transition());
            assertTrue(Ratchet.judge(r, FailOn.NEW_VIOLATION).fails());
            assertEquals("2026-11-02", r.baseline().orElseThrow().judgedOn().toString());
        }
    }

    @Test
    void aMovedFileWithTheSameIdIsRenamedAndOthersAreAddedOrRemoved(@TempDir Path dir) throws Exception {
        try (GitProject repo = new GitProject(dir, "")) {
            repo.write(PUMP, GitProject.spec("P-1", "40 MN/m", ""));
            repo.write("src/vibration/fan.json", GitProject.spec("F-1", "40 MN/m", ""));
            repo.commit("two machines", MONDAY);
            repo.delete(PUMP);
            repo.delete("src/vibration/fan.json");
            repo.write("src/vibration/pumps/pump-1.json", GitProject.spec("P-1", "40 MN/m", ""));
            repo.write("src/vibration/compressor.json", GitProject.spec("C-1", "40 MN/m", ""));

            List<SpecChange> specs = repo.judge("HEAD", NOW).baseline().orElseThrow().specs();

            assertEquals(List.of("src/vibration/compressor.json", "src/vibration/fan.json",
                    "src/vibration/pumps/pump-1.json"), specs.stream().map(SpecChange::file).toList());
            assertEquals(List.of(SpecChange.Kind.ADDED, SpecChange.Kind.REMOVED, SpecChange.Kind.RENAMED),
                    specs.stream().map(SpecChange::kind).toList());
            assertEquals(Optional.of(PUMP), specs.get(2).baselineFile());
            assertTrue(specs.get(2).inputs().isEmpty());
            assertEquals(Transition.PASS, sep(specs.get(0)).transition());
            assertEquals(Transition.REMOVED, sep(specs.get(1)).transition());
            assertEquals(Optional.empty(), specs.get(1).currentStatus());
        }
    }

    @Test
    void aBaselineFileThatDidNotParseIsReportedAndItsFailuresNowCountAsNew(@TempDir Path dir) throws Exception {
        try (GitProject repo = new GitProject(dir, "")) {
            repo.write(PUMP, "{\"format\": \"resonance-gate/1\", \"id\": \"P-1\",\n  \"model\": {\"kind\": ");
            repo.commit("half a file", MONDAY);
            repo.write(PUMP, GitProject.spec("P-1", "20 MN/m", ""));

            SpecChange s = only(repo.judge("HEAD", NOW));

            assertEquals(Optional.of(SpecStatus.ERROR), s.baselineStatus());
            assertFalse(s.baselineErrors().isEmpty());
            assertEquals(PUMP, s.baselineErrors().get(0).location().file());
            assertEquals(Transition.NEW, sep(s).transition());
            assertEquals(Optional.empty(), sep(s).baselineStatus());
        }
    }

    @Test
    void aProjectInASubfolderReadsItsProfilesAtTheBaselineAndTheyMayNotLeaveIt(@TempDir Path dir) throws Exception {
        try (GitProject repo = new GitProject(dir, "plant")) {
            String profiled = GitProject.spec("P-1", "40 MN/m", ",\n  \"profiles\": [\"profiles/plant.json\"]")
                    .replace("\"criteria\": [{\"id\": \"SEP\", \"rule\": \"separation\", \"margin\": \"20 %\"}]",
                            "\"criteria\": []");
            repo.write(PUMP, profiled);
            repo.write("src/vibration/profiles/plant.json", "{\"format\": \"resonance-gate-profile/1\", \"criteria\":"
                    + " [{\"id\": \"SEP\", \"rule\": \"separation\", \"margin\": \"20 %\"}]}");
            repo.write("src/vibration/escape.json", GitProject.spec("E-1", "40 MN/m", ",\n  \"profiles\": [\"../../../x.json\"]"));
            repo.commit("plant with a profile", MONDAY);
            // the margin widens to 30 %: 0.225 separation no longer holds
            repo.write("src/vibration/profiles/plant.json", "{\"format\": \"resonance-gate-profile/1\", \"criteria\":"
                    + " [{\"id\": \"SEP\", \"rule\": \"separation\", \"margin\": \"30 %\"}]}");

            List<SpecChange> specs = repo.judge("HEAD", NOW).baseline().orElseThrow().specs();

            SpecChange escape = specs.get(0);
            assertEquals("src/vibration/escape.json", escape.file());
            assertTrue(escape.baselineErrors().get(0).message().contains("lies outside the project"),
                    escape.baselineErrors().toString());
            SpecChange pump = specs.get(1);
            assertEquals(Optional.of(SpecStatus.PASS), pump.baselineStatus());
            assertEquals(Transition.NEW, sep(pump).transition());
            assertEquals(0.2, sep(pump).baselineLimit().getAsDouble(), 1e-12);
            assertEquals(0.3, sep(pump).currentLimit().getAsDouble(), 1e-12);
            assertEquals("src/vibration/profiles/plant.json", sep(pump).location().file());
        }
    }

    @Test
    void aSpecFolderMissingAtTheBaselineMakesEverySpecAdded(@TempDir Path dir) throws Exception {
        try (GitProject repo = new GitProject(dir, "")) {
            repo.write("README.txt", "plant");
            repo.commit("empty plant", MONDAY);
            repo.write(PUMP, GitProject.spec("P-1", "20 MN/m", ""));
            Results r = repo.judge("HEAD", NOW);
            assertEquals(SpecChange.Kind.ADDED, only(r).kind());
            assertEquals(Transition.NEW, sep(only(r)).transition());
            assertTrue(r.baseline().orElseThrow().notes().get(0).startsWith("no spec directory src/vibration at HEAD"));
        }
    }

    @Test
    void anUnknownRevisionIsNamedWithWhatToDo(@TempDir Path dir) {
        try (GitProject repo = new GitProject(dir, "")) {
            repo.write(PUMP, GitProject.spec("P-1", "40 MN/m", ""));
            repo.commit("one", MONDAY);
            BaselineException e = assertThrows(BaselineException.class, () -> repo.judge("origin/main", NOW));
            assertTrue(e.getMessage().contains("unknown Git revision \"origin/main\""), e.getMessage());
            assertTrue(e.getMessage().contains("git fetch origin main") && e.getMessage().contains("git branch -a"),
                    e.getMessage());
            assertFalse(e.getMessage().contains("shallow"), e.getMessage());
        }
    }

    @Test
    void aFolderOutsideAnyRepositoryIsNotARepository(@TempDir Path dir) throws Exception {
        Path project = dir.resolve("no-git");
        java.nio.file.Files.createDirectories(project);
        org.resonancegate.check.CheckRequest request = new org.resonancegate.check.CheckRequest(project, List.of(), NOW);
        BaselineException e = assertThrows(BaselineException.class, () -> BaselineRun.compare(request,
                new Results(List.of()), new BaselineRequest("HEAD", Path.of("src/vibration"), p -> true)));
        assertTrue(e.getMessage().contains(project.toString()) && e.getMessage().contains("not inside one"),
                e.getMessage());
    }

    @Test
    void aShallowCloneWithoutTheRevisionSaysHowToFetchIt(@TempDir Path dir) throws Exception {
        try (GitProject origin = new GitProject(dir.resolve("origin"), "")) {
            origin.write(PUMP, GitProject.spec("P-1", "40 MN/m", ""));
            origin.commit("one", MONDAY);
            origin.write(PUMP, GitProject.spec("P-1", "20 MN/m", ""));
            origin.commit("two", MONDAY.plusSeconds(3600));
        }
        Path clone = dir.resolve("clone");
        try (org.eclipse.jgit.api.Git git = org.eclipse.jgit.api.Git.cloneRepository()
                .setURI(dir.resolve("origin").toUri().toString()).setDirectory(clone.toFile()).setDepth(1).call()) {
            assertFalse(git.getRepository().getObjectDatabase().getShallowCommits().isEmpty(), "the clone is shallow");
        }
        org.resonancegate.check.CheckRequest request = new org.resonancegate.check.CheckRequest(clone, List.of(), NOW);
        BaselineException e = assertThrows(BaselineException.class, () -> BaselineRun.compare(request,
                new Results(List.of()), new BaselineRequest("HEAD~1", Path.of("src/vibration"), p -> true)));
        assertTrue(e.getMessage().contains("HEAD~1") && e.getMessage().contains("git fetch --unshallow")
                && e.getMessage().contains("--depth"), e.getMessage());
    }
}
