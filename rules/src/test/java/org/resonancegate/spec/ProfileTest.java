package org.resonancegate.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Profiles: shared criteria files, chained, merged by id, kept inside the project. */
class ProfileTest {

    private static final String SPEC_FILE = "src/vibration/chw-p-02.json";

    @TempDir
    Path outer;

    private Path base;
    private TestProject project;

    @BeforeEach
    void setUp() throws IOException {
        base = Files.createDirectories(outer.resolve("plant"));
        project = new TestProject(base);
    }

    private static String profile(String criteria, String... profiles) {
        String list = String.join(", ", java.util.Arrays.stream(profiles).map(p -> "\"" + p + "\"").toList());
        return "{\n  \"format\": \"resonance-gate-profile/1\",\n  \"title\": \"shared\",\n  \"criteria\": [" + criteria
                + "],\n  \"profiles\": [" + list + "]\n}\n";
    }

    private static String spec(String ownCriteria, String... profiles) {
        String list = String.join(", ", java.util.Arrays.stream(profiles).map(p -> "\"" + p + "\"").toList());
        return TestProject.VALID.replace("\"criteria\": [{\"id\": \"SEP\", \"rule\": \"separation\", \"margin\": \"20 %\"}]",
                "\"criteria\": [" + ownCriteria + "],\n  \"profiles\": [" + list + "]");
    }

    private static final String SEP_20 = "{\"id\": \"SEP\", \"rule\": \"separation\", \"margin\": \"20 %\"}";
    private static final String SEP_15 = "{\"id\": \"SEP\", \"rule\": \"separation\", \"margin\": \"15 %\"}";
    private static final String VEL_45 = "{\"id\": \"VEL\", \"rule\": \"velocity\", \"max\": \"4.5 mm/s\"}";
    private static final String VEL_28 = "{\"id\": \"VEL\", \"rule\": \"velocity\", \"max\": \"2.8 mm/s\"}";
    private static final String FORCE = "{\"id\": \"FORCE\", \"rule\": \"transmitted-force\", \"max\": \"2 kN\"}";
    private static final String ISO_A = "{\"id\": \"ISO\", \"rule\": \"isolation\", \"maxTransmissibility\": 0.1}";
    private static final String ISO_B = "{\"id\": \"ISO\", \"rule\": \"isolation\", \"maxTransmissibility\": 0.2}";
    private static final String SAG = "{\"id\": \"SAG\", \"rule\": \"static-deflection\", \"min\": \"3 mm\"}";

    private LoadedSpec loadSpec() {
        List<LoadedSpec> all = project.loadAll();
        return all.stream().filter(l -> l.file().equals(SPEC_FILE)).findFirst().orElseThrow();
    }

    private static List<String> ids(Spec spec) {
        return spec.criteria().stream().map(Criterion::id).toList();
    }

    @Test
    void specCriterionReplacesTheProfilesOfTheSameIdAndComesFirst() {
        String pumps = profile(SEP_15 + ", " + VEL_45);
        project.write("src/profiles/pumps.json", pumps);
        project.write(SPEC_FILE, spec(SEP_20, "../profiles/pumps.json"));
        Spec spec = TestProject.spec(loadSpec());
        assertEquals(List.of("SEP", "VEL"), ids(spec));
        assertEquals(0.2, ((Criterion.Separation) spec.criteria().get(0)).margin().value(), 1e-15);
        assertEquals(SPEC_FILE, spec.criteria().get(0).location().file());
        // The profile's criterion keeps its own file in its location.
        assertEquals(TestProject.at("src/profiles/pumps.json", pumps, VEL_45), spec.criteria().get(1).location());
    }

    @Test
    void aProfilesOwnCriterionReplacesThoseOfTheProfilesItLists() {
        project.write("src/profiles/base.json", profile(VEL_45 + ", " + FORCE));
        project.write("src/profiles/pumps.json", profile(VEL_28, "base.json"));
        project.write(SPEC_FILE, spec("", "../profiles/pumps.json"));
        Spec spec = TestProject.spec(loadSpec());
        assertEquals(List.of("VEL", "FORCE"), ids(spec));
        Criterion.Velocity vel = assertInstanceOf(Criterion.Velocity.class, spec.criteria().get(0));
        assertEquals(2.8e-3, vel.max().si(), 1e-15);
        assertEquals("src/profiles/pumps.json", vel.location().file());
        assertEquals("src/profiles/base.json", spec.criteria().get(1).location().file());
    }

    @Test
    void theSameIdFromTwoProfilesSideBySideIsAmbiguous() {
        project.write("src/profiles/a.json", profile(ISO_A));
        project.write("src/profiles/b.json", profile(ISO_B));
        String text = spec(SEP_20, "../profiles/a.json", "../profiles/b.json");
        project.write(SPEC_FILE, text);
        LoadedSpec loaded = loadSpec();
        SourceLocation entry = TestProject.at(SPEC_FILE, text, "\"../profiles/b.json\"");
        TestProject.assertOnlyDiagnostic(loaded, entry.line(), entry.column(), "criterion \"ISO\" comes from two profiles",
                "src/profiles/a.json:4:", "src/profiles/b.json:4:", "define \"ISO\" in this file");
    }

