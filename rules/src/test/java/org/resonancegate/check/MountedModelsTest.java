package org.resonancegate.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.resonancegate.fixtures.Models.atMass;
import static org.resonancegate.fixtures.Models.fixedAt;
import static org.resonancegate.fixtures.Models.mass;
import static org.resonancegate.fixtures.Models.point;
import static org.resonancegate.fixtures.Models.rotatingAt;
import static org.resonancegate.fixtures.Models.section6;
import static org.resonancegate.fixtures.Models.spring;
import static org.resonancegate.fixtures.Models.translation;
import static org.resonancegate.fixtures.Specs.AT;
import static org.resonancegate.fixtures.Specs.displacement;
import static org.resonancegate.fixtures.Specs.gramMillimetres;
import static org.resonancegate.fixtures.Specs.maxTransmissibility;
import static org.resonancegate.fixtures.Specs.mm;
import static org.resonancegate.fixtures.Specs.mmPerS;
import static org.resonancegate.fixtures.Specs.newtons;
import static org.resonancegate.fixtures.Specs.fixed;
import static org.resonancegate.fixtures.Specs.order;
import static org.resonancegate.fixtures.Specs.range;
import static org.resonancegate.fixtures.Specs.ratio;
import static org.resonancegate.fixtures.Specs.separation;
import static org.resonancegate.fixtures.Specs.single;
import static org.resonancegate.fixtures.Specs.spec;
import static org.resonancegate.fixtures.Specs.staticDeflection;
import static org.resonancegate.fixtures.Specs.tolerances;
import static org.resonancegate.fixtures.Specs.transmittedForce;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.resonancegate.dynamics.LinearSystem;
import org.resonancegate.dynamics.Load;
import org.resonancegate.dynamics.ModelScale;
import org.resonancegate.dynamics.Probe;
import org.resonancegate.dynamics.SystemBuilder;
import org.resonancegate.report.CheckResult;
import org.resonancegate.report.CheckStatus;
import org.resonancegate.report.SpecResult;
import org.resonancegate.report.SpecStatus;
import org.resonancegate.spec.Axis;
import org.resonancegate.spec.Criterion;
import org.resonancegate.spec.Excitation;
import org.resonancegate.spec.Model;
import org.resonancegate.spec.Operation;
import org.resonancegate.spec.Placement;
import org.resonancegate.spec.ResponsePoint;
import org.resonancegate.spec.Severity;
import org.resonancegate.spec.ShaftAxis;
import org.resonancegate.spec.Spec;
import org.resonancegate.spec.UnbalanceAmount;

/** The six rules on lumped lines and rigid bodies, through the whole evaluation of a spec. */
class MountedModelsTest {

    private static final LocalDate TODAY = LocalDate.of(2027, 1, 15);

    private static Excitation.Unbalance unbalanceAt(String name, double gramMm, Placement where) {
        return new Excitation.Unbalance(name, 0, order(1), new UnbalanceAmount.Direct(gramMillimetres(gramMm)), where, AT);
    }

    private static Excitation.Force forceAt(String name, double hz, double n, double phaseDeg, Placement where) {
        return new Excitation.Force(name, Math.toRadians(phaseDeg), fixed(hz), newtons(n), where, AT);
    }

    private static List<Criterion> allSix() {
        return List.of(separation("SEP", 0.2), maxTransmissibility("ISO", 0.3),
                displacement("DISP", 0.05, Criterion.DisplacementMeasure.PEAK),
                new Criterion.Velocity("VEL", Severity.ERROR, mmPerS(2.8), Criterion.VelocityMeasure.RMS, AT),
                transmittedForce("FORCE", 800), staticDeflection("SD", 3.0, 8.0));
    }

    // A lumped line of one mass and a single model of the same values are the same system: every
    // check agrees (values within 1e-9 relative, the tie rule of the contract; messages word for word).
    @Test
    void oneMassLineEqualsTheSingleModel() {
        Operation op = range(600, 1800);
        Model.Single single = single(1850, 2.4e6, 0.05);
        Model.Lumped line = translation(List.of(mass("set", 1850)), List.of(spring("isolators", "ground", "set", 2.4e6)),
                Optional.of(ratio(0.05)));
        List<Excitation> onSingle = List.of(unbalanceAt("impeller", 900, Placement.LINE),
                forceAt("compressor", 24, 150, 30, Placement.LINE));
        List<Excitation> onLine = List.of(unbalanceAt("impeller", 900, atMass("set")),
                forceAt("compressor", 24, 150, 30, atMass("set")));
        SpecResult a = SpecEvaluator.evaluate(spec(single, op, onSingle, allSix(), tolerances(0.15, 0.05), List.of()),
                TODAY);
        SpecResult b = SpecEvaluator.evaluate(spec(line, op, onLine, allSix(), tolerances(0.15, 0.05), List.of()),
                TODAY);
        assertEquals(a.errors(), b.errors());
        assertEquals(a.checks().size(), b.checks().size());
        assertEquals(6, a.checks().size(), a.toString());
        assertEquals(a.status(), b.status());
        for (int i = 0; i < a.checks().size(); i++) {
            CheckResult x = a.checks().get(i);
            CheckResult y = b.checks().get(i);
            assertEquals(x.status(), y.status(), x.criterion());
            assertEquals(x.value(), y.value(), 1e-9 * Math.abs(x.value()), x.criterion());
            assertEquals(x.limit(), y.limit(), 0, x.criterion());
            assertEquals(x.unit(), y.unit());
            assertEquals(x.speedRpm().isPresent(), y.speedRpm().isPresent());
            if (x.speedRpm().isPresent()) {
                assertEquals(x.speedRpm().getAsDouble(), y.speedRpm().getAsDouble(), 1e-6 * x.speedRpm().getAsDouble(),
                        x.criterion());
            }
            assertEquals(x.message(), y.message());
            assertEquals(x.governingCase(), y.governingCase());
        }
        assertEquals(a.modes().get(0).frequencyHz(), b.modes().get(0).frequencyHz(), 1e-12);
    }

