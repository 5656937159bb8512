package org.resonancegate.criteria;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.resonancegate.fixtures.Specs.force;
import static org.resonancegate.fixtures.Specs.maxTransmissibility;
import static org.resonancegate.fixtures.Specs.order;
import static org.resonancegate.fixtures.Specs.range;
import static org.resonancegate.fixtures.Specs.single;
import static org.resonancegate.fixtures.Specs.spec;
import static org.resonancegate.fixtures.Specs.unbalance;
import static org.resonancegate.fixtures.Specs.velocity;

import java.time.LocalDate;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.resonancegate.check.SpecEvaluator;
import org.resonancegate.report.ResponseCurve;
import org.resonancegate.report.SpecResult;
import org.resonancegate.spec.Criterion;

/** The curves a report draws, against the closed-form response of a damped single mass. */
class ResponseCurvesTest {

    private static final double M = 400;        // kg
    private static final double K = 4.0e6;      // N/m: f_n = √(k/m)/2π = 15.92 Hz
    private static final double ZETA = 0.05;
    private static final double U = 2e-3;       // kg·m (2000 g·mm)

    @Test
    void velocityUnderUnbalanceFollowsTheSingleMassFormulaAtEverySample() {
        SpecResult r = SpecEvaluator.evaluate(spec(single(M, K, ZETA), range(600, 1200),
                List.of(unbalance("rotor", 1, U * 1e6)),
                List.of(velocity("VEL", 4.5, Criterion.VelocityMeasure.RMS))), LocalDate.of(2026, 6, 1));
        ResponseCurve curve = r.details().curves().get(0);
        assertEquals("velocity rms", curve.quantity());
        assertEquals(0.0045, curve.limit(), 1e-15);
        assertEquals("mm/s", curve.displayUnit());
        for (ResponseCurve.Point p : curve.points()) {
            double w = p.speedRpm() * 2 * Math.PI / 60;
            // from memory (any vibration text, rotating unbalance on a damped single mass):
            // X = U·ω² / √((k − mω²)² + (cω)²), c = 2ζ√(km); rms velocity = ωX/√2
            double c = 2 * ZETA * Math.sqrt(K * M);
            double x = U * w * w / Math.hypot(K - M * w * w, c * w);
            assertEquals(w * x / Math.sqrt(2), p.value(), 1e-9 * Math.max(1e-6, w * x), "at " + p.speedRpm() + " rpm");
        }
    }

    @Test
    void aRunThatDrawsNoPlotsLeavesTheCurvesOutButJudgesTheSame() {
        var spec = spec(single(M, K, ZETA), range(600, 1200), List.of(unbalance("rotor", 1, U * 1e6)),
                List.of(velocity("VEL", 4.5, Criterion.VelocityMeasure.RMS)));
        SpecResult with = SpecEvaluator.evaluate(spec, LocalDate.of(2026, 6, 1), true);
        SpecResult without = SpecEvaluator.evaluate(spec, LocalDate.of(2026, 6, 1), false);
        assertEquals(1, with.details().curves().size());
        assertEquals(0, without.details().curves().size());
        assertEquals(with.checks(), without.checks(), "the verdict does not depend on the plot data");
        assertEquals(with.details().interference(), without.details().interference());
    }

    @Test
    void samplesReachBeyondTheRangeAndIncludeTheResonanceSpeed() {
        SpecResult r = SpecEvaluator.evaluate(spec(single(M, K, ZETA), range(1200, 1800),
                List.of(unbalance("rotor", 1, 2000)),
                List.of(velocity("VEL", 4.5, Criterion.VelocityMeasure.RMS))), LocalDate.of(2026, 6, 1));
        List<ResponseCurve.Point> points = r.details().curves().get(0).points();
        double resonanceRpm = Math.sqrt(K / M) / (2 * Math.PI) * 60; // from memory: f_n = √(k/m)/2π, n = 60·f/order
        assertTrue(points.stream().anyMatch(p -> Math.abs(p.speedRpm() - resonanceRpm) < 1e-9 * resonanceRpm),
                "resonance speed " + resonanceRpm + " is a sample");
        assertEquals(1.25 * 1800, points.get(points.size() - 1).speedRpm(), 1e-9);
        assertTrue(points.get(0).speedRpm() < 0.1 * 1200);
        assertTrue(points.size() >= 100 && points.size() <= 200, "a modest curve: " + points.size());
        for (int i = 1; i < points.size(); i++) {
            assertTrue(points.get(i).speedRpm() > points.get(i - 1).speedRpm(), "ascending");
        }
    }

    @Test
    void isolationCurveIsTheForceTransmissibilityOfADampedSingleMass() {
        SpecResult r = SpecEvaluator.evaluate(spec(single(M, K, ZETA), range(600, 1200),
                List.of(force("drive", order(1), 500, 0)), List.of(maxTransmissibility("ISO", 0.3))),
                LocalDate.of(2026, 6, 1));
        ResponseCurve curve = r.details().curves().get(0);
        assertEquals("transmissibility", curve.quantity());
        double wn = Math.sqrt(K / M);
        for (ResponseCurve.Point p : curve.points()) {
            double ratio = p.speedRpm() * 2 * Math.PI / 60 / wn;
            // from memory (force transmissibility): T = √(1 + (2ζr)²) / √((1 − r²)² + (2ζr)²)
            double t = Math.hypot(1, 2 * ZETA * ratio) / Math.hypot(1 - ratio * ratio, 2 * ZETA * ratio);
            assertEquals(t, p.value(), 1e-9 * t, "at r = " + ratio);
        }
    }
}