    @Test
    void theSpecDefiningTheIdResolvesTheAmbiguity() {
        project.write("src/profiles/a.json", profile(ISO_A));
        project.write("src/profiles/b.json", profile(ISO_B));
        project.write(SPEC_FILE, spec(ISO_B.replace("0.2", "0.3"), "../profiles/a.json", "../profiles/b.json"));
        Spec spec = TestProject.spec(loadSpec());
        assertEquals(List.of("ISO"), ids(spec));
        assertEquals(0.3, ((Criterion.Isolation) spec.criteria().get(0)).limit().value().value(), 1e-15);
    }

    @Test
    void aProfileReachedAlongTwoPathsCountsOnce() {
        project.write("src/profiles/common.json", profile(SAG));
        project.write("src/profiles/a.json", profile(ISO_A, "common.json"));
        project.write("src/profiles/b.json", profile(VEL_45, "common.json"));
        project.write(SPEC_FILE, spec(SEP_20, "../profiles/a.json", "../profiles/b.json"));
        Spec spec = TestProject.spec(loadSpec());
        assertEquals(List.of("SEP", "ISO", "SAG", "VEL"), ids(spec));
    }

    @Test
    void aFaultInASharedProfileIsListedOnceAndTheOtherSpecsPointThere() {
        String pumps = profile("{\"id\": \"VEL\", \"rule\": \"velocity\", \"mx\": \"4.5 mm/s\"}");
        project.write("src/profiles/pumps.json", pumps);
        project.write("src/vibration/a.json", spec(SEP_20, "../profiles/pumps.json").replace("CHW-P-02", "P-A"));
        project.write("src/vibration/b.json", spec(SEP_20, "../profiles/pumps.json").replace("CHW-P-02", "P-B"));
        List<LoadedSpec> all = project.loadAll();
        LoadedSpec a = all.stream().filter(l -> l.file().equals("src/vibration/a.json")).findFirst().orElseThrow();
        LoadedSpec b = all.stream().filter(l -> l.file().equals("src/vibration/b.json")).findFirst().orElseThrow();
        SourceLocation typo = TestProject.at("src/profiles/pumps.json", pumps, "\"mx\"");
        // the first spec in file order lists the fault where it is (one line: the typo names the missing key)
        TestProject.assertOnlyDiagnostic(a, typo.line(), typo.column(), "unknown key \"mx\"", "did you mean \"max\"");
        // the next one is an error too, with a line of its own pointing at that listing
        TestProject.assertOnlyDiagnostic(b, 1, 1, "uses src/profiles/pumps.json", "1 error",
                "listed under src/vibration/a.json");
        assertTrue(b.spec().isEmpty());
    }

    @Test
    void aCycleIsADiagnosticInTheProfileThatCloses() {
        project.write("src/profiles/a.json", profile(ISO_A, "b.json"));
        String b = profile(VEL_45, "a.json");
        project.write("src/profiles/b.json", b);
        project.write(SPEC_FILE, spec(SEP_20, "../profiles/a.json"));
        LoadedSpec loaded = loadSpec();
        SourceLocation entry = TestProject.at("src/profiles/b.json", b, "\"a.json\"");
        TestProject.assertOnlyDiagnostic(loaded, entry.line(), entry.column(),
                "profile cycle: src/profiles/a.json → src/profiles/b.json → src/profiles/a.json");
        assertEquals("src/profiles/b.json", loaded.diagnostics().get(0).location().file());
    }

    @Test
    void aProfileOutsideTheProjectIsRefused() throws IOException {
        Files.writeString(outer.resolve("shared.json"), profile(VEL_45));
        String text = spec(SEP_20, "../../../shared.json");
        project.write(SPEC_FILE, text);
        SourceLocation entry = TestProject.at(SPEC_FILE, text, "\"../../../shared.json\"");
        TestProject.assertOnlyDiagnostic(loadSpec(), entry.line(), entry.column(), "lies outside the project",
                "symbolic links resolved");
    }

    @Test
    void aSymbolicLinkLeadingOutsideTheProjectIsRefused() throws IOException {
        Path target = Files.writeString(outer.resolve("shared.json"), profile(VEL_45));
        Files.createDirectories(base.resolve("src/profiles"));
        try {
            Files.createSymbolicLink(base.resolve("src/profiles/linked.json"), target);
        } catch (UnsupportedOperationException | IOException e) {
            assumeTrue(false, "symbolic links not available here");
        }
        String text = spec(SEP_20, "../profiles/linked.json");
        project.write(SPEC_FILE, text);
        SourceLocation entry = TestProject.at(SPEC_FILE, text, "\"../profiles/linked.json\"");
        TestProject.assertOnlyDiagnostic(loadSpec(), entry.line(), entry.column(), "lies outside the project");
    }

