package org.resonancegate.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.resonancegate.fixtures.Models.atMass;
import static org.resonancegate.fixtures.Models.dashpot;
import static org.resonancegate.fixtures.Models.lossFactor;
import static org.resonancegate.fixtures.Models.mass;
import static org.resonancegate.fixtures.Models.spring;
import static org.resonancegate.fixtures.Models.translation;
import static org.resonancegate.fixtures.Specs.AT;
import static org.resonancegate.fixtures.Specs.ratio;

import java.util.List;
import java.util.Optional;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.resonancegate.spec.Model;
import org.resonancegate.spec.Quantity;
import org.resonancegate.units.Dimension;

/** Lumped lines against closed-form multi-degree-of-freedom results (check-values.md §7) and SDOF limits. */
class LumpedLineTest {

    private static LinearSystem build(Model model) {
        return SystemBuilder.build(model, ModelScale.NOMINAL);
    }

    // check-values.md 7.1 (read (secondary): forum derivation of the hanging two-mass chain):
    // ω² = (3 ∓ √5)/2 · k/m.
    @Test
    void twoEqualMassesInAChain() {
        double m = 250;
        double k = 4.0e5;
        LinearSystem s = build(translation(List.of(mass("base", m), mass("motor", m)),
                List.of(spring("lower", "ground", "base", k), spring("upper", "base", "motor", k)),
                Optional.of(ratio(0.02))));
        List<Mode> modes = s.modes();
        assertEquals((3 - Math.sqrt(5)) / 2 * k / m, Math.pow(modes.get(0).angularFrequency(), 2), 1e-9 * k / m);
        assertEquals((3 + Math.sqrt(5)) / 2 * k / m, Math.pow(modes.get(1).angularFrequency(), 2), 1e-9 * k / m);
        // The frequencies themselves are √(k/m)/φ and √(k/m)·φ (φ the golden ratio), so their
        // ratio is φ² = 2.618; check-values.md 7.1 calls the ratio φ, which its own ω² values contradict.
        double phi = (1 + Math.sqrt(5)) / 2;
        assertEquals(phi * phi, modes.get(1).angularFrequency() / modes.get(0).angularFrequency(), 1e-12);
        assertEquals(0.02, modes.get(0).dampingRatio().getAsDouble(), 0);
    }

    // check-values.md 7.2 (computed with SciPy from the formula): two equal masses between two
    // walls, three equal springs: ω² = k/m, 3k/m. Mode 1 moves both masses equally (50 % each).
    @Test
    void twoMassesBetweenWalls() {
        double m = 40;
        double k = 9.0e4;
        LinearSystem s = build(translation(List.of(mass("a", m), mass("b", m)),
                List.of(spring("left", "ground", "a", k), spring("middle", "a", "b", k),
                        spring("right", "b", "ground", k)), Optional.of(ratio(0.05))));
        assertEquals(k / m, Math.pow(s.modes().get(0).angularFrequency(), 2), 1e-9 * k / m);
        assertEquals(3 * k / m, Math.pow(s.modes().get(1).angularFrequency(), 2), 1e-9 * k / m);
        assertEquals(0.5, s.modes().get(0).shares().get(0).fraction(), 1e-12);
        assertEquals(0.5, s.modes().get(0).shares().get(1).fraction(), 1e-12);
    }

    // check-values.md 7.3 (Den Hartog, Mechanical Vibrations; Ormondroyd & Den Hartog 1928): an
    // undamped absorber tuned to ω_a = √(k_a/m_a) holds the main mass still at ω_a; the absorber
    // spring then carries the whole applied force, k_a·x_a = −F.
    @Test
    void undampedAbsorberHoldsTheMainMassStill() {
        double big = 1200;
        double kMain = 3.0e6;
        double small = 60;
        double kAbs = 4.0e5;
        LinearSystem s = build(translation(List.of(mass("main", big), mass("absorber", small)),
                List.of(spring("mounts", "ground", "main", kMain, lossFactor(0.04)),
                        spring("tuned", "main", "absorber", kAbs, dashpot(0))), Optional.empty()));
        double wa = Math.sqrt(kAbs / small);
        Response r = s.respond(new Load.Force(new Complex(1000), atMass("main")), wa);
        double xStatic = 1000 / kMain;
        assertTrue(r.displacements().abs(0) < 1e-12 * xStatic, "main mass moves " + r.displacements().abs(0));
        assertEquals(1000, r.elementForces().abs(1), 1e-9);
        assertEquals(-1000 / kAbs, r.displacements().get(1).getReal(), 1e-12);
        // away from ω_a it does move
        assertTrue(s.respond(new Load.Force(new Complex(1000), atMass("main")), 0.9 * wa).displacements().abs(0)
                > 0.1 * xStatic);
    }

