package org.resonancegate.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.resonancegate.units.Dimension;

/**
 * A complete spec using every key of format 1 for a single model reads into the expected records,
 * with values in SI. Conversions: 1 rpm = 2π/60 rad/s, 1 Hz = 2π rad/s, 1 g·mm = 1e-6 kg·m,
 * 1 deg = π/180 rad (definitions of the units).
 */
class ValidSpecTest {

    private static final double RPM = 2 * Math.PI / 60;

    @TempDir
    Path base;

    @Test
    void everyKeyOfASingleSpecReadsIntoRecordsInSi() {
        TestProject project = new TestProject(base);
        String text = """
                {
                  "$schema": "../../schema/resonance-gate-1.json",
                  "format": "resonance-gate/1",
                  "id": "CHW-P-02",
                  "title": "Chilled water pump 2, plant room B",
                  "revision": "C",
                  "model": {"kind": "single", "mass": "1850 kg", "stiffness": "2.4 MN/m", "damping": {"ratio": 0.05}},
                  "operation": {"speed": {"min": "900 rpm", "max": "1480 rpm"}},
                  "excitations": [
                    {"name": "impeller", "kind": "unbalance", "balanceGrade": "G 6.3", "rotorMass": "180 kg"},
                    {"name": "coupling", "kind": "unbalance", "order": 2, "unbalance": "120 g·mm", "phase": "90 deg"},
                    {"name": "motor hum", "kind": "force", "frequency": "100 Hz", "amplitude": "0.2 kN"},
                    {"name": "floor", "kind": "base-motion", "order": 1, "velocity": "0.5 mm/s"},
                    {"name": "vane pass", "kind": "order", "order": 7}
                  ],
                  "criteria": [
                    {"id": "SEP", "rule": "separation", "margin": "20 %"},
                    {"id": "ISO", "rule": "isolation", "minEfficiency": 0.9, "severity": "warning"},
                    {"id": "DISP", "rule": "displacement", "max": "50 µm", "measure": "peak-to-peak"},
                    {"id": "VEL", "rule": "velocity", "max": "2.8 mm/s"},
                    {"id": "FORCE", "rule": "transmitted-force", "max": "1.5 kN"},
                    {"id": "SAG", "rule": "static-deflection", "min": "3 mm", "max": "12 mm"}
                  ],
                  "tolerances": {"stiffness": "15 %", "mass": 0.05},
                  "waivers": [{"criterion": "ISO", "reason": "accepted at design review 14", "expires": "2027-03-31"}]
                }
                """;
        String file = "src/vibration/chw-p-02.json";
        LoadedSpec loaded = project.loadOne(file, text);
        Spec spec = TestProject.spec(loaded);
        assertEquals("src/vibration/chw-p-02.json", spec.file());
        assertEquals(Optional.of("CHW-P-02"), loaded.id());
        assertEquals("CHW-P-02", spec.id());
        assertEquals(Optional.of("Chilled water pump 2, plant room B"), spec.title());
        assertEquals(Optional.of("C"), spec.revision());

        Model.Single model = assertInstanceOf(Model.Single.class, spec.model());
        assertEquals(1850, model.mass().si(), 1e-12);
        assertEquals(Dimension.MASS, model.mass().dimension());
        assertEquals("1850 kg", model.mass().text());
        assertEquals(TestProject.at(file, text, "\"1850 kg\""), model.mass().location());
        assertEquals(new SourceLocation(file, 7, 39), model.mass().location());
        Stiffness.Direct k = assertInstanceOf(Stiffness.Direct.class, model.stiffness());
        assertEquals(2.4e6, k.written().si(), 1e-6);
        Damping.Ratio zeta = assertInstanceOf(Damping.Ratio.class, model.damping());
        assertEquals(0.05, zeta.value().value(), 1e-15);

        assertEquals(900 * RPM, spec.operation().minSpeed().si(), 1e-12);
        assertEquals(1480 * RPM, spec.operation().maxSpeed().si(), 1e-12);
        assertEquals(false, spec.operation().fixedSpeed());

        List<Excitation> e = spec.excitations();
        assertEquals(5, e.size());
        Excitation.Unbalance impeller = assertInstanceOf(Excitation.Unbalance.class, e.get(0));
        assertEquals("impeller", impeller.name());
        assertEquals(1.0, impeller.frequency().order());
        assertEquals(0.0, impeller.phase());
        UnbalanceAmount.FromBalanceGrade grade = assertInstanceOf(UnbalanceAmount.FromBalanceGrade.class, impeller.amount());
        assertEquals(6.3, grade.gradeMmPerS(), 1e-15);
        assertEquals("G 6.3", grade.gradeText());
        assertEquals(180, grade.rotorMass().si(), 1e-12);

        Excitation.Unbalance coupling = assertInstanceOf(Excitation.Unbalance.class, e.get(1));
        assertEquals(2.0, coupling.frequency().order());
        assertEquals(Math.PI / 2, coupling.phase(), 1e-15);
        assertEquals(120e-6, assertInstanceOf(UnbalanceAmount.Direct.class, coupling.amount()).unbalance().si(), 1e-18);

        Excitation.Force hum = assertInstanceOf(Excitation.Force.class, e.get(2));
        assertEquals(2 * Math.PI * 100, assertInstanceOf(ExcitationFrequency.Fixed.class, hum.frequency()).frequency().si(), 1e-9);
        assertEquals(200, hum.amplitude().si(), 1e-12);

        Excitation.BaseMotion floor = assertInstanceOf(Excitation.BaseMotion.class, e.get(3));
        assertEquals(Excitation.MotionMeasure.VELOCITY, floor.measure());
        assertEquals(0.5e-3, floor.amplitude().si(), 1e-15);
        assertEquals(1.0, assertInstanceOf(ExcitationFrequency.Order.class, floor.frequency()).order());

        Excitation.OrderOnly vanes = assertInstanceOf(Excitation.OrderOnly.class, e.get(4));
        assertEquals(7.0, vanes.frequency().order());

        List<Criterion> c = spec.criteria();
        assertEquals(List.of("SEP", "ISO", "DISP", "VEL", "FORCE", "SAG"), c.stream().map(Criterion::id).toList());
        assertEquals(0.2, assertInstanceOf(Criterion.Separation.class, c.get(0)).margin().value(), 1e-15);
        Criterion.Isolation iso = assertInstanceOf(Criterion.Isolation.class, c.get(1));
        assertEquals(Severity.WARNING, iso.severity());
        assertEquals(0.9, assertInstanceOf(Criterion.IsolationLimit.MinEfficiency.class, iso.limit()).value().value());
        Criterion.Displacement disp = assertInstanceOf(Criterion.Displacement.class, c.get(2));
        assertEquals(Severity.ERROR, disp.severity());
        assertEquals(50e-6, disp.max().si(), 1e-18);
        assertEquals(Criterion.DisplacementMeasure.PEAK_TO_PEAK, disp.measure());
        Criterion.Velocity vel = assertInstanceOf(Criterion.Velocity.class, c.get(3));
        assertEquals(Criterion.VelocityMeasure.RMS, vel.measure());
        assertEquals(2.8e-3, vel.max().si(), 1e-15);
        assertEquals(1500, assertInstanceOf(Criterion.TransmittedForce.class, c.get(4)).max().si(), 1e-9);
        Criterion.StaticDeflection sag = assertInstanceOf(Criterion.StaticDeflection.class, c.get(5));
        assertEquals(3e-3, sag.min().orElseThrow().si(), 1e-15);
        assertEquals(12e-3, sag.max().orElseThrow().si(), 1e-15);
        assertEquals(Rule.STATIC_DEFLECTION, sag.rule());

        assertEquals(0.15, spec.tolerances().stiffness().orElseThrow().value(), 1e-15);
        assertEquals(0.05, spec.tolerances().mass().orElseThrow().value(), 1e-15);
        assertEquals(List.of(new Waiver("ISO", "accepted at design review 14", LocalDate.of(2027, 3, 31),
                TestProject.at(file, text, "{\"criterion\": \"ISO\""))), spec.waivers());
    }

