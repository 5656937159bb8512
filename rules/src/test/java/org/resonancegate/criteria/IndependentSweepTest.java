package org.resonancegate.criteria;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.resonancegate.fixtures.Specs.AT;
import static org.resonancegate.fixtures.Specs.displacement;
import static org.resonancegate.fixtures.Specs.fixed;
import static org.resonancegate.fixtures.Specs.force;
import static org.resonancegate.fixtures.Specs.maxTransmissibility;
import static org.resonancegate.fixtures.Specs.metresPerS2;
import static org.resonancegate.fixtures.Specs.order;
import static org.resonancegate.fixtures.Specs.range;
import static org.resonancegate.fixtures.Specs.single;
import static org.resonancegate.fixtures.Specs.transmittedForce;
import static org.resonancegate.fixtures.Specs.unbalance;
import static org.resonancegate.fixtures.Specs.velocity;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.RepetitionInfo;
import org.resonancegate.dynamics.ModelScale;
import org.resonancegate.dynamics.SystemBuilder;
import org.resonancegate.spec.Criterion;
import org.resonancegate.spec.Excitation;
import org.resonancegate.spec.Model;
import org.resonancegate.spec.Operation;

/**
 * An independent cross-check of the whole response path: random single-mass specs with four
 * excitations (an unbalance, an order-2 force with a phase, a fixed-frequency force, and an
 * order-1 base acceleration that shares the unbalance's frequency), judged by the engine and by
 * a brute-force sweep written here from the textbook equations of motion in plain real
 * arithmetic on a dense grid. The grid maximum is a lower bound of the true one, so the engine
 * must reach it and may exceed it only by the grid's shortfall (0.1 %).
 */
class IndependentSweepTest {

    private static final int GRID = 200_001;

    /** A complex number as two doubles, so this test shares no arithmetic with the engine. */
    private record C(double re, double im) {
        C plus(C o) {
            return new C(re + o.re, im + o.im);
        }

        C minus(C o) {
            return new C(re - o.re, im - o.im);
        }

        C times(C o) {
            return new C(re * o.re - im * o.im, re * o.im + im * o.re);
        }

        C over(C o) {
            double d = o.re * o.re + o.im * o.im;
            return new C((re * o.re + im * o.im) / d, (im * o.re - re * o.im) / d);
        }

        double abs() {
            return Math.hypot(re, im);
        }

        static C polar(double r, double phi) {
            return new C(r * Math.cos(phi), r * Math.sin(phi));
        }
    }

    private record Setup(double m, double k, double c, double nMin, double nMax, double unb, double f2, double phase2,
                         double f3, double hz3, double phase3, double acc) {
    }

    private static Setup random(long seed) {
        Random r = new Random(seed);
        double m = 200 + 4800 * r.nextDouble();
        double fn = 3 + 27 * r.nextDouble();
        double k = m * Math.pow(2 * Math.PI * fn, 2);
        double zeta = 0.01 + 0.19 * r.nextDouble();
        double c = 2 * zeta * Math.sqrt(k * m);
        double nMin = 100 + 1400 * r.nextDouble();
        double nMax = nMin * (1.5 + 2.5 * r.nextDouble());
        return new Setup(m, k, c, nMin, nMax, 10 + 2000 * r.nextDouble(), 10 + 500 * r.nextDouble(),
                2 * Math.PI * r.nextDouble(), 10 + 500 * r.nextDouble(), 2 + 58 * r.nextDouble(),
                2 * Math.PI * r.nextDouble(), 0.01 + 0.5 * r.nextDouble());
    }

    /** Brute force at one running speed Ω (rad/s): displacement, spring force, velocity per line. */
    private static double[] brute(Setup s, double speed) {
        // Line 1: unbalance U·Ω² at Ω, and base acceleration A at Ω (Y = −A/Ω²): same frequency, phasors add.
        // Line 2: force F2·e^{iφ2} at 2Ω. Line 3: force F3·e^{iφ3} at the fixed frequency.
        double[] omegas = {speed, 2 * speed, 2 * Math.PI * s.hz3()};
        double peakX = 0;
        double peakF = 0;
        double rmsV2 = 0;
        double worstT = 0;
        for (int line = 0; line < 3; line++) {
            double w = omegas[line];
            C kc = new C(s.k(), w * s.c());
            C dyn = new C(s.k() - s.m() * w * w, w * s.c());
            C x;
            C springForce;
            if (line == 0) {
                C f = new C(s.unb() * 1e-6 * w * w, 0);
                C y = new C(-s.acc() / (w * w), 0);
                C xf = f.over(dyn);
                C xb = kc.times(y).over(dyn);
                x = xf.plus(xb);
                springForce = kc.times(x.minus(y));
                worstT = Math.max(worstT, kc.times(xf).abs() / f.abs());
                worstT = Math.max(worstT, xb.abs() / y.abs());
            } else {
                C f = line == 1 ? C.polar(s.f2(), s.phase2()) : C.polar(s.f3(), s.phase3());
                x = f.over(dyn);
                springForce = kc.times(x);
                worstT = Math.max(worstT, springForce.abs() / f.abs());
            }
            peakX += x.abs();
            peakF += springForce.abs();
            double v = w * x.abs();
            rmsV2 += v * v / 2;
        }
        return new double[] {peakX, peakF, Math.sqrt(rmsV2), worstT};
    }

    @RepeatedTest(6)
    void engineAgreesWithABruteForceSweep(RepetitionInfo info) {
        Setup s = random(20_261_202L + info.getCurrentRepetition());
        Model.Single model = single(s.m(), s.k(), s.c() / (2 * Math.sqrt(s.k() * s.m())));
        Operation op = range(s.nMin(), s.nMax());
        List<Excitation> ex = List.of(
                unbalance("rotor", 1, s.unb()),
                force("vane", order(2), s.f2(), Math.toDegrees(s.phase2())),
                force("compressor", fixed(s.hz3()), s.f3(), Math.toDegrees(s.phase3())),
                new Excitation.BaseMotion("floor", 0, order(1), Excitation.MotionMeasure.ACCELERATION,
                        metresPerS2(s.acc()), AT));
        double[] best = new double[4];
        double lo = s.nMin() * 2 * Math.PI / 60;
        double hi = s.nMax() * 2 * Math.PI / 60;
        for (int i = 0; i < GRID; i++) {
            double[] b = brute(s, lo + (hi - lo) * i / (GRID - 1));
            for (int j = 0; j < 4; j++) {
                best[j] = Math.max(best[j], b[j]);
            }
        }
        RuleContext ctx = new RuleContext(SystemBuilder.build(model, ModelScale.NOMINAL), op, ex);
        double[] engine = {
            Rules.evaluate(displacement("D", 1, Criterion.DisplacementMeasure.PEAK), ctx).value(),
            Rules.evaluate(transmittedForce("F", 1), ctx).value(),
            Rules.evaluate(velocity("V", 1, Criterion.VelocityMeasure.RMS), ctx).value(),
            Rules.evaluate(maxTransmissibility("T", 1), ctx).value()};
        String[] names = {"displacement", "force", "velocity rms", "transmissibility"};
        for (int j = 0; j < 4; j++) {
            String what = names[j] + " for " + s + ": engine " + engine[j] + ", brute force " + best[j];
            assertTrue(engine[j] >= best[j] * (1 - 1e-9), what);
            assertTrue(engine[j] <= best[j] * (1 + 1e-3), what);
        }
    }
}
