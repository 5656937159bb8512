package org.resonancegate.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A profile is read before the model of the spec that lists it is known, so its {@code at} and
 * {@code axis} are judged against each spec's model: a mass a lumped spec has, a point for a rigid
 * body, nothing for a single model. A misfit is reported in the profile, with a hint at the spec.
 */
class ProfilePlacementTest {

    @TempDir
    Path base;

    private static final String PROFILE = """
            {"format": "resonance-gate-profile/1",
             "criteria": [
               {"id": "VEL", "rule": "velocity", "max": "2.8 mm/s", "at": "pump"}
             ]}
            """;

    private LoadedSpec load(String spec, String profile) {
        TestProject project = new TestProject(base);
        project.write("src/vibration/profiles/pumps.json", profile);
        project.write("src/vibration/skid.json", spec);
        return project.loadAll().stream().filter(l -> l.file().equals("src/vibration/skid.json")).findFirst().orElseThrow();
    }

    private static String lumped() {
        return LumpedSpecTest.TRANSLATION.replace("\"criteria\": [", "\"profiles\": [\"profiles/pumps.json\"],\n  \"criteria\": [")
                .replace("{\"id\": \"VEL\", \"rule\": \"velocity\", \"max\": \"2.8 mm/s\", \"at\": \"frame\"},", "");
    }

    @Test
    void aProfileNamingAMassServesALumpedSpecThatHasIt() {
        Spec spec = TestProject.spec(load(lumped(), PROFILE));
        Criterion.Velocity vel = (Criterion.Velocity) spec.criteria().stream().filter(c -> c.id().equals("VEL"))
                .findFirst().orElseThrow();
        assertEquals("pump", assertInstanceOf(ResponsePoint.Mass.class, vel.at().orElseThrow()).name());
        assertEquals("src/vibration/profiles/pumps.json", vel.location().file());
    }

    @Test
    void aMassTheSpecDoesNotHaveIsReportedInTheProfile() {
        LoadedSpec loaded = load(lumped(), PROFILE.replace("\"at\": \"pump\"", "\"at\": \"pumpp\""));
        List<Diagnostic> d = loaded.diagnostics();
        assertEquals(1, d.size(), () -> TestProject.describe(d));
        SourceLocation value = TestProject.at("src/vibration/profiles/pumps.json",
                PROFILE.replace("\"at\": \"pump\"", "\"at\": \"pumpp\""), "\"pumpp\"");
        assertEquals(value, d.get(0).location());
        assertTrue(d.get(0).message().contains("mass \"pumpp\" is not defined (did you mean \"pump\"?)"), d.get(0).message());
        assertTrue(d.get(0).message().contains("comes from a profile and does not fit the model of src/vibration/skid.json"),
                d.get(0).message());
        assertTrue(d.get(0).message().contains("define a criterion \"VEL\" in that spec"), d.get(0).message());
    }

    @Test
    void aSingleSpecCannotUseAProfileThatNamesAMass() {
        String spec = TestProject.VALID.replace("\"criteria\": [",
                "\"profiles\": [\"profiles/pumps.json\"],\n  \"criteria\": [");
        LoadedSpec loaded = load(spec, PROFILE);
        assertTrue(loaded.spec().isEmpty());
        assertTrue(loaded.diagnostics().get(0).message().contains("\"at\" in criterion \"VEL\": a single model needs none"),
                TestProject.describe(loaded.diagnostics()));
    }

    @Test
    void aProfileWithoutAtDoesNotServeALineOfSeveralMasses() {
        LoadedSpec loaded = load(lumped(), PROFILE.replace(", \"at\": \"pump\"", ""));
        assertTrue(loaded.diagnostics().stream().anyMatch(d -> d.location().file().equals("src/vibration/profiles/pumps.json")
                        && d.message().contains("criterion \"VEL\" needs \"at\"")),
                TestProject.describe(loaded.diagnostics()));
    }

    @Test
    void aProfilePointServesARigidBody() {
        String spec = RigidBodySpecTest.VALID.replace("\"criteria\": [",
                        "\"profiles\": [\"profiles/pumps.json\"],\n  \"criteria\": [")
                .replace("{\"id\": \"VEL\", \"rule\": \"velocity\", \"max\": \"4.5 mm/s\", \"at\": {\"x\": \"0.9 m\","
                        + " \"y\": \"0.5 m\", \"z\": \"1.4 m\"},\n     \"axis\": \"y\"},", "");
        Spec read = TestProject.spec(load(spec, PROFILE.replace("\"at\": \"pump\"",
                "\"at\": {\"x\": \"0 m\", \"y\": \"0 m\", \"z\": \"1 m\"}, \"axis\": \"x\"")));
        Criterion.Velocity vel = (Criterion.Velocity) read.criteria().stream().filter(c -> c.id().equals("VEL"))
                .findFirst().orElseThrow();
        ResponsePoint.OnBody at = assertInstanceOf(ResponsePoint.OnBody.class, vel.at().orElseThrow());
        assertEquals(1.0, at.point().z().si(), 1e-15);
        assertEquals(java.util.Optional.of(Axis.X), at.axis());
    }
}