    @Test
    void aSymbolicLinkStayingInsideTheProjectIsFollowed() throws IOException {
        Path target = project.write("shared/pumps.json", profile(VEL_45));
        Files.createDirectories(base.resolve("src/profiles"));
        try {
            Files.createSymbolicLink(base.resolve("src/profiles/linked.json"), target);
        } catch (UnsupportedOperationException | IOException e) {
            assumeTrue(false, "symbolic links not available here");
        }
        project.write(SPEC_FILE, spec(SEP_20, "../profiles/linked.json"));
        Spec spec = TestProject.spec(loadSpec());
        assertEquals(List.of("SEP", "VEL"), ids(spec));
        // Locations name the file the link resolves to.
        assertEquals("shared/pumps.json", spec.criteria().get(1).location().file());
    }

    @Test
    void anAbsoluteProfilePathIsRefused() {
        Path target = project.write("src/profiles/pumps.json", profile(VEL_45));
        String written = target.toAbsolutePath().toString().replace('\\', '/');
        String text = spec(SEP_20, written);
        project.write(SPEC_FILE, text);
        SourceLocation entry = TestProject.at(SPEC_FILE, text, "\"" + written + "\"");
        TestProject.assertOnlyDiagnostic(loadSpec(), entry.line(), entry.column(), "must be a path relative to this file");
    }

    @Test
    void anUnsupportedProfileFormatIsRefused() {
        String pumps = profile(VEL_45).replace("resonance-gate-profile/1", "resonance-gate-profile/9");
        project.write("src/profiles/pumps.json", pumps);
        project.write(SPEC_FILE, spec(SEP_20, "../profiles/pumps.json"));
        LoadedSpec loaded = loadSpec();
        TestProject.assertOnlyDiagnostic(loaded, 2, 13, "unsupported profile format \"resonance-gate-profile/9\"",
                "\"resonance-gate-profile/1\"");
        assertEquals("src/profiles/pumps.json", loaded.diagnostics().get(0).location().file());
    }

    @Test
    void aMissingProfileIsADiagnostic() {
        String text = spec(SEP_20, "../profiles/nope.json");
        project.write(SPEC_FILE, text);
        SourceLocation entry = TestProject.at(SPEC_FILE, text, "\"../profiles/nope.json\"");
        TestProject.assertOnlyDiagnostic(loadSpec(), entry.line(), entry.column(), "not found",
                "src/profiles/nope.json");
    }

    @Test
    void diagnosticsInsideAProfileCarryTheProfilesFile() {
        String pumps = "{\n  \"format\": \"resonance-gate-profile/1\",\n  \"model\": {},\n"
                + "  \"criteria\": [{\"id\": \"VEL\", \"rule\": \"velocty\", \"max\": \"4.5 mm/s\"}]\n}\n";
        project.write("src/profiles/pumps.json", pumps);
        project.write(SPEC_FILE, spec(SEP_20, "../profiles/pumps.json"));
        LoadedSpec loaded = loadSpec();
        SourceLocation model = TestProject.at("src/profiles/pumps.json", pumps, "\"model\"");
        SourceLocation rule = TestProject.at("src/profiles/pumps.json", pumps, "\"velocty\"");
        Diagnostic d = TestProject.assertDiagnostic(loaded, model.line(), model.column(), "unknown key \"model\"",
                "format, title, criteria, profiles");
        assertEquals("src/profiles/pumps.json", d.location().file());
        Diagnostic r = TestProject.assertDiagnostic(loaded, rule.line(), rule.column(), "did you mean \"velocity\"");
        assertEquals("src/profiles/pumps.json", r.location().file());
        assertEquals(2, loaded.diagnostics().size());
    }

    @Test
    void aSpecListedAsAProfileIsRefused() {
        project.write("src/vibration/other.json", TestProject.VALID.replace("CHW-P-02", "CHW-P-03"));
        project.write(SPEC_FILE, spec(SEP_20, "other.json"));
        LoadedSpec loaded = loadSpec();
        TestProject.assertDiagnostic(loaded, 2, 13, "is a spec, not a profile");
        assertEquals("src/vibration/other.json", loaded.diagnostics().get(0).location().file());
    }

    @Test
    void profileFilesAreLeftOutOfTheResultAndWaiversMayNameTheirCriteria() {
        project.write("src/vibration/shared/pumps.json", profile(VEL_45));
        String text = spec("", "shared/pumps.json").replace("\"criteria\"",
                "\"waivers\": [{\"criterion\": \"VEL\", \"reason\": \"review 14\", \"expires\": \"2027-03-31\"}],\n  \"criteria\"");
        project.write(SPEC_FILE, text);
        List<LoadedSpec> all = project.loadAll();
        assertEquals(List.of(SPEC_FILE), all.stream().map(LoadedSpec::file).toList());
        Spec spec = TestProject.spec(all.get(0));
        assertEquals(List.of("VEL"), ids(spec));
        assertEquals("VEL", spec.waivers().get(0).criterion());
    }

    @Test
    void emptyCriteriaAreRefusedWhenTheProfilesSupplyNone() {
        project.write("src/profiles/empty.json", profile(""));
        String text = spec("", "../profiles/empty.json");
        project.write(SPEC_FILE, text);
        SourceLocation criteria = TestProject.at(SPEC_FILE, text, "[],");
        TestProject.assertOnlyDiagnostic(loadSpec(), criteria.line(), criteria.column(), "no criteria in force");
    }
}
