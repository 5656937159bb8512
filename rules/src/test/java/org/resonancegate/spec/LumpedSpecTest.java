package org.resonancegate.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.resonancegate.units.Dimension;

/**
 * {@code lumped} models: valid translation and torsion lines read into SI records, and every rule
 * of the format on masses, springs, damping, ground ties and placements gives its diagnostic at the
 * right place. Conversions by the units' definitions: 1 t = 1000 kg, 1 MN/m = 1e6 N/m,
 * 1 kN·m/rad = 1e3 N·m/rad, 1 mrad = 1e-3 rad, 1 Hz = 2π rad/s.
 */
class LumpedSpecTest {

    private static final String FILE = "src/vibration/skid.json";

    /** A two-stage pump skid: frame on isolators, pump on pads; every spring damped. */
    static final String TRANSLATION = """
            {
              "format": "resonance-gate/1",
              "id": "HX-SKID-4",
              "model": {"kind": "lumped", "motion": "translation",
                "masses": [{"name": "frame", "mass": "400 kg"}, {"name": "pump", "mass": "0.9 t"}],
                "springs": [
                  {"name": "isolators", "from": "ground", "to": "frame", "stiffness": "1.2 MN/m",
                   "damping": {"coefficient": "2 kN·s/m"}},
                  {"name": "pads", "from": "frame", "to": "pump", "stiffness": "30 MN/m",
                   "damping": {"lossFactor": 0.1}}
                ]},
              "operation": {"speed": {"min": "900 rpm", "max": "1480 rpm"}},
              "excitations": [
                {"name": "impeller", "kind": "unbalance", "unbalance": "120 g·mm", "at": "pump"},
                {"name": "hum", "kind": "force", "frequency": "100 Hz", "amplitude": "0.2 kN", "at": "frame"},
                {"name": "floor", "kind": "base-motion", "order": 1, "velocity": "0.5 mm/s"}
              ],
              "criteria": [
                {"id": "SEP", "rule": "separation", "margin": "20 %"},
                {"id": "ISO", "rule": "isolation", "maxTransmissibility": 0.1, "at": "pump"},
                {"id": "DISP", "rule": "displacement", "max": "50 µm", "at": "pump"},
                {"id": "VEL", "rule": "velocity", "max": "2.8 mm/s", "at": "frame"},
                {"id": "FORCE", "rule": "transmitted-force", "max": "1.5 kN"},
                {"id": "SAG", "rule": "static-deflection", "min": "3 mm"}
              ]
            }
            """;

    /** A motor–coupling–fan shaft line floating on its bearings; model damping. */
    static final String TORSION = """
            {
              "format": "resonance-gate/1",
              "id": "AHU-7-SHAFT",
              "model": {"kind": "lumped", "motion": "torsion", "free": true,
                "masses": [{"name": "motor", "inertia": "1.8 kg·m²"}, {"name": "fan", "inertia": "6.5 kg m2"}],
                "springs": [{"name": "coupling", "from": "motor", "to": "fan", "stiffness": "45 kN·m/rad"}],
                "damping": {"ratio": 0.02}},
              "operation": {"speed": "1480 rpm"},
              "excitations": [
                {"name": "pole pass", "kind": "force", "order": 2, "amplitude": "120 N·m", "at": "motor"},
                {"name": "blade pass", "kind": "order", "order": 9}
              ],
              "criteria": [
                {"id": "SEP", "rule": "separation", "margin": "15 %"},
                {"id": "TWIST", "rule": "displacement", "max": "2 mrad", "at": "fan"},
                {"id": "RATE", "rule": "velocity", "max": "0.5 rad/s", "measure": "peak", "at": "fan"},
                {"id": "TORQUE", "rule": "transmitted-force", "max": "1.2 kN·m"}
              ]
            }
            """;

    @TempDir
    Path base;

    private String text;
    private LoadedSpec loaded;

    private void load(String content) {
        text = content;
        loaded = new TestProject(base).loadOne(FILE, text);
    }

    private void edit(String valid, String from, String to) {
        assertTrue(valid.contains(from), from);
        load(valid.replace(from, to));
    }

    private void expect(String snippet, String... words) {
        SourceLocation at = TestProject.at(FILE, text, snippet);
        TestProject.assertDiagnostic(loaded, at.line(), at.column(), words);
    }