    // check-values.md 7.3/7.4 (Brock 1946, Den Hartog; peaks checked numerically with SciPy): at
    // optimum tuning f = 1/(1 + μ) and optimum damping (c/c_c)² = 3μ/(8(1 + μ)³), c_c = 2·m·Ω_n,
    // both peaks of x₁/x_st are close to √(1 + 2/μ): use 0.5 %.
    @ParameterizedTest
    @CsvSource({"0.05", "0.10", "0.25"})
    void denHartogOptimumAbsorber(double mu) {
        double bigM = 1000;
        double bigK = 1.0e6;
        double omegaN = Math.sqrt(bigK / bigM);
        double m = mu * bigM;
        double f = 1 / (1 + mu);
        double k = m * Math.pow(f * omegaN, 2);
        double c = 2 * m * omegaN * Math.sqrt(3 * mu / (8 * Math.pow(1 + mu, 3)));
        LinearSystem s = build(translation(List.of(mass("main", bigM), mass("absorber", m)),
                List.of(spring("main spring", "ground", "main", bigK, dashpot(0)),
                        spring("absorber", "main", "absorber", k, dashpot(c))), Optional.empty()));
        double peak = 0;
        for (int i = 0; i <= 20000; i++) {
            double w = omegaN * (0.5 + i / 20000.0);
            double x = s.respond(new Load.Force(Complex.ONE, atMass("main")), w).displacements().abs(0) * bigK;
            peak = Math.max(peak, x);
        }
        double expected = Math.sqrt(1 + 2 / mu);
        assertEquals(expected, peak, 0.005 * expected);
    }

    // Hysteretic spring, k(1 + iη): T = √(1 + η²)/√((1 − β²)² + η²) (the loss-factor form of
    // formula 1.4; Harris' Shock and Vibration Handbook, from memory). The reported modal damping
    // ratio is φᵀHφ/(2ω²) = η/2 (spec-format.md fine points; check-values 1.11: η = 2ζ).
    @ParameterizedTest
    @CsvSource({"0.1, 0.5", "0.1, 1.0", "0.2, 2.0", "0.05, 3.0"})
    void hystereticSingleSpringTransmissibility(double eta, double beta) {
        double m = 800;
        double k = 2.0e6;
        LinearSystem s = build(translation(List.of(mass("set", m)),
                List.of(spring("pads", "ground", "set", k, lossFactor(eta))), Optional.empty()));
        double wn = Math.sqrt(k / m);
        double expected = Math.sqrt(1 + eta * eta) / Math.sqrt(Math.pow(1 - beta * beta, 2) + eta * eta);
        Response r = s.respond(new Load.Force(Complex.ONE, atMass("set")), beta * wn);
        assertEquals(expected, r.groundForces().abs(0), 1e-12 * expected);
        Response b = s.respond(new Load.GroundMotion(Complex.ONE), beta * wn);
        assertEquals(expected, b.displacements().abs(0), 1e-12 * expected);
        assertEquals(eta / 2, s.modes().get(0).dampingRatio().getAsDouble(), 1e-14);
    }

    // Modal damping on one mass: the transmissibility of check-values.md 1.4 (Civil Engineering
    // Handbook Eq. 3.23) for a force and for base motion, through the modal multiplier.
    @ParameterizedTest
    @CsvSource({"0.05, 0.5, 1.332042", "0.05, 1.0, 10.049876", "0.05, 2, 0.339182", "0.20, 3, 0.193096"})
    void modalDampingGivesTheSingleMassTransmissibility(double zeta, double beta, double t) {
        LinearSystem s = build(translation(List.of(mass("set", 1)), List.of(spring("s", "ground", "set", 1)),
                Optional.of(ratio(zeta))));
        assertEquals(t, s.respond(new Load.Force(Complex.ONE, atMass("set")), beta).groundForces().abs(0), 5.1e-7);
        assertEquals(t, s.respond(new Load.Force(Complex.ONE, atMass("set")), beta).elementForces().abs(0), 5.1e-7);
        assertEquals(t, s.respond(new Load.GroundMotion(Complex.ONE), beta).displacements().abs(0), 5.1e-7);
    }

    // Statics (lever-free chain): the lower spring carries both weights, the upper one the top mass.
    @Test
    void staticDeflectionOfATwoStageMount() {
        LinearSystem s = build(translation(List.of(mass("inertia base", 900), mass("pump", 400)),
                List.of(spring("springs", "ground", "inertia base", 1.3e6),
                        spring("pads", "inertia base", "pump", 2.0e7)), Optional.of(ratio(0.03))));
        assertEquals(1300 * 9.80665 / 1.3e6, s.staticDeflections().get(0), 1e-15);
        assertEquals(400 * 9.80665 / 2.0e7, s.staticDeflections().get(1), 1e-15);
    }

