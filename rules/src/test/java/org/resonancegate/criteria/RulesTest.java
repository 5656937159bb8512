package org.resonancegate.criteria;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.resonancegate.fixtures.Specs.baseAcceleration;
import static org.resonancegate.fixtures.Specs.displacement;
import static org.resonancegate.fixtures.Specs.fixed;
import static org.resonancegate.fixtures.Specs.force;
import static org.resonancegate.fixtures.Specs.maxTransmissibility;
import static org.resonancegate.fixtures.Specs.minEfficiency;
import static org.resonancegate.fixtures.Specs.order;
import static org.resonancegate.fixtures.Specs.orderOnly;
import static org.resonancegate.fixtures.Specs.range;
import static org.resonancegate.fixtures.Specs.separation;
import static org.resonancegate.fixtures.Specs.single;
import static org.resonancegate.fixtures.Specs.staticDeflection;
import static org.resonancegate.fixtures.Specs.transmittedForce;
import static org.resonancegate.fixtures.Specs.unbalance;
import static org.resonancegate.fixtures.Specs.velocity;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.resonancegate.dynamics.ModelScale;
import org.resonancegate.dynamics.SystemBuilder;
import org.resonancegate.spec.Criterion;
import org.resonancegate.spec.Excitation;
import org.resonancegate.spec.Model;
import org.resonancegate.spec.Operation;

/** Each rule on the nominal model, against closed forms of check-values.md §1 and §3. */
class RulesTest {

    private static final double TWO_PI = 2 * Math.PI;

    /** 1850 kg on 2.4 MN/m: f_n = √(k/m)/2π ≈ 5.73 Hz. */
    private static final Model.Single PUMP_SET = single(1850, 2.4e6, 0.05);
    private static final double PUMP_FN = Math.sqrt(2.4e6 / 1850) / TWO_PI;

    /** 1000 kg tuned to f_n = 10 Hz exactly (600 rpm for order 1). */
    private static Model.Single tenHertz(double zeta) {
        return single(1000, 1000 * Math.pow(TWO_PI * 10, 2), zeta);
    }

    private static Finding judge(Criterion c, Model model, Operation op, List<? extends Excitation> ex) {
        return Rules.evaluate(c, new RuleContext(SystemBuilder.build(model, ModelScale.NOMINAL), op,
                List.copyOf(ex)));
    }

    private static void assertRel(double expected, double actual, double rel) {
        assertEquals(expected, actual, rel * Math.abs(expected));
    }

    // --- separation (spec-format.md: value = smallest |f/f_n − 1|, 0 when a band holds a mode) ---

    @Test
    void separationIsZeroWhenTheSpeedBandContainsTheMode() {
        Finding f = judge(separation("SEP", 0.2), PUMP_SET, range(300, 1500), List.of(unbalance("impeller", 1, 500)));
        assertEquals(0, f.value(), 0);
        assertTrue(f.fails());
        assertRel(PUMP_FN * 60, f.speedRpm().getAsDouble(), 1e-12);
        assertRel(PUMP_FN, f.frequencyHz().getAsDouble(), 1e-12);
        assertEquals(0.2, f.limit(), 0);
    }

    @Test
    void separationOutsideTheBandIsMeasuredFromTheNearerEnd() {
        Finding f = judge(separation("SEP", 0.2), PUMP_SET, range(600, 1500), List.of(unbalance("impeller", 1, 500)));
        assertRel(10 / PUMP_FN - 1, f.value(), 1e-12);
        assertEquals(600, f.speedRpm().getAsDouble(), 1e-9);
        assertFalse(f.fails());
        assertTrue(f.message().contains("at 600 rpm (10 Hz) is 74.4 % from mode 1 at 5.732 Hz, outside the 20 % margin"),
                f.message());
    }

    @Test
    void separationIncludesOrderOnlyAndFixedFrequencies() {
        // Blade pass order 3 from 600 rpm starts at 30 Hz; a fixed 6 Hz line is 4.7 % from 5.73 Hz.
        Finding f = judge(separation("SEP", 0.1), PUMP_SET, range(600, 1500),
                List.of(unbalance("impeller", 1, 500), orderOnly("blade pass", 3), force("compressor", fixed(6), 200, 0)));
        assertRel(6 / PUMP_FN - 1, f.value(), 1e-12);
        assertTrue(f.speedRpm().isEmpty(), "a fixed frequency does not depend on speed");
        assertEquals(6, f.frequencyHz().getAsDouble(), 1e-12);
        assertTrue(f.fails());
        assertTrue(f.message().contains("'compressor' at 6 Hz is 4.67 % from mode 1"), f.message());
        assertTrue(f.message().contains("inside the 10 % margin by 5.33 percentage points"), f.message());
        // An order-only excitation alone still counts: order 0.5 from 750 rpm starts at 6.25 Hz.
        Finding g = judge(separation("SEP", 0.1), PUMP_SET, range(750, 1500), List.of(orderOnly("belt", 0.5)));
        assertRel(6.25 / PUMP_FN - 1, g.value(), 1e-12);
        assertEquals(750, g.speedRpm().getAsDouble(), 1e-9);
    }