    // A rigid body at a fixed speed: isolation of a rotating unbalance at the CG equals the
    // single-mass T of check-values.md 1.4 at β = 2, ζ = 0.05 (0.339182), since x and y share one
    // frequency; the message names the excitation and the nearest mode with its motion.
    @Test
    void rotatingUnbalanceIsolationOnTheSymmetricBody() {
        double wx = Math.sqrt(4.0e5 / 500);
        double rpm = 2 * wx * 60 / (2 * Math.PI);
        Spec s = spec(section6(0, Optional.of(ratio(0.05))), range(rpm, rpm),
                List.of(unbalanceAt("fan wheel", 400, rotatingAt(point(0, 0, 0), ShaftAxis.Z))),
                List.of(maxTransmissibility("ISO", 0.3)));
        CheckResult c = SpecEvaluator.evaluate(s, TODAY).checks().get(0);
        assertEquals(0.339182, c.value(), 5.1e-7);
        assertEquals(CheckStatus.FAIL, c.status());
        assertTrue(c.message().contains("'fan wheel'"), c.message());
        // 2·ω_x lies nearest the roll mode, 9.003 Hz, pure rotation about x
        assertTrue(c.message().contains("nearest mode 5 (rocking about x 100 %) at 9.003 Hz"), c.message());
    }

    // Findings name what governs. Separation: the mode with its motion; static deflection and
    // transmitted force: the mount; displacement: the point and axis.
    @Test
    void findingsNameTheGoverningModeMountAndPoint() {
        Model.RigidBody b = section6(0.3, Optional.of(ratio(0.05)));
        Excitation fan = unbalanceAt("fan", 2000, rotatingAt(point(0.3, 0, 0.8), ShaftAxis.Y));
        ResponsePoint top = new ResponsePoint.OnBody(point(0.6, 0.4, 1.0), Optional.empty());
        List<Criterion> criteria = List.of(separation("SEP", 0.2),
                new Criterion.Displacement("DISP", Severity.ERROR, mm(0.05), Criterion.DisplacementMeasure.PEAK,
                        Optional.of(top), AT),
                new Criterion.TransmittedForce("FZ", Severity.ERROR, newtons(500), Optional.of(Axis.Z), AT),
                staticDeflection("SD", 6.0, 12.0));
        SpecResult r = SpecEvaluator.evaluate(spec(b, range(200, 900), List.of(fan), criteria), TODAY);
        assertEquals(List.of(), r.errors());
        assertEquals(6, r.modes().size());
        assertEquals("z", r.modes().get(2).shares().get(0).motion());
        CheckResult sep = r.checks().get(0);
        // 4.2046 Hz (252 rpm) lies inside 200–900 rpm: separation 0 at the lowest such mode, mode 1
        assertEquals(0, sep.value(), 0);
        assertTrue(sep.message().contains("mode 1 (y "), sep.message());
        CheckResult disp = r.checks().get(1);
        assertTrue(disp.message().contains("point (0.6 m, 0.4 m, 1.0 m) along "), disp.message());
        CheckResult fz = r.checks().get(2);
        assertTrue(fz.message().contains("in mount 'M"), fz.message());
        assertTrue(fz.message().contains("(z)"), fz.message());
        // each mount carries a quarter of 500·gn: 500·9.80665/4/2e5 = 6.13 mm (statics)
        CheckResult sd = r.checks().get(3);
        assertEquals(500 * 9.80665 / 4 / 2.0e5, sd.value(), 1e-12);
        assertTrue(sd.message().contains("of mount 'M1'"), sd.message());
    }

