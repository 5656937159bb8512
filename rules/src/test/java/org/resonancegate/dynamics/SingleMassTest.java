package org.resonancegate.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The closed-form single mass against the published SDOF formulas and the test-vector table of
 * check-values.md §1. The system is normalised (m = 1 kg, k = 1 N/m, so ω_n = 1 rad/s and ω = β).
 */
class SingleMassTest {

    private static SingleMass normalised(double zeta) {
        return new SingleMass(1, 1, DampingRatios.coefficientFor(zeta, 1, 1));
    }

    /** The table is printed to 6 decimals: allow its rounding as well as 1e-6 relative. */
    private static void assertTable(double expected, double actual) {
        assertEquals(expected, actual, Math.max(1e-6 * Math.abs(expected), 5.1e-7));
    }

    // check-values.md §1 test vectors (computed with SciPy from formulas 1.1, 1.2, 1.4, 1.6, 1.7;
    // a regression value, not a published one). Columns: ζ, β, D, φ (deg), T, β²·D.
    @ParameterizedTest
    @CsvSource({
        "0.05, 0.5, 1.330380, 3.8141, 1.332042, 0.332595",
        "0.05, 1.0, 10.000000, 90.0000, 10.049876, 10.000000",
        "0.05, 1.4142135623730951, 0.990148, 171.9505, 1.000000, 1.980295",
        "0.05, 2, 0.332595, 176.1859, 0.339182, 1.330380",
        "0.05, 3, 0.124912, 177.8524, 0.130412, 1.124210",
        "0.10, 3, 0.124650, 175.7108, 0.145366, 1.121849",
        "0.20, 3, 0.123617, 171.4692, 0.193096, 1.112553"})
    void matchesTheSdofTestVectors(double zeta, double beta, double d, double phaseDeg, double t, double unb) {
        SingleMass s = normalised(zeta);
        Response r = s.respond(new Load.Force(Complex.ONE), beta);
        Complex x = r.displacements().get(0);
        // 1.1: D = |x|·k/F
        assertTable(d, x.abs());
        // 1.2: the displacement lags the force by atan2(2ζβ, 1 − β²)
        assertEquals(phaseDeg, Math.toDegrees(-x.getArgument()), 5.1e-5);
        // 1.4: force transmissibility |spring + dashpot force| / |F|
        assertTable(t, r.groundForces().get(0).abs());
        // 1.4: the same T is the motion transmissibility under base excitation
        Response base = s.respond(new Load.GroundMotion(Complex.ONE), beta);
        assertTable(t, base.displacements().get(0).abs());
        // 1.7: unbalance U at ω = β: F = U·ω², M·X/U = β²·D
        Response u = s.respond(new Load.Force(new Complex(beta * beta)), beta);
        assertTable(unb, u.displacements().get(0).abs());
    }

    // check-values.md 1.5 (read: Civil Engineering Handbook): T = 1 at β = √2 for every ζ.
    @ParameterizedTest
    @ValueSource(doubles = {0.001, 0.01, 0.05, 0.1, 0.3, 0.7, 1.5})
    void transmissibilityIsOneAtRootTwo(double zeta) {
        Response r = normalised(zeta).respond(new Load.Force(Complex.ONE), Math.sqrt(2));
        assertEquals(1.0, r.elementForces().get(0).abs(), 1e-12);
    }

    // check-values.md 1.5: T < 1 only above β = √2 and ≥ 1 below.
    @Test
    void transmissibilityIsBelowOneOnlyAboveRootTwo() {
        SingleMass s = normalised(0.1);
        assertEquals(true, s.respond(new Load.Force(Complex.ONE), 1.3).groundForces().get(0).abs() > 1);
        assertEquals(true, s.respond(new Load.Force(Complex.ONE), 1.5).groundForces().get(0).abs() < 1);
    }

    // check-values.md 1.3 (textbook closed form): at β = 1 exactly, D = 1/(2ζ).
    @Test
    void magnificationAtResonanceIsOneOverTwoZeta() {
        Response r = normalised(0.02).respond(new Load.Force(Complex.ONE), 1);
        assertEquals(25.0, r.displacements().get(0).abs(), 1e-12);
    }

    // Base motion: the spring-and-dashpot force (k + iωc)(x − y) is the only force on the mass,
    // so by Newton's second law its amplitude equals m·ω²·|x|, an independent check.
    @Test
    void springForceUnderBaseMotionBalancesTheInertiaOfTheMass() {
        SingleMass s = new SingleMass(1850, 2.4e6, DampingRatios.coefficientFor(0.05, 2.4e6, 1850));
        double omega = 40;
        Response r = s.respond(new Load.GroundMotion(new Complex(0.001)), omega);
        assertEquals(1850 * omega * omega * r.displacements().get(0).abs(), r.elementForces().get(0).abs(), 1e-6);
    }

    // Natural frequency √(k/m) and static deflection m·gn/k (check-values 2.1: f_n = (1/2π)√(g/δ)).
    @Test
    void modeAndStaticDeflection() {
        SingleMass s = new SingleMass(1850, 2.4e6, 1000);
        assertEquals(Math.sqrt(2.4e6 / 1850), s.modes().get(0).angularFrequency(), 1e-12);
        assertEquals(1000 / (2 * Math.sqrt(2.4e6 * 1850)), s.modes().get(0).dampingRatio().getAsDouble(), 1e-15);
        double delta = s.staticDeflections().get(0);
        assertEquals(1850 * 9.80665 / 2.4e6, delta, 1e-15);
        assertEquals(Math.sqrt(9.80665 / delta) / (2 * Math.PI), s.modes().get(0).frequencyHz(), 1e-12);
    }
}