    @Test
    void fixedSpeedSetsMinEqualToMax() {
        TestProject project = new TestProject(base);
        Spec spec = TestProject.spec(project.loadOne("fan.json", TestProject.VALID.replace(
                "{\"speed\": {\"min\": \"900 rpm\", \"max\": \"1480 rpm\"}}", "{\"speed\": \"1480 r/min\"}")));
        assertTrue(spec.operation().fixedSpeed());
        assertEquals(1480 * RPM, spec.operation().minSpeed().si(), 1e-12);
        assertEquals(spec.operation().minSpeed(), spec.operation().maxSpeed());
        assertEquals(Tolerances.none(), spec.tolerances());
        assertEquals(List.of(), spec.waivers());
    }

    @Test
    void theOtherStiffnessAndDampingFormsRead() {
        TestProject project = new TestProject(base);
        Model.Single a = (Model.Single) TestProject.spec(project.loadOne("a.json", TestProject.VALID.replace(
                "\"stiffness\": \"2.4 MN/m\", \"damping\": {\"ratio\": 0.05}",
                "\"staticDeflection\": \"6 mm\", \"damping\": {\"lossFactor\": \"10 %\"}"))).model();
        assertEquals(6e-3, assertInstanceOf(Stiffness.FromStaticDeflection.class, a.stiffness()).written().si(), 1e-15);
        assertEquals(0.1, assertInstanceOf(Damping.LossFactor.class, a.damping()).value().value(), 1e-15);

        Model.Single b = (Model.Single) TestProject.spec(project.loadOne("b.json", TestProject.VALID.replace(
                "\"stiffness\": \"2.4 MN/m\", \"damping\": {\"ratio\": 0.05}",
                "\"naturalFrequency\": \"6.4 Hz\", \"damping\": {\"q\": 10}"))).model();
        assertEquals(2 * Math.PI * 6.4,
                assertInstanceOf(Stiffness.FromNaturalFrequency.class, b.stiffness()).written().si(), 1e-12);
        assertEquals(10, assertInstanceOf(Damping.QualityFactor.class, b.damping()).value().value());

        Model.Single c = (Model.Single) TestProject.spec(project.loadOne("c.json", TestProject.VALID.replace(
                "{\"ratio\": 0.05}", "{\"logDecrement\": 0.3}"))).model();
        assertEquals(0.3, assertInstanceOf(Damping.LogDecrement.class, c.damping()).value().value());

        Model.Single d = (Model.Single) TestProject.spec(project.loadOne("d.json", TestProject.VALID.replace(
                "{\"ratio\": 0.05}", "{\"coefficient\": \"6.7 kN·s/m\"}"))).model();
        assertEquals(6700, assertInstanceOf(Damping.Coefficient.class, d.damping()).value().si(), 1e-9);
    }

