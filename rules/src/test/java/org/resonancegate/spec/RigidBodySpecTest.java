package org.resonancegate.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.resonancegate.units.Dimension;

/**
 * {@code rigid-body} models: a valid fan set on four mounts reads into SI records; the inertia
 * tensor and the mount layout are checked against physics (a real body's principal moments are
 * positive and each at most the sum of the other two, e.g. Goldstein, Classical Mechanics, ch. 5,
 * from memory; mounts on one line cannot resist a rotation about it, common practice, no source);
 * placements of excitations and criteria give their diagnostics at the right place.
 */
class RigidBodySpecTest {

    private static final String FILE = "src/vibration/fan.json";

    static final String VALID = """
            {
              "format": "resonance-gate/1",
              "id": "AHU-3-FAN",
              "model": {"kind": "rigid-body", "mass": "2.3 t",
                "centreOfGravity": {"x": "0.1 m", "y": "0 m", "z": "650 mm"},
                "inertia": {"xx": "310 kg·m²", "yy": "520 kg·m²", "zz": "640 kg·m²"},
                "productsOfInertia": {"xz": "12 kg·m²"},
                "mounts": [
                  {"name": "A1", "position": {"x": "-0.9 m", "y": "-0.5 m", "z": "0 m"},
                   "stiffness": {"x": "0.4 MN/m", "y": "0.4 MN/m", "z": "1.1 MN/m"}, "damping": {"lossFactor": 0.1}},
                  {"name": "A2", "position": {"x": "0.9 m", "y": "-0.5 m", "z": "0 m"},
                   "stiffness": {"x": "0.4 MN/m", "y": "0.4 MN/m", "z": "1.1 MN/m"},
                   "damping": {"coefficient": {"x": "1 kN·s/m", "y": "1 kN·s/m", "z": "3 kN·s/m"}}},
                  {"name": "B1", "position": {"x": "-0.9 m", "y": "0.5 m", "z": "0 m"},
                   "stiffness": {"x": "0 N/m", "y": "0.4 MN/m", "z": "1.1 MN/m"},
                   "damping": {"lossFactor": {"x": 0, "y": 0.1, "z": 0.15}}},
                  {"name": "B2", "position": {"x": "0.9 m", "y": "0.5 m", "z": "0 m"},
                   "stiffness": {"x": "0.4 MN/m", "y": "0.4 MN/m", "z": "1.1 MN/m"}, "damping": {"coefficient": "2 kN·s/m"}}
                ]},
              "operation": {"speed": {"min": "600 rpm", "max": "1200 rpm"}},
              "excitations": [
                {"name": "wheel", "kind": "unbalance", "balanceGrade": "G 6.3", "rotorMass": "300 kg",
                 "at": {"x": "0 m", "y": "0 m", "z": "1.2 m"}, "axis": "-y"},
                {"name": "belt", "kind": "force", "order": 2, "amplitude": "150 N",
                 "at": {"x": "0.5 m", "y": "0 m", "z": "1 m"}, "direction": {"x": 3, "y": 0, "z": 4}},
                {"name": "floor", "kind": "base-motion", "frequency": "25 Hz", "velocity": "0.3 mm/s",
                 "direction": {"x": 1, "y": 0, "z": 0}}
              ],
              "criteria": [
                {"id": "SEP", "rule": "separation", "margin": "20 %"},
                {"id": "ISO", "rule": "isolation", "minEfficiency": "90 %"},
                {"id": "DISP", "rule": "displacement", "max": "80 µm", "at": {"x": "0 m", "y": "0 m", "z": "1.2 m"}},
                {"id": "VEL", "rule": "velocity", "max": "4.5 mm/s", "at": {"x": "0.9 m", "y": "0.5 m", "z": "1.4 m"},
                 "axis": "y"},
                {"id": "FORCE", "rule": "transmitted-force", "max": "2 kN", "axis": "z"},
                {"id": "SAG", "rule": "static-deflection", "min": "3 mm"}
              ]
            }
            """;

    @TempDir
    Path base;

    private String text;
    private LoadedSpec loaded;

    private void edit(String from, String to) {
        assertTrue(VALID.contains(from), from);
        text = VALID.replace(from, to);
        loaded = new TestProject(base).loadOne(FILE, text);
    }

