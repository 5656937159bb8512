package org.resonancegate.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.resonancegate.fixtures.Models.body;
import static org.resonancegate.fixtures.Models.fixedAt;
import static org.resonancegate.fixtures.Models.inertia;
import static org.resonancegate.fixtures.Models.lossFactor;
import static org.resonancegate.fixtures.Models.mount;
import static org.resonancegate.fixtures.Models.point;
import static org.resonancegate.fixtures.Models.rotatingAt;
import static org.resonancegate.fixtures.Models.section6;
import static org.resonancegate.fixtures.Specs.ratio;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.resonancegate.spec.Model;
import org.resonancegate.spec.ShaftAxis;

/** The rigid body on mounts against check-values.md §6 and §7.5/7.6 and the single-mass limits. */
class RigidBody6Test {

    private static List<Double> hz(LinearSystem s) {
        List<Double> out = new ArrayList<>();
        for (Mode m : s.modes()) {
            out.add(m.frequencyHz());
        }
        return out;
    }

    private static void assertHz(double[] expected, List<Double> actual) {
        for (int i = 0; i < expected.length; i++) {
            // the vectors are printed to 4 decimals
            assertEquals(expected[i], actual.get(i), 5.1e-5, "mode " + (i + 1) + " of " + actual);
        }
    }

    // check-values.md §6, h = 0 (computed with SciPy from the formula; Harris' Shock and Vibration
    // Handbook 5th ed. ch. 3 for the decoupling): 4.5016 (x), 4.5016 (y), 6.3662 (z), 8.1153
    // (yaw), 9.0032 (roll), 11.0266 (pitch) Hz, each a single motion.
    @Test
    void decoupledLayout() {
        LinearSystem s = SystemBuilder.build(section6(0, Optional.of(ratio(0.05))), ModelScale.NOMINAL);
        assertHz(new double[] {4.5016, 4.5016, 6.3662, 8.1153, 9.0032, 11.0266}, hz(s));
        // the closed forms beside the vector: √(4k_h/m), √(4k_v/m), √(4k_h(a²+b²)/Izz), √(4k_v b²/Ixx), √(4k_v a²/Iyy)
        assertEquals(Math.sqrt(4 * 2.0e5 / 500) / (2 * Math.PI), s.modes().get(2).frequencyHz(), 1e-12);
        assertEquals(Math.sqrt(4 * 1.0e5 * (0.36 + 0.16) / 80) / (2 * Math.PI), s.modes().get(3).frequencyHz(), 1e-12);
        assertEquals(Math.sqrt(4 * 2.0e5 * 0.16 / 40) / (2 * Math.PI), s.modes().get(4).frequencyHz(), 1e-12);
        assertEquals(Math.sqrt(4 * 2.0e5 * 0.36 / 60) / (2 * Math.PI), s.modes().get(5).frequencyHz(), 1e-12);
        String[] pure = {null, null, "z", "rz", "rx", "ry"};
        for (int i = 2; i < 6; i++) {
            assertEquals(1, s.modes().get(i).shares().size(), s.modes().get(i).toString());
            assertEquals(pure[i], s.modes().get(i).shares().get(0).motion());
            assertEquals(1.0, s.modes().get(i).shares().get(0).fraction(), 1e-12);
        }
    }

    // check-values.md §6, h = 0.3 m (computed with SciPy from the formula): 3.8809, 4.2046, 6.3662,
    // 8.1153, 10.4430, 11.8055 Hz; z and yaw stay pure, (x, pitch) and (y, roll) couple.
    @Test
    void centreOfGravityAboveTheMounts() {
        LinearSystem s = SystemBuilder.build(section6(0.3, Optional.of(ratio(0.05))), ModelScale.NOMINAL);
        assertHz(new double[] {3.8809, 4.2046, 6.3662, 8.1153, 10.4430, 11.8055}, hz(s));
        // The (x, pitch) pair: mostly sway at 4.2046 Hz, mostly pitch at 11.8055 Hz, neither pure.
        Mode sway = s.modes().get(1);
        assertEquals("x", sway.shares().get(0).motion(), sway.toString());
        assertTrue(sway.shares().get(0).fraction() < 0.999 && sway.shares().get(0).fraction() > 0.9);
        Mode pitch = s.modes().get(5);
        assertEquals("ry", pitch.shares().get(0).motion(), pitch.toString());
        assertTrue(pitch.shares().get(0).fraction() < 0.999);
        assertEquals(1.0, s.modes().get(2).shares().get(0).fraction(), 1e-12); // z stays pure
    }

