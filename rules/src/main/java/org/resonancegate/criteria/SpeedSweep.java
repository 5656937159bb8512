package org.resonancegate.criteria;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;

/**
 * Finds the largest value of a function of running speed over a closed range. A grid alone lets
 * a lightly damped peak slip between points, so the candidates are the range ends, the caller's
 * special speeds (resonances, analytic peaks and points around them) and a coarse uniform grid;
 * then every local maximum of those samples is refined by Brent's method inside the bracket of
 * its two neighbours.
 */
public final class SpeedSweep {

    /**
     * Uniform grid points across the range, besides the special speeds. The grid only has to
     * bracket the broad features: every narrow (lightly damped) peak sits next to a resonance
     * speed the caller passes in, with its own local points, and each local maximum of the samples
     * is refined by Brent inside its bracket.
     */
    public static final int GRID_POINTS = 32;

    /** The worst speed and the value there. */
    public record Peak(double speed, double value) {
    }

    private SpeedSweep() {
    }

    /** As {@link #maximise(DoubleUnaryOperator, double, double, double[], String)}, with boxed speeds. */
    public static Peak maximise(DoubleUnaryOperator f, double lo, double hi, Collection<Double> specialSpeeds,
                                String what) {
        return maximise(f, lo, hi, specialSpeeds.stream().mapToDouble(Double::doubleValue).toArray(), what);
    }

    /**
     * The maximum of {@code f} over [lo, hi]; ties (within a relative 1e-9) go to the lower speed.
     * Every sample must be finite, otherwise a {@link CriterionProblem} names the speed.
     */
    public static Peak maximise(DoubleUnaryOperator f, double lo, double hi, double[] specialSpeeds, String what) {
        return maximiseOver(f, lo, hi, hi > lo ? samples(lo, hi, specialSpeeds) : new double[0], what);
    }

    /**
     * As {@link #maximise(DoubleUnaryOperator, double, double, double[], String)}, over samples
     * already made by {@link #samples} for this range: a model case sweeps the same samples
     * for every criterion and excitation, so it sorts them once.
     */
    static Peak maximiseOver(DoubleUnaryOperator f, double lo, double hi, double[] x, String what) {
        // The message is built only when needed: formatting a speed costs more than a response.
        DoubleUnaryOperator checked = s -> {
            double v = f.applyAsDouble(s);
            return Double.isFinite(v) ? v : CriterionProblem.requireFinite(v, what + " at " + Display.rpm(s));
        };
        if (!(hi > lo)) {
            return new Peak(lo, checked.applyAsDouble(lo));
        }
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            y[i] = checked.applyAsDouble(x[i]);
        }
        Peak best = new Peak(x[0], y[0]);
        for (int i = 0; i < x.length; i++) {
            best = better(best, new Peak(x[i], y[i]));
        }
        for (int i : localMaxima(y)) {
            if ((i == 0 || i == x.length - 1) && x.length > 1 && fallsInward(checked, x, y, i)) {
                continue; // the range end is the top of its bracket, and it is a sample already
            }
            int left = Math.max(0, i - 1);
            int right = Math.min(x.length - 1, i + 1);
            best = better(best, refine(checked, x[left], x[right], start(x, y, left, i, right)));
        }
        return best;
    }

    /** The grid, both ends and the special speeds inside the range, ascending, each once. */
    static double[] samples(double lo, double hi, double[] specialSpeeds) {
        double[] all = new double[GRID_POINTS + 2 + specialSpeeds.length];
        int count = 0;
        for (int i = 0; i < GRID_POINTS; i++) {
            all[count++] = lo + (hi - lo) * i / (GRID_POINTS - 1);
        }
        all[count++] = lo;
        all[count++] = hi;
        for (double s : specialSpeeds) {
            if (s >= lo && s <= hi) {
                all[count++] = s;
            }
        }
        Arrays.sort(all, 0, count);
        int kept = 0;
        for (int i = 0; i < count; i++) {
            if (kept == 0 || all[i] != all[kept - 1]) {
                all[kept++] = all[i];
            }
        }
        return Arrays.copyOf(all, kept);
    }

    /** How far inside the range, as a share of the end bracket, the slope at a range end is read. */
    private static final double INWARD = 1e-7;

    /**
     * Whether the function falls on going inward from range end {@code i}. Refinement assumes one
     * hump at most inside a bracket (as Brent's method does); a function that already falls at
     * the end has its top there, so twenty-odd refinement steps can be spared for one sample.
     */
    private static boolean fallsInward(DoubleUnaryOperator f, double[] x, double[] y, int i) {
        int inner = i == 0 ? 1 : i - 1;
        double probe = x[i] + INWARD * (x[inner] - x[i]);
        return probe != x[i] && f.applyAsDouble(probe) < y[i];
    }

    /** Samples not lower than their neighbours, leaving out flat stretches (nothing to refine there). */
    static List<Integer> localMaxima(double[] y) {
        List<Integer> out = new ArrayList<>();
        for (int i = 0; i < y.length; i++) {
            boolean leftOk = i == 0 || y[i] >= y[i - 1];
            boolean rightOk = i == y.length - 1 || y[i] >= y[i + 1];
            boolean flat = (i == 0 || y[i] == y[i - 1]) && (i == y.length - 1 || y[i] == y[i + 1]);
            if (leftOk && rightOk && !flat) {
                out.add(i);
            }
        }
        return out;
    }

    /**
     * Where Brent starts inside bracket [x_lo, x_hi]: the top of the parabola through the three
     * samples, which near a smooth peak is already close, so fewer steps are spent closing in; the
     * middle sample when the three do not make a downward parabola with its top strictly inside.
     */
    static double start(double[] x, double[] y, int lo, int mid, int hi) {
        if (lo == mid || mid == hi) {
            return x[mid];
        }
        double p = x[mid] - x[lo];
        double q = x[mid] - x[hi];
        double fp = y[mid] - y[hi];
        double fq = y[mid] - y[lo];
        double den = p * fp - q * fq;
        double top = x[mid] - 0.5 * (p * p * fp - q * q * fq) / den;
        return den != 0 && Double.isFinite(top) && top > x[lo] && top < x[hi] ? top : x[mid];
    }

    private static Peak refine(DoubleUnaryOperator f, double a, double b, double start) {
        if (!(b > a)) {
            return new Peak(start, f.applyAsDouble(start));
        }
        // A relative 1e-10 in speed leaves the peak value exact to far below the 1e-9 tie rule
        // (the error is second order), and spares a third of the steps 1e-12 took.
        BrentOptimizer brent = new BrentOptimizer(1e-10, 1e-14 * Math.max(Math.abs(a), Math.abs(b)));
        try {
            UnivariatePointValuePair p = brent.optimize(new MaxEval(500),
                    new UnivariateObjectiveFunction(f::applyAsDouble), GoalType.MAXIMIZE,
                    new SearchInterval(a, b, start));
            return new Peak(p.getPoint(), p.getValue());
        } catch (TooManyEvaluationsException e) {
            // Brent did not settle: the grid sample stands, which is still a lower bound checked below.
            return new Peak(start, f.applyAsDouble(start));
        }
    }

    private static Peak better(Peak current, Peak candidate) {
        if (Ties.same(candidate.value(), current.value())) {
            return candidate.speed() < current.speed() ? candidate : current;
        }
        return candidate.value() > current.value() ? candidate : current;
    }
}