    /** As {@link #expectOnly}, for the first {@code snippet} after {@code after}. */
    private void expectOnlyAfter(String after, String snippet, String... words) {
        int from = text.indexOf(after);
        assertTrue(from >= 0, after);
        SourceLocation at = TestProject.at(FILE, text.substring(0, from) + text.substring(from).replaceFirst(
                java.util.regex.Pattern.quote(snippet), "\u0000"), "\u0000");
        TestProject.assertOnlyDiagnostic(loaded, at.line(), at.column(), words);
    }

    private void expectOnly(String snippet, String... words) {
        SourceLocation at = TestProject.at(FILE, text, snippet);
        TestProject.assertOnlyDiagnostic(loaded, at.line(), at.column(), words);
    }

    // --- valid -----------------------------------------------------------------------------

    @Test
    void aTranslationLineReadsIntoSiRecords() {
        load(TRANSLATION);
        Spec spec = TestProject.spec(loaded);
        Model.Lumped model = assertInstanceOf(Model.Lumped.class, spec.model());
        assertEquals(Model.Motion.TRANSLATION, model.motion());
        assertEquals(false, model.free());
        assertEquals(Optional.empty(), model.damping());
        assertEquals(List.of("frame", "pump"), model.masses().stream().map(Model.LumpedMass::name).toList());
        assertEquals(400, model.masses().get(0).mass().si(), 1e-12);
        assertEquals(900, model.masses().get(1).mass().si(), 1e-9);
        assertEquals(Dimension.MASS, model.masses().get(1).mass().dimension());

        Model.Spring isolators = model.springs().get(0);
        assertEquals("isolators", isolators.name());
        assertEquals(Model.Lumped.GROUND, isolators.from());
        assertEquals("frame", isolators.to());
        assertEquals(1.2e6, isolators.stiffness().si(), 1e-6);
        ElementDamping.Viscous dashpot = assertInstanceOf(ElementDamping.Viscous.class, isolators.damping().orElseThrow());
        assertEquals(2000, dashpot.values().x(), 1e-9);
        assertEquals(2000, dashpot.values().z(), 1e-9);
        Model.Spring pads = model.springs().get(1);
        assertEquals(3e7, pads.stiffness().si(), 1e-3);
        ElementDamping.Hysteretic eta = assertInstanceOf(ElementDamping.Hysteretic.class, pads.damping().orElseThrow());
        assertEquals(0.1, eta.values().x(), 1e-15);
        assertEquals(TestProject.at(FILE, text, "{\"name\": \"pads\""), pads.location());

        Excitation.Unbalance impeller = assertInstanceOf(Excitation.Unbalance.class, spec.excitations().get(0));
        Placement.AtMass onPump = assertInstanceOf(Placement.AtMass.class, impeller.placement());
        assertEquals("pump", onPump.mass());
        assertEquals(TestProject.at(FILE, text, "\"pump\"},"), onPump.location());
        Excitation.Force hum = assertInstanceOf(Excitation.Force.class, spec.excitations().get(1));
        assertEquals("frame", assertInstanceOf(Placement.AtMass.class, hum.placement()).mass());
        assertEquals(Dimension.FORCE, hum.amplitude().dimension());
        Excitation.BaseMotion floor = assertInstanceOf(Excitation.BaseMotion.class, spec.excitations().get(2));
        assertEquals(1.0, floor.direction().z(), 0);

        Criterion.Isolation iso = assertInstanceOf(Criterion.Isolation.class, spec.criteria().get(1));
        assertEquals("pump", assertInstanceOf(ResponsePoint.Mass.class, iso.at().orElseThrow()).name());
        Criterion.Displacement disp = assertInstanceOf(Criterion.Displacement.class, spec.criteria().get(2));
        assertEquals("pump", assertInstanceOf(ResponsePoint.Mass.class, disp.at().orElseThrow()).name());
        assertEquals(50e-6, disp.max().si(), 1e-18);
        Criterion.Velocity vel = assertInstanceOf(Criterion.Velocity.class, spec.criteria().get(3));
        assertEquals("frame", assertInstanceOf(ResponsePoint.Mass.class, vel.at().orElseThrow()).name());
        Criterion.TransmittedForce force = assertInstanceOf(Criterion.TransmittedForce.class, spec.criteria().get(4));
        assertEquals(Optional.empty(), force.axis());
        assertEquals(Dimension.FORCE, force.max().dimension());
    }