    @Test
    void separationTiesGoToTheLowestSpeed() {
        // Orders 1 and 2 both sweep through the mode; order 2 meets it at half the speed.
        Finding f = judge(separation("SEP", 0.2), PUMP_SET, range(150, 1500),
                List.of(unbalance("impeller", 1, 500), force("vane", order(2), 100, 0)));
        assertEquals(0, f.value(), 0);
        assertRel(PUMP_FN * 60 / 2, f.speedRpm().getAsDouble(), 1e-12);
    }

    @Test
    void separationOnAFixedSpeedMachine() {
        Finding f = judge(separation("SEP", 0.2), PUMP_SET, range(1480, 1480), List.of(unbalance("impeller", 1, 500)));
        assertRel(1480 / 60.0 / PUMP_FN - 1, f.value(), 1e-12);
        assertEquals(1480, f.speedRpm().getAsDouble(), 1e-9);
    }

    // --- isolation (check-values.md 1.4–1.6, 1.9) ---

    // 1.9 and the §1 table (computed with SciPy; a regression value): at ζ = 0.05, T_max =
    // 10.062214 at β = 0.997522.
    @Test
    void isolationFindsTheTransmissibilityPeak() {
        Finding f = judge(maxTransmissibility("ISO", 0.2), tenHertz(0.05), range(300, 1200),
                List.of(force("drive", order(1), 500, 0)));
        assertEquals(10.062214, f.value(), 5.1e-7);
        assertRel(600 * 0.997522, f.speedRpm().getAsDouble(), 2e-6);
        assertTrue(f.fails());
        assertTrue(f.message().contains("exceeds 0.2"), f.message());
    }

    // 1.6 and the §1 table: IE = 1 − T = 0.660818 at β = 2, ζ = 0.05; a fixed-speed machine.
    @Test
    void isolationEfficiencyAtAFixedSpeed() {
        Finding f = judge(minEfficiency("ISO", 0.8), tenHertz(0.05), range(1200, 1200),
                List.of(unbalance("fan", 1, 300)));
        assertEquals(0.660818, f.value(), 5.1e-7);
        assertEquals(0.8, f.limit(), 0);
        assertEquals(1200, f.speedRpm().getAsDouble(), 1e-9);
        assertEquals(20, f.frequencyHz().getAsDouble(), 1e-12);
        assertTrue(f.fails());
    }

    // Each excitation alone; the worst counts; order-only lines carry no load and are left out.
    @Test
    void isolationTakesTheWorstExcitationAndSkipsOrderOnly() {
        double zeta = 0.05;
        Finding f = judge(maxTransmissibility("ISO", 0.5), tenHertz(zeta), range(1200, 2400),
                List.of(unbalance("fan", 1, 300), orderOnly("sub-harmonic", 0.5), baseAcceleration("floor", fixed(15), 0.1)));
        assertRel(Sdof.transmissibility(1.5, zeta), f.value(), 1e-9);
        assertTrue(f.speedRpm().isEmpty(), "governed by a fixed-frequency excitation");
        assertEquals(15, f.frequencyHz().getAsDouble(), 1e-12);
        // Without the floor line the unbalance governs at the bottom of the range (β = 2).
        Finding g = judge(maxTransmissibility("ISO", 0.5), tenHertz(zeta), range(1200, 2400),
                List.of(unbalance("fan", 1, 300), orderOnly("sub-harmonic", 0.5)));
        assertEquals(0.339182, g.value(), 5.1e-7);
        assertEquals(1200, g.speedRpm().getAsDouble(), 1e-6);
    }

    // 1.5: T → 1 as β → 0; an unbalance at standstill carries no force, yet T is defined.
    @Test
    void isolationFromStandstill() {
        Finding f = judge(maxTransmissibility("ISO", 20), tenHertz(0.05), range(0, 300),
                List.of(unbalance("fan", 1, 300)));
        // Over 0–300 rpm (β ≤ 0.5) the worst is at the top: T(0.5, 0.05) = 1.332042 (§1 table).
        assertEquals(1.332042, f.value(), 5.1e-7);
        assertEquals(300, f.speedRpm().getAsDouble(), 1e-6);
    }