    private void expect(String snippet, String... words) {
        SourceLocation at = TestProject.at(FILE, text, snippet);
        TestProject.assertDiagnostic(loaded, at.line(), at.column(), words);
    }

    private void expectOnly(String snippet, String... words) {
        SourceLocation at = TestProject.at(FILE, text, snippet);
        TestProject.assertOnlyDiagnostic(loaded, at.line(), at.column(), words);
    }

    @Test
    void aFanSetOnFourMountsReadsIntoSiRecords() {
        text = VALID;
        loaded = new TestProject(base).loadOne(FILE, text);
        Spec spec = TestProject.spec(loaded);
        Model.RigidBody model = assertInstanceOf(Model.RigidBody.class, spec.model());
        assertEquals(2300, model.mass().si(), 1e-9);
        assertEquals(0.1, model.centreOfGravity().x().si(), 1e-15);
        assertEquals(0.65, model.centreOfGravity().z().si(), 1e-15);
        assertEquals(310, model.inertia().xx().si(), 1e-12);
        assertEquals(Dimension.INERTIA, model.inertia().zz().dimension());
        // Products left out are zero; xz as written.
        assertEquals(0, model.inertia().xy(), 0);
        assertEquals(12, model.inertia().xz(), 1e-12);
        assertEquals(0, model.inertia().yz(), 0);
        assertEquals(Optional.empty(), model.damping());
        assertEquals(4, model.mounts().size());

        Model.Mount a1 = model.mounts().get(0);
        assertEquals("A1", a1.name());
        assertEquals(-0.9, a1.position().x().si(), 1e-15);
        assertEquals(4e5, a1.stiffness().x(), 1e-9);
        assertEquals(1.1e6, a1.stiffness().get(Axis.Z), 1e-9);
        ElementDamping.Hysteretic eta = assertInstanceOf(ElementDamping.Hysteretic.class, a1.damping().orElseThrow());
        assertEquals(0.1, eta.values().y(), 1e-15);
        ElementDamping.Viscous c2 = assertInstanceOf(ElementDamping.Viscous.class, model.mounts().get(1).damping().orElseThrow());
        assertEquals(1000, c2.values().x(), 1e-9);
        assertEquals(3000, c2.values().z(), 1e-9);
        Model.Mount b1 = model.mounts().get(2);
        assertEquals(0, b1.stiffness().x(), 0);
        ElementDamping.Hysteretic etaB1 = assertInstanceOf(ElementDamping.Hysteretic.class, b1.damping().orElseThrow());
        assertEquals(0, etaB1.values().x(), 0);
        assertEquals(0.15, etaB1.values().z(), 1e-15);
        ElementDamping.Viscous c4 = assertInstanceOf(ElementDamping.Viscous.class, model.mounts().get(3).damping().orElseThrow());
        assertEquals(2000, c4.values().y(), 1e-9);

        Excitation.Unbalance wheel = assertInstanceOf(Excitation.Unbalance.class, spec.excitations().get(0));
        Placement.AtPoint wheelAt = assertInstanceOf(Placement.AtPoint.class, wheel.placement());
        assertEquals(1.2, wheelAt.point().z().si(), 1e-15);
        assertEquals(Optional.of(ShaftAxis.NEG_Y), wheelAt.axis());
        assertEquals(Optional.empty(), wheelAt.direction());
        Excitation.Force belt = assertInstanceOf(Excitation.Force.class, spec.excitations().get(1));
        Placement.AtPoint beltAt = assertInstanceOf(Placement.AtPoint.class, belt.placement());
        Direction d = beltAt.direction().orElseThrow();
        // (3, 0, 4) normalised: a 3-4-5 triangle.
        assertEquals(0.6, d.x(), 1e-15);
        assertEquals(0.8, d.z(), 1e-15);
        assertEquals(Optional.empty(), beltAt.axis());
        Excitation.BaseMotion floor = assertInstanceOf(Excitation.BaseMotion.class, spec.excitations().get(2));
        assertEquals(1, floor.direction().x(), 0);

        Criterion.Isolation iso = assertInstanceOf(Criterion.Isolation.class, spec.criteria().get(1));
        // Without "at", isolation looks at the centre of gravity; the record leaves it empty to say so.
        assertEquals(Optional.empty(), iso.at());
        Criterion.Displacement disp = assertInstanceOf(Criterion.Displacement.class, spec.criteria().get(2));
        ResponsePoint.OnBody dispAt = assertInstanceOf(ResponsePoint.OnBody.class, disp.at().orElseThrow());
        assertEquals(1.2, dispAt.point().z().si(), 1e-15);
        assertEquals(Optional.empty(), dispAt.axis());
        Criterion.Velocity vel = assertInstanceOf(Criterion.Velocity.class, spec.criteria().get(3));
        assertEquals(Optional.of(Axis.Y), assertInstanceOf(ResponsePoint.OnBody.class, vel.at().orElseThrow()).axis());
        Criterion.TransmittedForce force = assertInstanceOf(Criterion.TransmittedForce.class, spec.criteria().get(4));
        assertEquals(Optional.of(Axis.Z), force.axis());
    }