    // Two inertias on a free shaft (Den Hartog, Mechanical Vibrations, the two-rotor torsional
    // system; from memory): a zero-frequency rigid rotation and ω² = k·(1/J₁ + 1/J₂).
    @Test
    void freeTorsionalPairHasARigidRotation() {
        Quantity j1 = new Quantity(3.5, Dimension.INERTIA, "3.5 kg·m²", AT);
        Quantity j2 = new Quantity(1.2, Dimension.INERTIA, "1.2 kg·m²", AT);
        Model.Lumped shaft = new Model.Lumped(Model.Motion.TORSION,
                List.of(new Model.LumpedMass("motor", j1, AT), new Model.LumpedMass("fan", j2, AT)),
                List.of(new Model.Spring("coupling", "motor", "fan",
                        new Quantity(4.0e4, Dimension.TORSIONAL_STIFFNESS, "40 kN·m/rad", AT), Optional.empty(), AT)),
                Optional.of(ratio(0.02)), true, AT);
        LinearSystem s = build(shaft);
        assertEquals(0, s.modes().get(0).angularFrequency(), 0);
        assertTrue(s.modes().get(0).dampingRatio().isEmpty());
        assertEquals(4.0e4 * (1 / 3.5 + 1 / 1.2), Math.pow(s.modes().get(1).angularFrequency(), 2), 1e-6);
        assertTrue(s.rotational());
        assertTrue(s.staticDeflections().isEmpty());
        // The rigid rotation shares its energy as the inertias: 3.5/4.7 and 1.2/4.7.
        assertEquals(3.5 / 4.7, s.modes().get(0).shares().get(0).fraction(), 1e-9);
        assertEquals("motor", s.modes().get(0).shares().get(0).motion());
    }

    @Test
    void tolerancesScaleStiffnessAndMassButNotDashpots() {
        Model.Lumped m = translation(List.of(mass("set", 100)), List.of(spring("s", "ground", "set", 1e5, dashpot(300))),
                Optional.empty());
        LinearSystem s = SystemBuilder.build(m, new ModelScale(0.85, 1.05));
        double k = 0.85e5;
        double mm = 105;
        assertEquals(Math.sqrt(k / mm), s.modes().get(0).angularFrequency(), 1e-12);
        // ζ = c/(2√(k·m)) with c unscaled (spec-format.md: dashpot coefficients are not scaled)
        assertEquals(300 / (2 * Math.sqrt(k * mm)), s.modes().get(0).dampingRatio().getAsDouble(), 1e-14);
    }

    // A viscous dashpot on the one spring: the element-damping path (full complex solve) gives
    // the transmissibility of check-values.md 1.4 with ζ = c/(2√(k·m)) for base motion, and the
    // spring-plus-dashpot force for a force (Civil Engineering Handbook Eq. 3.23).
    @ParameterizedTest
    @CsvSource({"0.05, 0.5, 1.332042", "0.05, 2, 0.339182", "0.10, 3, 0.145366"})
    void dashpotOnOneSpringGivesTheSdofTransmissibility(double zeta, double beta, double t) {
        double m = 1;
        double k = 1;
        LinearSystem s = build(translation(List.of(mass("set", m)),
                List.of(spring("s", "ground", "set", k, dashpot(2 * zeta))), Optional.empty()));
        assertEquals(zeta, s.modes().get(0).dampingRatio().getAsDouble(), 1e-15);
        assertEquals(t, s.respond(new Load.GroundMotion(Complex.ONE), beta).displacements().abs(0), 5.1e-7);
        assertEquals(t, s.respond(new Load.Force(Complex.ONE, atMass("set")), beta).groundForces().abs(0), 5.1e-7);
    }

    // Statics of a series chain: far below the first mode a force on the top mass passes whole
    // through both springs, and the ground takes all of it.
    @Test
    void quasiStaticForcePassesThroughEverySpring() {
        LinearSystem s = build(translation(List.of(mass("base", 900), mass("pump", 400)),
                List.of(spring("springs", "ground", "base", 1.3e6), spring("pads", "base", "pump", 2.0e7)),
                Optional.of(ratio(0.03))));
        Response r = s.respond(new Load.Force(new Complex(250), atMass("pump")), 1e-3);
        assertEquals(250, r.elementForces().abs(0), 1e-6);
        assertEquals(250, r.elementForces().abs(1), 1e-6);
        assertEquals(250, r.groundForces().abs(0), 1e-6);
        assertEquals(250 / 1.3e6 + 250 / 2.0e7, r.displacements().re(1), 1e-12);
    }
}