    // §1 table: D_max = 10.012523 at β = 0.997497 for ζ = 0.05 (computed with SciPy; a regression value).
    @Test
    void displacementPeakAtFivePercentDamping() {
        double k = 1000 * Math.pow(TWO_PI * 10, 2);
        Finding f = judge(displacement("DISP", 1, Criterion.DisplacementMeasure.PEAK), tenHertz(0.05), range(300, 1200),
                List.of(force("drive", order(1), 1000, 0)));
        assertEquals(10.012523, f.value() * k / 1000, 5.1e-7);
        assertRel(600 * 0.997497, f.speedRpm().getAsDouble(), 2e-6);
    }

    // Fine points: ties between excitations go to the first listed. Orders 1 and 2 both cross
    // the mode, so both reach the same T_max (it depends on ζ alone, check-values 1.9); order 2
    // reaches it at half the speed, but order 1 is listed first.
    @Test
    void isolationTiesGoToTheFirstListedExcitation() {
        Finding f = judge(maxTransmissibility("ISO", 0.2), tenHertz(0.05), range(200, 1200),
                List.of(unbalance("impeller", 1, 300), force("vane", order(2), 50, 0)));
        assertEquals(10.062214, f.value(), 5.1e-7);
        assertRel(600 * 0.997522, f.speedRpm().getAsDouble(), 2e-6);
        assertTrue(f.message().contains("for 'impeller'"), f.message());
    }

    @Test
    void isolationWithOnlyOrderLinesCannotBeJudged() {
        assertThrows(CriterionProblem.class, () -> judge(maxTransmissibility("ISO", 0.5), tenHertz(0.05),
                range(1200, 2400), List.of(orderOnly("gear mesh", 23))));
    }

    // --- response amplitudes ---

    // 1.3 (closed form): X_max = (F/k)·1/(2ζ√(1 − ζ²)) for a constant force; ζ = 0.005 found
    // within 0.1 % over a speed range.
    @Test
    void lightlyDampedForcePeakOverTheSpeedRange() {
        double zeta = 0.005;
        Model.Single m = tenHertz(zeta);
        double k = ((org.resonancegate.spec.Stiffness.Direct) m.stiffness()).written().si();
        Finding f = judge(displacement("DISP", 1, Criterion.DisplacementMeasure.PEAK), m, range(300, 1200),
                List.of(force("drive", order(1), 1000, 0)));
        double expected = 1000 / k * Sdof.peakHeight(zeta);
        assertRel(expected, f.value(), 1e-3);
        assertRel(600 * Math.sqrt(1 - 2 * zeta * zeta), f.speedRpm().getAsDouble(), 1e-3);
    }

    // 1.7/1.8: unbalance amplitude X = (U/M)·β²·D peaks at β = 1/√(1 − 2ζ²), height
    // (U/M)/(2ζ√(1 − ζ²)).
    @Test
    void lightlyDampedUnbalancePeak() {
        double zeta = 0.005;
        Finding f = judge(displacement("DISP", 1, Criterion.DisplacementMeasure.PEAK), tenHertz(zeta),
                range(300, 1200), List.of(unbalance("rotor", 1, 2000)));
        double expected = 2000e-6 / 1000 * Sdof.peakHeight(zeta);
        assertRel(expected, f.value(), 1e-3);
        assertRel(600 / Math.sqrt(1 - 2 * zeta * zeta), f.speedRpm().getAsDouble(), 1e-3);
    }

    // 3.9 (read: conversion notes): peak-to-peak = 2 × peak; rms = peak/√2; V = ωX.
    @Test
    void measuresOfOneSinusoid() {
        Model.Single m = tenHertz(0.05);
        Operation op = range(1500, 1500); // 25 Hz
        List<Excitation> ex = List.of(unbalance("fan", 1, 400));
        Finding peak = judge(displacement("D1", 1, Criterion.DisplacementMeasure.PEAK), m, op, ex);
        Finding p2p = judge(displacement("D2", 1, Criterion.DisplacementMeasure.PEAK_TO_PEAK), m, op, ex);
        Finding vPeak = judge(velocity("V1", 4.5, Criterion.VelocityMeasure.PEAK), m, op, ex);
        Finding vRms = judge(velocity("V2", 4.5, Criterion.VelocityMeasure.RMS), m, op, ex);
        double beta = 2.5;
        double x = 400e-6 / 1000 * beta * beta * Sdof.magnification(beta, 0.05);
        assertRel(x, peak.value(), 1e-12);
        assertRel(2 * x, p2p.value(), 1e-12);
        assertRel(TWO_PI * 25 * x, vPeak.value(), 1e-12);
        assertRel(TWO_PI * 25 * x / Math.sqrt(2), vRms.value(), 1e-12);
        assertEquals(1500, vRms.speedRpm().getAsDouble(), 1e-9);
    }