    // The worst-case search seeds every mode's resonance for every order: a lightly damped
    // coupled mode (ζ = 0.002) is found. The check is an independent dense scan over speed of the
    // same response (100 001 points), which the sweep must match or beat.
    @Test
    void lightlyDampedCoupledModeIsNotMissed() {
        Model.RigidBody b = section6(0.3, Optional.of(ratio(0.002)));
        Placement where = rotatingAt(point(0.2, 0.1, 0.9), ShaftAxis.X);
        Excitation fan = unbalanceAt("fan", 500, where);
        ResponsePoint top = new ResponsePoint.OnBody(point(0.6, 0.4, 1.0), Optional.of(Axis.Y));
        Operation op = range(100, 1000);
        Criterion disp = new Criterion.Displacement("DISP", Severity.ERROR, mm(1), Criterion.DisplacementMeasure.PEAK,
                Optional.of(top), AT);
        CheckResult c = SpecEvaluator.evaluate(spec(b, op, List.of(fan), List.of(disp)), TODAY).checks().get(0);
        LinearSystem s = SystemBuilder.build(b, ModelScale.NOMINAL);
        Probe probe = s.probes(Optional.of(top)).get(0);
        double lo = op.minSpeed().si();
        double hi = op.maxSpeed().si();
        double scan = 0;
        for (int i = 0; i <= 100_000; i++) {
            double w = lo + (hi - lo) * i / 100_000;
            double force = 500e-6 * w * w;
            scan = Math.max(scan, probe.of(s.respond(new Load.Force(new Complex(force), where), w)).abs());
        }
        assertTrue(c.value() >= scan * (1 - 1e-9), c.value() + " < " + scan);
        assertTrue(c.value() <= scan * 1.001, c.value() + " ≫ " + scan);
    }

    // Base motion under a rigid body: T read at the CG along the motion equals formula 1.4 at the
    // vertical mode's β; a wrong kind of response point is refused, never passed.
    @Test
    void baseMotionTransmissibilityAtTheCentreOfGravity() {
        double wz = Math.sqrt(8.0e5 / 500);
        double rpm = 3 * wz * 60 / (2 * Math.PI);
        Excitation floor = new Excitation.BaseMotion("floor", 0, order(1), Excitation.MotionMeasure.DISPLACEMENT,
                mm(0.02), org.resonancegate.spec.Direction.up(AT), AT);
        Spec s = spec(section6(0, Optional.of(ratio(0.1))), range(rpm, rpm), List.of(floor),
                List.of(maxTransmissibility("ISO", 0.2)));
        CheckResult c = SpecEvaluator.evaluate(s, TODAY).checks().get(0);
        // check-values.md §1 table: ζ = 0.10, β = 3: T = 0.145366
        assertEquals(0.145366, c.value(), 5.1e-7);
        assertTrue(c.message().contains("the centre of gravity along the motion"), c.message());
        Criterion wrong = new Criterion.Isolation("ISO2", Severity.ERROR,
                new Criterion.IsolationLimit.MaxTransmissibility(org.resonancegate.fixtures.Specs.number(0.2)),
                Optional.of(new ResponsePoint.Mass("pump", AT)), AT);
        Criterion disp = new Criterion.Displacement("D", Severity.ERROR, mm(1), Criterion.DisplacementMeasure.PEAK,
                Optional.of(new ResponsePoint.Mass("pump", AT)), AT);
        SpecResult r = SpecEvaluator.evaluate(spec(section6(0, Optional.of(ratio(0.1))), range(rpm, rpm),
                List.of(floor), new ArrayList<>(List.of(wrong, disp))), TODAY);
        assertEquals(SpecStatus.ERROR, r.status());
        assertEquals(2, r.errors().size(), r.toString());
        assertTrue(r.errors().get(0).message().contains("'ISO2'"), r.errors().toString());
        assertTrue(r.errors().get(0).message().contains("by position"), r.errors().toString());
    }

    // transmitted-force on mounts: the largest axis component counts unless an axis is named. A
    // horizontal force at the CG of the decoupled body (h = 0) loads each of the four mounts with a
    // quarter of T·F along x (formula 1.4, ζ = 0.05, β = 2: T = 0.339182) and nothing along z.
    @Test
    void mountForceLargestAxisOrTheNamedOne() {
        double wx = Math.sqrt(4.0e5 / 500);
        double rpm = 2 * wx * 60 / (2 * Math.PI);
        Excitation push = new Excitation.Force("actuator", 0, order(1), newtons(1000),
                fixedAt(point(0, 0, 0), 1, 0, 0), AT);
        Criterion any = transmittedForce("F", 50);
        Criterion vertical = new Criterion.TransmittedForce("FZ", Severity.ERROR, newtons(50), Optional.of(Axis.Z), AT);
        SpecResult r = SpecEvaluator.evaluate(spec(section6(0, Optional.of(ratio(0.05))), range(rpm, rpm),
                List.of(push), List.of(any, vertical)), TODAY);
        assertEquals(1000 * 0.339182 / 4, r.checks().get(0).value(), 5.1e-7 * 1000 / 4);
        assertTrue(r.checks().get(0).message().contains("(x)"), r.checks().get(0).message());
        assertEquals(CheckStatus.FAIL, r.checks().get(0).status());
        assertEquals(0, r.checks().get(1).value(), 1e-9);
        assertEquals(CheckStatus.PASS, r.checks().get(1).status());
    }
}