    @Test
    void aFreeTorsionLineReadsIntoSiRecords() {
        load(TORSION);
        Spec spec = TestProject.spec(loaded);
        Model.Lumped model = assertInstanceOf(Model.Lumped.class, spec.model());
        assertEquals(Model.Motion.TORSION, model.motion());
        assertTrue(model.free());
        assertEquals(0.02, assertInstanceOf(Damping.Ratio.class, model.damping().orElseThrow()).value().value(), 1e-15);
        assertEquals(1.8, model.masses().get(0).mass().si(), 1e-15);
        assertEquals(Dimension.INERTIA, model.masses().get(0).mass().dimension());
        assertEquals(6.5, model.masses().get(1).mass().si(), 1e-15);
        Model.Spring coupling = model.springs().get(0);
        assertEquals(45e3, coupling.stiffness().si(), 1e-9);
        assertEquals(Dimension.TORSIONAL_STIFFNESS, coupling.stiffness().dimension());
        assertEquals(Optional.empty(), coupling.damping());

        Excitation.Force pole = assertInstanceOf(Excitation.Force.class, spec.excitations().get(0));
        assertEquals(Dimension.TORQUE, pole.amplitude().dimension());
        assertEquals(120, pole.amplitude().si(), 1e-12);
        assertEquals("motor", assertInstanceOf(Placement.AtMass.class, pole.placement()).mass());

        Criterion.Displacement twist = assertInstanceOf(Criterion.Displacement.class, spec.criteria().get(1));
        assertEquals(Dimension.ANGLE, twist.max().dimension());
        assertEquals(2e-3, twist.max().si(), 1e-18);
        Criterion.Velocity rate = assertInstanceOf(Criterion.Velocity.class, spec.criteria().get(2));
        assertEquals(Dimension.ANGULAR_VELOCITY, rate.max().dimension());
        assertEquals(0.5, rate.max().si(), 1e-15);
        Criterion.TransmittedForce torque = assertInstanceOf(Criterion.TransmittedForce.class, spec.criteria().get(3));
        assertEquals(Dimension.TORQUE, torque.max().dimension());
        assertEquals(1200, torque.max().si(), 1e-9);
    }

    @Test
    void withOneMassAtMayBeLeftOutAndMeansThatMass() {
        load("""
                {"format": "resonance-gate/1", "id": "ONE",
                 "model": {"kind": "lumped", "motion": "translation", "masses": [{"name": "block", "mass": "500 kg"}],
                   "springs": [{"name": "pad", "from": "block", "to": "ground", "stiffness": "2 MN/m"}],
                   "damping": {"q": 10}},
                 "operation": {"speed": "1480 rpm"},
                 "excitations": [{"name": "u", "kind": "unbalance", "unbalance": "50 g·mm"},
                                 {"name": "b", "kind": "base-motion", "frequency": "30 Hz", "displacement": "5 µm"}],
                 "criteria": [{"id": "D", "rule": "displacement", "max": "0.1 mm"},
                              {"id": "I", "rule": "isolation", "maxTransmissibility": 0.2}]}
                """);
        Spec spec = TestProject.spec(loaded);
        assertEquals("block", assertInstanceOf(Placement.AtMass.class, spec.excitations().get(0).placement()).mass());
        Criterion.Displacement d = assertInstanceOf(Criterion.Displacement.class, spec.criteria().get(0));
        assertEquals("block", assertInstanceOf(ResponsePoint.Mass.class, d.at().orElseThrow()).name());
        Criterion.Isolation i = assertInstanceOf(Criterion.Isolation.class, spec.criteria().get(1));
        assertEquals("block", assertInstanceOf(ResponsePoint.Mass.class, i.at().orElseThrow()).name());
    }

    // --- masses and springs ----------------------------------------------------------------

    @Test
    void springNamingAnUnknownMassSuggestsTheNearest() {
        edit(TRANSLATION, "\"from\": \"frame\", \"to\": \"pump\"", "\"from\": \"frame\", \"to\": \"pmp\"");
        expectOnly("\"pmp\"", "\"to\" of spring \"pads\"", "mass \"pmp\" is not defined", "did you mean \"pump\"",
                "frame, pump, ground");
    }

    @Test
    void springFromAMassToItselfIsRefused() {
        edit(TRANSLATION, "\"from\": \"frame\", \"to\": \"pump\"", "\"from\": \"pump\", \"to\": \"pump\"");
        expect("\"pump\", \"stiffness\"", "spring \"pads\" joins \"pump\" to itself", "\"ground\"");
    }