    // 1.4 and the §1 table: force into the spring = F·T; T(3, 0.2) = 0.193096.
    @Test
    void transmittedForceIsForceTimesTransmissibility() {
        Finding f = judge(transmittedForce("FT", 200), tenHertz(0.2), range(1800, 1800),
                List.of(force("drive", order(1), 1000, 0)));
        assertEquals(193.096, f.value(), 5.1e-4);
        assertEquals("N", f.unit());
        assertFalse(f.fails());
    }

    // Same-frequency excitations add as phasors (spec-format.md Criteria).
    @Test
    void sameFrequencyForcesAddAsPhasors() {
        Model.Single m = tenHertz(0.05);
        Operation op = range(900, 1500);
        Criterion.Displacement c = displacement("D", 1, Criterion.DisplacementMeasure.PEAK);
        double one = judge(c, m, op, List.of(force("a", fixed(25), 50, 0))).value();
        double cancelled = judge(c, m, op, List.of(force("a", fixed(25), 50, 0), force("b", fixed(25), 50, 180))).value();
        double doubled = judge(c, m, op, List.of(force("a", fixed(25), 50, 0), force("b", fixed(25), 50, 0))).value();
        double quadrature = judge(c, m, op, List.of(force("a", fixed(25), 50, 0), force("b", fixed(25), 50, 90))).value();
        assertRel(50 / (1000 * Math.pow(TWO_PI * 10, 2)) * Sdof.magnification(2.5, 0.05), one, 1e-12);
        assertEquals(0, cancelled, 1e-12 * one);
        assertRel(2 * one, doubled, 1e-12);
        assertRel(Math.sqrt(2) * one, quadrature, 1e-12);
    }

    // Distinct frequencies: peak adds arithmetically, rms as root sum of squares (spec-format.md;
    // check-values 3.9 for rms of each sinusoid).
    @Test
    void distinctFrequenciesAddArithmeticallyForPeakAndAsRssForRms() {
        double zeta = 0.05;
        Model.Single m = tenHertz(zeta);
        Operation op = range(900, 1500);
        List<Excitation> ex = List.of(force("a", fixed(25), 50, 0), force("b", fixed(40), 80, 30));
        double k = 1000 * Math.pow(TWO_PI * 10, 2);
        double x1 = 50 / k * Sdof.magnification(2.5, zeta);
        double x2 = 80 / k * Sdof.magnification(4, zeta);
        double v1 = TWO_PI * 25 * x1;
        double v2 = TWO_PI * 40 * x2;
        assertRel(x1 + x2, judge(displacement("D", 1, Criterion.DisplacementMeasure.PEAK), m, op, ex).value(), 1e-12);
        assertRel(v1 + v2, judge(velocity("V", 1, Criterion.VelocityMeasure.PEAK), m, op, ex).value(), 1e-12);
        Finding rms = judge(velocity("V", 1, Criterion.VelocityMeasure.RMS), m, op, ex);
        assertRel(Math.sqrt(v1 * v1 + v2 * v2) / Math.sqrt(2), rms.value(), 1e-12);
        assertTrue(rms.speedRpm().isEmpty(), "fixed frequencies only: no speed dependence");
    }

    @Test
    void messagesUseTheUnitsTheUserWrote() {
        Finding f = judge(velocity("VEL", 4.5, Criterion.VelocityMeasure.RMS), tenHertz(0.05), range(300, 1200),
                List.of(unbalance("rotor", 1, 20000)));
        assertTrue(f.fails());
        String msg = f.message();
        assertTrue(msg.startsWith("velocity "), msg);
        assertTrue(msg.contains(" mm/s rms at "), msg);
        assertTrue(msg.contains(" rpm ("), msg);
        assertTrue(msg.contains("exceeds 4.5 mm/s by "), msg);
        assertTrue(msg.contains("nearest mode 1 at 10 Hz"), msg);
    }

    // --- static deflection (spec-format.md: the bound nearer by relative distance is the limit) ---

    @Test
    void staticDeflectionReportsTheRelativelyNearerBound() {
        // δ = 10 mm; 4 mm above the 6 mm minimum (67 %) but 15 mm under the 25 mm maximum (60 %).
        Model.Single m = single(1000, 1000 * 9.80665 / 0.010, 0.05);
        Finding f = judge(staticDeflection("SD", 6.0, 25.0), m, range(900, 1500), List.of(unbalance("r", 1, 1)));
        assertEquals(0.010, f.value(), 1e-15);
        assertEquals(0.025, f.limit(), 0);
        assertFalse(f.fails());
        assertTrue(f.speedRpm().isEmpty() && f.frequencyHz().isEmpty());
        Finding tooSoft = judge(staticDeflection("SD", 12.0, null), m, range(900, 1500), List.of(unbalance("r", 1, 1)));
        assertTrue(tooSoft.fails());
        assertEquals(0.012, tooSoft.limit(), 0);
        assertTrue(tooSoft.message().contains("10 mm is below the minimum 12 mm"), tooSoft.message());
    }
}