    // Harris ch. 3: with the centre of gravity at the elastic centre the vertical mode is
    // √(Σk_z/m)/2π whatever the layout; here six unequal mounts placed symmetrically about the CG.
    @Test
    void verticalModeOfASymmetricSixMountLayout() {
        List<Model.Mount> mounts = new ArrayList<>();
        double[][] at = {{-1.1, -0.5}, {1.1, 0.5}, {-1.1, 0.5}, {1.1, -0.5}, {0, -0.7}, {0, 0.7}};
        double[] kz = {3.0e5, 3.0e5, 3.0e5, 3.0e5, 5.0e5, 5.0e5};
        for (int i = 0; i < 6; i++) {
            mounts.add(mount("F" + i, point(at[i][0], at[i][1], 0.45), 1.5e5, 1.5e5, kz[i]));
        }
        Model.RigidBody b = body(1800, point(0, 0, 0.45), inertia(300, 700, 850), mounts, Optional.of(ratio(0.05)));
        LinearSystem s = SystemBuilder.build(b, ModelScale.NOMINAL);
        double expected = Math.sqrt(2.2e6 / 1800) / (2 * Math.PI);
        boolean found = false;
        for (Mode m : s.modes()) {
            if (!m.shares().isEmpty() && m.shares().get(0).motion().equals("z")) {
                assertEquals(expected, m.frequencyHz(), 1e-12 * expected);
                assertEquals(1.0, m.shares().get(0).fraction(), 1e-12);
                found = true;
            }
        }
        assertTrue(found, s.modes().toString());
    }

    // check-values.md 7.5/7.6 (Rao, Mechanical Vibrations, ch. 5, "natural frequencies of an
    // automobile"; from memory, reproduced with SciPy): m = 1000 kg, J = 810 kg·m², k₁ = 18 kN/m at
    // l₁ = 1.0 m, k₂ = 22 kN/m at l₂ = 1.5 m → ω = 5.8593 and 9.4341 rad/s. Each spring is split into
    // two mounts at y = ±0.5 m, level with the CG, so bounce and pitch do not couple to the rest.
    @Test
    void bounceAndPitch() {
        List<Model.Mount> mounts = new ArrayList<>();
        for (double y : new double[] {-0.5, 0.5}) {
            mounts.add(mount("front" + y, point(-1.0, y, 0.6), 5e4, 5e4, 9e3));
            mounts.add(mount("rear" + y, point(1.5, y, 0.6), 5e4, 5e4, 11e3));
        }
        Model.RigidBody car = body(1000, point(0, 0, 0.6), inertia(100, 810, 1500), mounts, Optional.of(ratio(0.05)));
        LinearSystem s = SystemBuilder.build(car, ModelScale.NOMINAL);
        List<Double> omegas = new ArrayList<>();
        for (Mode m : s.modes()) {
            omegas.add(m.angularFrequency());
        }
        assertTrue(omegas.stream().anyMatch(w -> Math.abs(w - 5.8593) < 1e-4), omegas.toString());
        assertTrue(omegas.stream().anyMatch(w -> Math.abs(w - 9.4341) < 1e-4), omegas.toString());
    }

    // A vertical force at the CG of the decoupled body: the single-mass transmissibility of
    // check-values.md 1.4 at ω_z, and each of the four equal mounts carries a quarter.
    @ParameterizedTest
    @CsvSource({"0.05, 0.5, 1.332042", "0.05, 2, 0.339182", "0.20, 3, 0.193096"})
    void verticalForceAtTheCentreOfGravity(double zeta, double beta, double t) {
        LinearSystem s = SystemBuilder.build(section6(0, Optional.of(ratio(zeta))), ModelScale.NOMINAL);
        double wz = Math.sqrt(8.0e5 / 500);
        Response r = s.respond(new Load.Force(Complex.ONE, fixedAt(point(0, 0, 0), 0, 0, 1)), beta * wz);
        assertEquals(t, r.groundForces().peakOverCycle(), 5.1e-7);
        for (int i = 0; i < 4; i++) {
            assertEquals(t / 4, r.elementForces().abs(3 * i + 2), 5.1e-7 / 4);
            assertEquals(0, r.elementForces().abs(3 * i), 1e-12);
        }
        // base motion along z: the CG follows with the same T (formula 1.4)
        Response b = s.respond(new Load.GroundMotion(Complex.ONE), beta * wz);
        assertEquals(t, b.displacements().abs(2), 5.1e-7);
    }