    @Test
    void massNamesAreUniqueAndGroundIsReserved() {
        edit(TRANSLATION, "{\"name\": \"pump\", \"mass\": \"0.9 t\"}", "{\"name\": \"frame\", \"mass\": \"0.9 t\"}");
        SourceLocation second = TestProject.at(FILE, text, "\"frame\", \"mass\": \"0.9 t\"");
        TestProject.assertDiagnostic(loaded, second.line(), second.column(), "two masses are named \"frame\"", "line 5");
        edit(TRANSLATION, "{\"name\": \"pump\", \"mass\": \"0.9 t\"}", "{\"name\": \"ground\", \"mass\": \"0.9 t\"}");
        expect("\"ground\", \"mass\"", "\"ground\" is reserved for the fixed reference");
    }

    @Test
    void springNamesAreUnique() {
        edit(TRANSLATION, "{\"name\": \"pads\"", "{\"name\": \"isolators\"");
        expectOnly("\"isolators\", \"from\": \"frame\"", "two springs are named \"isolators\"", "line 7");
    }

    @Test
    void torsionMassesTakeAnInertiaAndTranslationMassesAMass() {
        edit(TORSION, "{\"name\": \"motor\", \"inertia\": \"1.8 kg·m²\"}", "{\"name\": \"motor\", \"mass\": \"180 kg\"}");
        expect("\"mass\"", "\"mass\" does not fit a torsion line", "\"inertia\" (kg·m²)");
        expect("{\"name\": \"motor\"", "missing required key \"inertia\" in mass \"motor\"");
        edit(TORSION, "\"45 kN·m/rad\"", "\"45 kN/m\"");
        expectOnly("\"45 kN/m\"", "\"stiffness\"", "N·m/rad");
    }

    @Test
    void motionIsRequiredAndChecked() {
        edit(TRANSLATION, "\"motion\": \"translation\"", "\"motion\": \"translaton\"");
        expectOnly("\"translaton\"", "unknown motion \"translaton\"", "did you mean \"translation\"", "torsion");
    }

    @Test
    void aPartNotTiedToGroundIsRefusedNamingItsMasses() {
        // Cut the isolators loose: the frame–pump pair floats.
        edit(TRANSLATION, "\"from\": \"ground\", \"to\": \"frame\"", "\"from\": \"pump\", \"to\": \"frame\"");
        expectOnly("{\"name\": \"frame\", \"mass\"", "the part of masses \"frame\", \"pump\" is not tied to ground",
                "\"free\": true");
        // The torsion line floats, and says so; without "free" it is refused.
        edit(TORSION, "\"free\": true,", "");
        expectOnly("{\"name\": \"motor\"", "\"motor\", \"fan\" is not tied to ground", "zero frequency");
        edit(TORSION, "\"free\": true", "\"free\": \"yes\"");
        expectOnly("\"yes\"", "\"free\" must be true or false");
    }

    @Test
    void moreThanAThousandMassesIsADiagnostic() {
        StringBuilder masses = new StringBuilder();
        for (int i = 0; i < 1001; i++) {
            masses.append(i == 0 ? "" : ", ").append("{\"name\": \"m").append(i).append("\", \"mass\": \"1 kg\"}");
        }
        edit(TRANSLATION, "[{\"name\": \"frame\", \"mass\": \"400 kg\"}, {\"name\": \"pump\", \"mass\": \"0.9 t\"}]",
                "[" + masses + "]");
        // The JSON reader holds every list to the limit; the names in later messages stay short.
        expect("[{\"name\": \"m0\"", "a list of 1001 elements, over the limit of 1000");
        loaded.diagnostics().forEach(d -> assertTrue(d.message().length() < 400, d.message()));
    }

    @Test
    void moreThanTwoHundredMassesIsADiagnosticBeforeAnythingIsSolved() {
        StringBuilder masses = new StringBuilder();
        for (int i = 0; i < 201; i++) {
            masses.append(i == 0 ? "" : ", ").append("{\"name\": \"m").append(i).append("\", \"mass\": \"1 kg\"}");
        }
        edit(TRANSLATION, "[{\"name\": \"frame\", \"mass\": \"400 kg\"}, {\"name\": \"pump\", \"mass\": \"0.9 t\"}]",
                "[" + masses + "]");
        expect("[{\"name\": \"m0\"", "\"masses\" lists 201 entries", "at most 200", "lump neighbouring masses");
        assertTrue(loaded.spec().isEmpty());
    }

    // --- damping ---------------------------------------------------------------------------