    // --- inertia ---------------------------------------------------------------------------

    @Test
    void momentsThatBreakTheTriangleInequalityAreRefused() {
        edit("\"zz\": \"640 kg·m²\"", "\"zz\": \"900 kg·m²\"");
        expectOnly("{\"xx\"", "triangle inequality", "xx 310 kg·m², yy 520 kg·m², zz 900 kg·m²", "< 900");
    }

    @Test
    void aFlatPlateSitsOnTheTriangleBoundAndIsAccepted() {
        // A thin plate in the xy plane: Izz = Ixx + Iyy exactly (perpendicular-axis theorem).
        edit("\"zz\": \"640 kg·m²\"}", "\"zz\": \"830 kg·m²\"}, \"productsOfInertia\": {}");
        text = text.replace("\"productsOfInertia\": {\"xz\": \"12 kg·m²\"},", "");
        loaded = new TestProject(base).loadOne(FILE, text);
        assertEquals(830, assertInstanceOf(Model.RigidBody.class, TestProject.spec(loaded).model()).inertia().zz().si(), 1e-12);
        // Just past the bound is refused.
        edit("\"zz\": \"640 kg·m²\"}", "\"zz\": \"830.01 kg·m²\"}, \"productsOfInertia\": {}");
        text = text.replace("\"productsOfInertia\": {\"xz\": \"12 kg·m²\"},", "");
        loaded = new TestProject(base).loadOne(FILE, text);
        expectOnly("{\"xx\"", "triangle inequality");
    }

    @Test
    void productsTooLargeForTheMomentsAreNotPositiveDefinite() {
        // Eigenvalues of [[310, -450], [-450, 520]] are 415 ± √(105² + 450²) = 415 ± 462.09: one is −47.09.
        edit("\"productsOfInertia\": {\"xz\": \"12 kg·m²\"}", "\"productsOfInertia\": {\"xy\": \"450 kg·m²\"}");
        expectOnly("{\"xx\"", "not positive definite", "xy 450", "principal moments are -47.09, ");
    }

    @Test
    void inertiaKeysAndUnits() {
        edit("\"xz\": \"12 kg·m²\"", "\"zx\": \"12 kg·m²\"");
        expectOnly("\"zx\"", "unknown key \"zx\" in \"productsOfInertia\"", "xy, xz, yz");
        edit("\"yy\": \"520 kg·m²\"", "\"yy\": \"520 kg\"");
        expectOnly("\"520 kg\"", "\"yy\"", "kg·m²");
    }

    // --- layout ----------------------------------------------------------------------------

    /** Four mounts at y = 0 along x: nothing resists a rotation about that line. */
    @Test
    void mountsOnOneLineLeaveARotationFree() {
        edit("\"y\": \"-0.5 m\", \"z\": \"0 m\"", "\"y\": \"0 m\", \"z\": \"0 m\"");
        String once = text.replace("\"y\": \"0.5 m\", \"z\": \"0 m\"", "\"y\": \"0 m\", \"z\": \"0 m\"");
        text = once;
        loaded = new TestProject(base).loadOne(FILE, text);
        Diagnostic d = TestProject.assertOnlyDiagnostic(loaded, TestProject.at(FILE, text, "[\n      {\"name\": \"A1\"").line(),
                TestProject.at(FILE, text, "[\n      {\"name\": \"A1\"").column(), "the mounts leave the body free",
                "rotation about x");
        assertFalse(d.message().contains("rotation about y"), d.message());
    }