    // On the decoupled body with equal horizontal stiffnesses x and y share one frequency, so a
    // force rotating about z at the CG is passed to the ground as a rotating force of constant
    // size T·F (formula 1.4), the same T as a fixed force along x.
    @ParameterizedTest
    @CsvSource({"0.05, 0.5, 1.332042", "0.05, 2, 0.339182", "0.10, 3, 0.145366"})
    void rotatingAndFixedForcesAreIsolatedAlike(double zeta, double beta, double t) {
        LinearSystem s = SystemBuilder.build(section6(0, Optional.of(ratio(zeta))), ModelScale.NOMINAL);
        double wx = Math.sqrt(4.0e5 / 500);
        Response rot = s.respond(new Load.Force(Complex.ONE, rotatingAt(point(0, 0, 0), ShaftAxis.Z)), beta * wx);
        Response fix = s.respond(new Load.Force(Complex.ONE, fixedAt(point(0, 0, 0), 1, 0, 0)), beta * wx);
        assertEquals(t, rot.groundForces().peakOverCycle(), 5.1e-7);
        assertEquals(t, fix.groundForces().peakOverCycle(), 5.1e-7);
        // a rotating force of constant size: both components have the same amplitude, 90° apart
        assertEquals(rot.groundForces().abs(0), rot.groundForces().abs(1), 1e-12);
    }

    // spec-format.md: axis z turns x → y, so at ωt = 90° the force points along +y; -z turns the
    // other way. Far below resonance the body follows the force statically.
    @Test
    void rotationSenseFollowsTheSignedAxis() {
        LinearSystem s = SystemBuilder.build(section6(0, Optional.of(ratio(0.05))), ModelScale.NOMINAL);
        double w = 0.01;
        Response plus = s.respond(new Load.Force(Complex.ONE, rotatingAt(point(0, 0, 0), ShaftAxis.Z)), w);
        Response minus = s.respond(new Load.Force(Complex.ONE, rotatingAt(point(0, 0, 0), ShaftAxis.NEG_Z)), w);
        // Re(y·e^{iωt}) at ωt = 90° is −Im(y)
        assertTrue(-plus.displacements().im(1) > 0);
        assertTrue(-minus.displacements().im(1) < 0);
        assertEquals(plus.displacements().re(0), minus.displacements().re(0), 1e-15);
    }

    // Statics (lever rule): with the CG 0.2 m towards +x of the middle of mounts at x = ±0.6 m, the
    // pair at +x carries mg·(0.6 + 0.2)/1.2, the pair at −x mg·(0.6 − 0.2)/1.2, each mount half of it.
    @Test
    void staticDeflectionOfAnOffsetCentreOfGravity() {
        List<Model.Mount> mounts = new ArrayList<>();
        for (double x : new double[] {-0.6, 0.6}) {
            for (double y : new double[] {-0.4, 0.4}) {
                mounts.add(mount("M" + x + y, point(x, y, 0), 1.0e5, 1.0e5, 2.0e5));
            }
        }
        Model.RigidBody b = body(500, point(0.2, 0, 0.3), inertia(40, 60, 80), mounts, Optional.of(ratio(0.05)));
        List<Double> d = SystemBuilder.build(b, ModelScale.NOMINAL).staticDeflections();
        double w = 500 * 9.80665;
        assertEquals(w * 0.4 / 1.2 / 2 / 2.0e5, d.get(0), 1e-12);
        assertEquals(w * 0.8 / 1.2 / 2 / 2.0e5, d.get(3), 1e-12);
    }

    // Element damping on a mount, loss factor η: the vertical mode of the decoupled body has the
    // hysteretic transmissibility √(1 + η²)/√((1 − β²)² + η²) (Harris, from memory) and ζ = η/2.
    @Test
    void hystereticMountsOnTheDecoupledBody() {
        List<Model.Mount> mounts = new ArrayList<>();
        for (double x : new double[] {-0.6, 0.6}) {
            for (double y : new double[] {-0.4, 0.4}) {
                mounts.add(mount("M" + x + y, point(x, y, 0), 1.0e5, 1.0e5, 2.0e5, lossFactor(0.12)));
            }
        }
        LinearSystem s = SystemBuilder.build(body(500, point(0, 0, 0), inertia(40, 60, 80), mounts, Optional.empty()),
                ModelScale.NOMINAL);
        double wz = Math.sqrt(8.0e5 / 500);
        double beta = 1.7;
        double eta = 0.12;
        double expected = Math.sqrt(1 + eta * eta) / Math.sqrt(Math.pow(1 - beta * beta, 2) + eta * eta);
        Response r = s.respond(new Load.Force(Complex.ONE, fixedAt(point(0, 0, 0), 0, 0, 1)), beta * wz);
        assertEquals(expected, r.groundForces().peakOverCycle(), 1e-12 * expected);
        for (Mode m : s.modes()) {
            assertEquals(eta / 2, m.dampingRatio().getAsDouble(), 1e-12);
        }
    }
}