    @Test
    void withoutModelDampingEverySpringCarriesItsOwn() {
        edit(TRANSLATION, ",\n       \"damping\": {\"lossFactor\": 0.1}}", "}");
        expectOnly("{\"name\": \"pads\"", "spring \"pads\" has no damping and the model has none", "lossFactor");
    }

    @Test
    void modelDampingAndSpringDampingAreNotBoth() {
        edit(TRANSLATION, "\n    ]},", "\n    ], \"damping\": {\"ratio\": 0.05}},");
        expect("\"2 kN·s/m\"", "spring \"isolators\" carries its own damping", "one or the other");
        expect("0.1}}", "spring \"pads\" carries its own damping");
        assertEquals(2, loaded.diagnostics().size());
    }

    @Test
    void aCoefficientAtModelLevelBelongsOnTheSprings() {
        edit(TORSION, "\"damping\": {\"ratio\": 0.02}", "\"damping\": {\"coefficient\": \"5 N·m·s/rad\"}");
        expectOnly("\"coefficient\"", "applies to a single model only", "on each spring", "ratio, lossFactor, q or logDecrement");
    }

    @Test
    void springDampingTakesOneValueInItsUnits() {
        edit(TRANSLATION, "{\"coefficient\": \"2 kN·s/m\"}", "{\"coefficient\": {\"x\": \"2 kN·s/m\"}}");
        expectOnly("{\"x\"", "one value", "along the line");
        edit(TRANSLATION, "{\"coefficient\": \"2 kN·s/m\"}", "{\"ratio\": 0.05}");
        expectOnly("\"ratio\"", "modal damping and belongs in the model's \"damping\"");
        edit(TRANSLATION, "{\"coefficient\": \"2 kN·s/m\"}", "{\"coefficent\": \"2 kN·s/m\"}");
        expect("\"coefficent\"", "did you mean \"coefficient\"");
    }

    // --- placements ------------------------------------------------------------------------

    @Test
    void withSeveralMassesAForceNeedsAt() {
        edit(TRANSLATION, ", \"at\": \"pump\"},\n    {\"name\": \"hum\"", "},\n    {\"name\": \"hum\"");
        expectOnly("{\"name\": \"impeller\"", "excitation \"impeller\" needs \"at\"", "several masses (frame, pump)");
    }

    @Test
    void anExcitationAtAnUnknownMass() {
        edit(TRANSLATION, "\"amplitude\": \"0.2 kN\", \"at\": \"frame\"", "\"amplitude\": \"0.2 kN\", \"at\": \"fram\"");
        expectOnly("\"fram\"", "mass \"fram\" is not defined", "did you mean \"frame\"");
    }

    @Test
    void placementKeysThatDoNotFitALine() {
        edit(TRANSLATION, "\"0.2 kN\", \"at\": \"frame\"}", "\"0.2 kN\", \"at\": \"frame\", \"axis\": \"z\"}");
        expectOnly("\"axis\"", "a lumped model acts along its line");
        edit(TRANSLATION, "\"velocity\": \"0.5 mm/s\"}", "\"velocity\": \"0.5 mm/s\", \"at\": \"pump\"}");
        expectOnly("\"at\": \"pump\"}\n  ]", "base motion moves the ground under every spring");
        edit(TRANSLATION, "\"0.2 kN\", \"at\": \"frame\"}", "\"0.2 kN\", \"at\": {\"x\": \"0 m\", \"y\": \"0 m\", \"z\": \"0 m\"}}");
        expectOnly("{\"x\"", "names a mass of the lumped model");
    }

    @Test
    void torsionRefusesUnbalanceBaseMotionAndStaticDeflection() {
        edit(TORSION, "{\"name\": \"blade pass\", \"kind\": \"order\", \"order\": 9}",
                "{\"name\": \"rotor\", \"kind\": \"unbalance\", \"unbalance\": \"10 g·mm\", \"at\": \"fan\"}");
        expectOnly("\"unbalance\", \"unbalance\"", "\"unbalance\" does not apply to a torsion line", "torque");
        edit(TORSION, "{\"name\": \"blade pass\", \"kind\": \"order\", \"order\": 9}",
                "{\"name\": \"floor\", \"kind\": \"base-motion\", \"frequency\": \"30 Hz\", \"displacement\": \"5 µm\"}");
        expectOnly("\"base-motion\"", "\"base-motion\" does not apply to a torsion line");
        edit(TORSION, "{\"id\": \"SEP\", \"rule\": \"separation\", \"margin\": \"15 %\"}",
                "{\"id\": \"SAG\", \"rule\": \"static-deflection\", \"max\": \"3 mm\"}");
        expectOnly("{\"id\": \"SAG\"", "\"static-deflection\" does not apply to a torsion line");
    }