    /** Mounts stiff only vertically cannot hold the body sideways or in yaw. */
    @Test
    void verticalOnlyMountsLeaveSwayAndYawFree() {
        text = VALID.replaceAll("\"x\": \"0(\\.4 MN/m| N/m)\", \"y\": \"0\\.4 MN/m\"", "\"x\": \"0 N/m\", \"y\": \"0 N/m\"")
                .replaceAll("\\{\"lossFactor\": \\{[^}]*\\}\\}", "{\"lossFactor\": 0.1}")
                .replaceAll("\\{\"coefficient\": \\{[^}]*\\}\\}", "{\"coefficient\": \"2 kN·s/m\"}");
        loaded = new TestProject(base).loadOne(FILE, text);
        SourceLocation at = TestProject.at(FILE, text, "[\n      {\"name\": \"A1\"");
        Diagnostic d = TestProject.assertOnlyDiagnostic(loaded, at.line(), at.column(), "translation along x",
                "translation along y", "rotation about z");
        assertFalse(d.message().contains("translation along z"), d.message());
    }

    @Test
    void aMountWithNoStiffnessAtAll() {
        edit("\"stiffness\": {\"x\": \"0 N/m\", \"y\": \"0.4 MN/m\", \"z\": \"1.1 MN/m\"}",
                "\"stiffness\": {\"x\": \"0 N/m\", \"y\": \"0 N/m\", \"z\": \"0 N/m\"}");
        expect("{\"x\": \"0 N/m\", \"y\": \"0 N/m\"", "mount \"B1\" has zero stiffness along all three axes");
    }

    @Test
    void anUndampedStiffAxisIsRefused() {
        edit("{\"x\": \"1 kN·s/m\", \"y\": \"1 kN·s/m\"", "{\"x\": \"1 kN·s/m\", \"y\": \"0 N·s/m\"");
        expectOnly("\"0 N·s/m\"", "mount \"A2\" along y is zero", "stiff along y");
    }

    @Test
    void mountNamesAreUniqueAndDampingIsEverywhereOrAtModelLevel() {
        edit("{\"name\": \"B2\"", "{\"name\": \"A1\"");
        expectOnly("\"A1\", \"position\": {\"x\": \"0.9 m\", \"y\": \"0.5 m\"", "two mounts are named \"A1\"");
        edit(", \"damping\": {\"coefficient\": \"2 kN·s/m\"}}", "}");
        expectOnly("{\"name\": \"B2\"", "mount \"B2\" has no damping and the model has none");
        edit("\n    ]},", "\n    ], \"damping\": {\"coefficient\": \"3 kN·s/m\"}},");
        expect("\"coefficient\": \"3", "applies to a single model only", "on each mount");
        // Each mount's own damping also conflicts with the model's: four more.
        assertEquals(5, loaded.diagnostics().size(), () -> TestProject.describe(loaded.diagnostics()));
    }

    // --- placements ------------------------------------------------------------------------

    @Test
    void anUnbalanceNeedsAPointAndAShaftAxis() {
        edit(", \"axis\": \"-y\"}", "}");
        expectOnly("{\"name\": \"wheel\"", "needs \"axis\" beside \"at\"", "\"-x\"");
        edit("\"axis\": \"-y\"", "\"axis\": \"-w\"");
        expectOnly("\"-w\"", "unknown shaft axis \"-w\"", "x, y, z, -x, -y, -z");
        edit("\"axis\": \"-y\"", "\"axis\": \"-y\", \"direction\": {\"x\": 1, \"y\": 0, \"z\": 0}");
        expectOnly("\"direction\": {\"x\": 1, \"y\": 0, \"z\": 0}},\n    {\"name\": \"belt\"",
                "an unbalance rotates about its shaft");
        edit("\"at\": {\"x\": \"0 m\", \"y\": \"0 m\", \"z\": \"1.2 m\"}, \"axis\"", "\"at\": \"wheel\", \"axis\"");
        expectOnly("\"wheel\", \"axis\"", "is a point on the rigid body");
    }