    @Test
    void forceAndBaseMotionTakeEitherOrderOrFrequency() {
        TestProject project = new TestProject(base);
        Spec spec = TestProject.spec(project.loadOne("m.json", TestProject.VALID.replace(
                "[{\"name\": \"impeller\", \"kind\": \"unbalance\", \"unbalance\": \"120 g·mm\"}]",
                "[{\"name\": \"press\", \"kind\": \"force\", \"order\": 1, \"amplitude\": \"1 lbf\"},"
                        + " {\"name\": \"rail\", \"kind\": \"base-motion\", \"frequency\": \"12 Hz\", \"displacement\": \"0.1 mm\"},"
                        + " {\"name\": \"quake\", \"kind\": \"base-motion\", \"frequency\": \"3 Hz\", \"acceleration\": \"0.05 gn\"}]")));
        Excitation.Force press = (Excitation.Force) spec.excitations().get(0);
        assertEquals(1.0, assertInstanceOf(ExcitationFrequency.Order.class, press.frequency()).order());
        assertEquals(4.4482216152605, press.amplitude().si(), 1e-12);
        Excitation.BaseMotion rail = (Excitation.BaseMotion) spec.excitations().get(1);
        assertEquals(Excitation.MotionMeasure.DISPLACEMENT, rail.measure());
        assertEquals(1e-4, rail.amplitude().si(), 1e-18);
        Excitation.BaseMotion quake = (Excitation.BaseMotion) spec.excitations().get(2);
        assertEquals(Excitation.MotionMeasure.ACCELERATION, quake.measure());
        // gn = 9.80665 m/s² (3rd CGPM 1901)
        assertEquals(0.05 * 9.80665, quake.amplitude().si(), 1e-12);
    }

    @Test
    void windowsLineEndingsCountAsOneLineBreak() {
        TestProject project = new TestProject(base);
        Spec spec = TestProject.spec(project.loadOne("crlf.json", TestProject.VALID.replace("\n", "\r\n")));
        assertEquals(TestProject.at("crlf.json", TestProject.VALID, "\"1850 kg\""),
                ((Model.Single) spec.model()).mass().location());
    }

    @Test
    void byteOrderMarkIsAccepted() {
        TestProject project = new TestProject(base);
        byte[] text = TestProject.VALID.getBytes(java.nio.charset.StandardCharsets.UTF_8);
        byte[] withBom = new byte[text.length + 3];
        withBom[0] = (byte) 0xEF;
        withBom[1] = (byte) 0xBB;
        withBom[2] = (byte) 0xBF;
        System.arraycopy(text, 0, withBom, 3, text.length);
        project.writeBytes("bom.json", withBom);
        LoadedSpec loaded = project.loadAll().get(0);
        Spec spec = TestProject.spec(loaded);
        // The mark is not a character of the text: the mass sits where it would without it.
        assertEquals(TestProject.at("bom.json", TestProject.VALID, "\"1850 kg\""),
                ((Model.Single) spec.model()).mass().location());
    }
}