    @Test
    void limitsCarryTheUnitsOfTheMotion() {
        edit(TORSION, "\"max\": \"2 mrad\"", "\"max\": \"2 mm\"");
        expectOnly("\"2 mm\"", "\"max\" of criterion \"TWIST\" is a translation value", "an angle, such as");
        edit(TRANSLATION, "\"max\": \"50 µm\"", "\"max\": \"1 deg\"");
        expectOnly("\"1 deg\"", "\"max\" of criterion \"DISP\" is a torsion value", "a length");
        edit(TORSION, "\"amplitude\": \"120 N·m\"", "\"amplitude\": \"120 N\"");
        expectOnly("\"120 N\"", "\"amplitude\"", "N·m");
    }

    @Test
    void withSeveralMassesCriteriaNeedAt() {
        edit(TRANSLATION, ", \"max\": \"50 µm\", \"at\": \"pump\"}", ", \"max\": \"50 µm\"}");
        expectOnly("{\"id\": \"DISP\"", "criterion \"DISP\" needs \"at\"", "several masses (frame, pump)");
        // Isolation needs it only when base motion is compared with a mass's motion.
        edit(TRANSLATION, ", \"maxTransmissibility\": 0.1, \"at\": \"pump\"}", ", \"maxTransmissibility\": 0.1}");
        expectOnly("{\"id\": \"ISO\"", "criterion \"ISO\" needs \"at\"", "compared with the base motion");
    }

    @Test
    void criterionAtAnUnknownMassAndAxisOnALine() {
        edit(TRANSLATION, "\"max\": \"2.8 mm/s\", \"at\": \"frame\"", "\"max\": \"2.8 mm/s\", \"at\": \"pumps\"");
        expectOnly("\"pumps\"", "criterion \"VEL\"", "mass \"pumps\" is not defined", "did you mean \"pump\"");
        edit(TRANSLATION, "\"max\": \"2.8 mm/s\", \"at\": \"frame\"", "\"max\": \"2.8 mm/s\", \"at\": \"frame\", \"axis\": \"z\"");
        expectOnly("\"axis\"", "goes with a point on a rigid body");
        edit(TRANSLATION, "\"max\": \"1.5 kN\"", "\"max\": \"1.5 kN\", \"axis\": \"x\"");
        expectOnly("{\"id\": \"FORCE\"", "only a rigid body's mounts have axes");
        edit(TRANSLATION, "\"margin\": \"20 %\"", "\"margin\": \"20 %\", \"at\": \"pump\"");
        expectOnlyAfter("\"margin\"", "\"at\"", "rule \"separation\" looks at the modes");
    }

    @Test
    void baseMotionUnderALineTakesNoDirection() {
        edit(TRANSLATION, "\"velocity\": \"0.5 mm/s\"}", "\"velocity\": \"0.5 mm/s\", \"direction\": {\"x\": 1, \"y\": 0, \"z\": 0}}");
        expectOnly("\"direction\"", "a lumped line is vertical");
        edit(TRANSLATION, "\"0.2 kN\", \"at\": \"frame\"", "\"0.2 kN\", \"at\": \"ground\"");
        expectOnly("\"ground\"}", "names \"ground\", which does not move", "frame, pump");
    }

    @Test
    void aSpringWhoseDampingIsWrongIsNotAlsoCalledUndamped() {
        edit(TRANSLATION, "{\"lossFactor\": 0.1}", "{\"lossFactor\": -0.1}");
        expectOnly("-0.1", "\"lossFactor\" must lie in (0, ∞)");
    }

    @Test
    void isolationWithoutBaseMotionNeedsNoMassOnALineOfSeveral() {
        edit(TRANSLATION, ",\n    {\"name\": \"floor\", \"kind\": \"base-motion\", \"order\": 1, \"velocity\": \"0.5 mm/s\"}", "");
        text = text.replace(", \"maxTransmissibility\": 0.1, \"at\": \"pump\"}", ", \"maxTransmissibility\": 0.1}");
        loaded = new TestProject(base).loadOne(FILE, text);
        Criterion.Isolation iso = assertInstanceOf(Criterion.Isolation.class, TestProject.spec(loaded).criteria().get(1));
        // The force transmissibility is the whole force into the ground: no mass to name.
        assertEquals(Optional.empty(), iso.at());
    }
}
