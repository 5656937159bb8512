package org.resonancegate.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.resonancegate.fixtures.Specs.AT;
import static org.resonancegate.fixtures.Specs.hz;
import static org.resonancegate.fixtures.Specs.kg;
import static org.resonancegate.fixtures.Specs.mm;
import static org.resonancegate.fixtures.Specs.number;
import static org.resonancegate.fixtures.Specs.q;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.resonancegate.spec.Damping;
import org.resonancegate.spec.Model;
import org.resonancegate.spec.Stiffness;
import org.resonancegate.units.Dimension;

/** Stiffness and damping forms turned into a system, against check-values.md 1.11 and 2.1. */
class SystemBuilderTest {

    private static SingleMass build(Stiffness k, Damping d, ModelScale scale) {
        return (SingleMass) SystemBuilder.build(new Model.Single(kg(1200), k, d, AT), scale);
    }

    private static Damping ratio(double z) {
        return new Damping.Ratio(number(z), AT);
    }

    // check-values.md 2.1 (read: isolator maker's appendix, formula pages): f_n = 15.76/√δ[mm] Hz,
    // computed check values with gn = 9.80665 (given to 3 decimals).
    @ParameterizedTest
    @CsvSource({"1, 15.761", "6, 6.434", "10, 4.984", "25, 3.152", "50, 2.229", "89, 1.671"})
    void naturalFrequencyFromStaticDeflection(double deltaMm, double expectedHz) {
        SingleMass s = build(new Stiffness.FromStaticDeflection(mm(deltaMm)), ratio(0.05), ModelScale.NOMINAL);
        assertEquals(expectedHz, s.modes().get(0).frequencyHz(), 5.1e-4);
        assertEquals(15.76 / Math.sqrt(deltaMm), s.modes().get(0).frequencyHz(), 1e-3 * expectedHz);
        assertEquals(deltaMm / 1000, s.staticDeflections().get(0), 1e-15);
    }

    // A spring stated by its natural frequency, checked through check-values.md 2.1 (read:
    // isolator maker's appendix, f_n = 15.76/√δ[mm]): the static deflection of the derived spring,
    // m·gn/k, must put the frequency back where it was written: 6.4 Hz ↔ δ = (15.76/6.4)² mm.
    @Test
    void stiffnessFromNaturalFrequency() {
        SingleMass s = build(new Stiffness.FromNaturalFrequency(hz(6.4)), ratio(0.05), ModelScale.NOMINAL);
        double deltaMm = s.staticDeflections().get(0) * 1000;
        assertEquals(Math.pow(15.76 / 6.4, 2), deltaMm, 1e-3 * deltaMm);
        assertEquals(6.4, s.modes().get(0).frequencyHz(), 1e-12);
    }

    // check-values.md 1.11 (read: log-decrement pages, Thomson eqs 2.3-4 and 3.10-5, mech300
    // cross-reference): η = 2ζ, Q = 1/(2ζ), δ = 2πζ/√(1 − ζ²) ⇔ ζ = δ/√(4π² + δ²).
    @Test
    void dampingForms() {
        Stiffness k = new Stiffness.Direct(q(2.4e6, Dimension.STIFFNESS, "2.4 MN/m"));
        double zeta = 0.05;
        double logDec = 2 * Math.PI * zeta / Math.sqrt(1 - zeta * zeta);
        Damping[] forms = {
            ratio(zeta),
            new Damping.LossFactor(number(2 * zeta), AT),
            new Damping.QualityFactor(number(1 / (2 * zeta)), AT),
            new Damping.LogDecrement(number(logDec), AT),
            new Damping.Coefficient(q(2 * zeta * Math.sqrt(2.4e6 * 1200), Dimension.DAMPING_COEFFICIENT, "c"), AT)};
        for (Damping d : forms) {
            assertEquals(zeta, build(k, d, ModelScale.NOMINAL).dampingRatio(), 1e-12, d.toString());
        }
        // Light damping: δ ≈ 2πζ (1.11) — 0.3142 against the exact 0.3146.
        assertEquals(2 * Math.PI * zeta, logDec, 1e-3);
    }

    // spec-format.md, tolerances: ratios are kept, dashpot coefficients are not scaled, and a
    // stiffness written as a static deflection is scaled like any other.
    @Test
    void toleranceScaling() {
        Stiffness delta = new Stiffness.FromStaticDeflection(mm(6));
        ModelScale corner = new ModelScale(0.85, 1.05);
        SingleMass nominal = build(delta, ratio(0.05), ModelScale.NOMINAL);
        SingleMass scaled = build(delta, ratio(0.05), corner);
        assertEquals(nominal.stiffness() * 0.85, scaled.stiffness(), 1e-6);
        assertEquals(1200 * 1.05, scaled.mass(), 1e-9);
        assertEquals(0.05, scaled.dampingRatio(), 1e-12);
        Damping dashpot = new Damping.Coefficient(q(5000, Dimension.DAMPING_COEFFICIENT, "5 kN·s/m"), AT);
        SingleMass withDashpot = build(delta, dashpot, corner);
        assertEquals(5000, withDashpot.dashpot(), 0);
        assertEquals(5000 / (2 * Math.sqrt(withDashpot.stiffness() * withDashpot.mass())),
                withDashpot.dampingRatio(), 1e-12);
    }
}