    @Test
    void aForceNeedsANonZeroDirection() {
        edit("\"direction\": {\"x\": 3, \"y\": 0, \"z\": 4}", "\"direction\": {\"x\": 0, \"y\": 0, \"z\": 0}");
        expectOnly("{\"x\": 0, \"y\": 0, \"z\": 0}", "non-zero", "straight up");
        edit(", \"direction\": {\"x\": 3, \"y\": 0, \"z\": 4}", "");
        expectOnly("{\"name\": \"belt\"", "needs \"direction\" beside \"at\"");
        edit("\"direction\": {\"x\": 3, \"y\": 0, \"z\": 4}", "\"direction\": {\"x\": \"3 m\", \"y\": 0, \"z\": 4}");
        expectOnly("\"3 m\"", "\"x\" must be a number");
        edit("\"at\": {\"x\": \"0.5 m\", \"y\": \"0 m\", \"z\": \"1 m\"}", "\"at\": {\"x\": \"0.5 m\", \"z\": \"1 m\"}");
        expectOnly("{\"x\": \"0.5 m\", \"z\"", "missing required key \"y\" in \"at\"");
    }

    @Test
    void baseMotionTakesOnlyADirection() {
        edit("\"direction\": {\"x\": 1, \"y\": 0, \"z\": 0}}", "\"direction\": {\"x\": 1, \"y\": 0, \"z\": 0}, \"axis\": \"z\"}");
        expectOnly("\"axis\": \"z\"}\n  ]", "base motion moves the ground under every mount");
    }

    @Test
    void criteriaOnARigidBodyNameAPoint() {
        edit(", \"max\": \"80 µm\", \"at\": {\"x\": \"0 m\", \"y\": \"0 m\", \"z\": \"1.2 m\"}}", ", \"max\": \"80 µm\"}");
        expectOnly("{\"id\": \"DISP\"", "criterion \"DISP\" needs \"at\"", "the largest axis counts");
        edit("\"axis\": \"y\"}", "\"axis\": \"-y\"}");
        expectOnly("\"-y\"},\n    {\"id\": \"FORCE\"", "unknown axis \"-y\"", "has no sign");
        edit("\"minEfficiency\": \"90 %\"}", "\"minEfficiency\": \"90 %\", \"at\": \"fan\"}");
        expectOnly("\"fan\"", "criterion \"ISO\" is a point on the rigid body");
        edit("\"minEfficiency\": \"90 %\"}", "\"minEfficiency\": \"90 %\", \"axis\": \"z\"}");
        expectOnly("\"axis\": \"z\"}", "isolation looks along the base motion's direction");
    }

    /** One mount at the centre of gravity holds every translation and no rotation. */
    @Test
    void oneMountAtTheCentreOfGravityLeavesEveryRotationFree() {
        int start = VALID.indexOf("{\"name\": \"A1\"");
        int end = VALID.indexOf("\n    ]},");
        text = VALID.substring(0, start) + "{\"name\": \"C\", \"position\": {\"x\": \"0.1 m\", \"y\": \"0 m\", \"z\": \"0.65 m\"},"
                + " \"stiffness\": {\"x\": \"1 MN/m\", \"y\": \"1 MN/m\", \"z\": \"1 MN/m\"}, \"damping\": {\"lossFactor\": 0.1}}"
                + VALID.substring(end);
        loaded = new TestProject(base).loadOne(FILE, text);
        Diagnostic d = TestProject.assertOnlyDiagnostic(loaded, TestProject.at(FILE, text, "[\n      {\"name\": \"C\"").line(),
                TestProject.at(FILE, text, "[\n      {\"name\": \"C\"").column(),
                "nothing resists rotation about x; rotation about y; rotation about z");
        assertFalse(d.message().contains("translation"), d.message());
    }

    @Test
    void modelDampingAndMountDampingAreNotBoth() {
        edit("\n    ]},", "\n    ], \"damping\": {\"ratio\": 0.05}},");
        expect("0.1}},\n      {\"name\": \"A2\"", "mount \"A1\" carries its own damping", "one or the other");
        assertEquals(4, loaded.diagnostics().size(), () -> TestProject.describe(loaded.diagnostics()));
    }
}
