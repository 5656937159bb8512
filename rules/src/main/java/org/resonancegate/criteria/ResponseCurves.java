package org.resonancegate.criteria;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.TreeSet;
import org.apache.commons.math3.complex.Complex;
import org.resonancegate.dynamics.ElementRow;
import org.resonancegate.dynamics.Load;
import org.resonancegate.dynamics.Mode;
import org.resonancegate.dynamics.Probe;
import org.resonancegate.dynamics.Response;
import org.resonancegate.spec.Criterion;
import org.resonancegate.spec.Excitation;
import org.resonancegate.spec.ExcitationFrequency;
import org.resonancegate.spec.Quantity;

/**
 * An amplitude criterion's value against running speed, for a reader's plot: the same combination
 * of excitations the rule judges, read at a fixed set of speeds from just above standstill to
 * {@value #REACH} times the top speed, so the peaks either side of the range show too. The
 * resonance speeds (and the half-power points either side) are sample points, so a peak is drawn
 * at its height rather than cut between two grid points. Built only from the context's public
 * reading of the model; the rules' own sweep stays the only judge of the worst value.
 */
public final class ResponseCurves {

    /** How far beyond the top speed a curve reaches, as a factor on it. */
    public static final double REACH = 1.25;

    /** Evenly spaced speeds from REACH·max/GRID to REACH·max; standstill itself carries no load. */
    private static final int GRID = 120;

    /** One point: running speed (rpm) and the criterion's quantity there (SI). */
    public record Sample(double speedRpm, double value) {
    }

    /**
     * One criterion's curve.
     *
     * @param quantity      what is drawn, in words ("velocity rms", "transmissibility")
     * @param unit          SI unit of the values and the limit
     * @param limit         the bound, in the same quantity (for a minimum isolation efficiency η: T = 1 − η)
     * @param displayUnit   the unit the limit was written in, for showing values ("mm/s"); SI when unknown
     * @param displayFactor SI per display unit (0.001 for mm/s)
     */
    public record Curve(String quantity, String unit, double limit, String displayUnit, double displayFactor,
                        List<Sample> samples) {

        public Curve {
            samples = List.copyOf(samples);
        }
    }

    private ResponseCurves() {
    }

    /**
     * The curve of {@code criterion} on {@code ctx}; empty for rules that do not depend on the
     * response amplitude (separation, static deflection) and for a model that cannot give one
     * (no loaded excitation, a point the model lacks: the rule reports those itself).
     */
    public static Optional<Curve> of(Criterion criterion, RuleContext ctx) {
        if (!ctx.hasDrives()) {
            return Optional.empty();
        }
        try {
            return build(criterion, ctx);
        } catch (IllegalArgumentException | CriterionProblem e) {
            return Optional.empty();
        }
    }

    private static Optional<Curve> build(Criterion criterion, RuleContext ctx) {
        boolean rotational = ctx.system().rotational();
        if (criterion instanceof Criterion.Displacement d) {
            boolean pp = d.measure() == Criterion.DisplacementMeasure.PEAK_TO_PEAK;
            List<Probe> probes = ctx.system().probes(d.at());
            return Optional.of(curve(ctx, "displacement " + d.measure().key(), rotational ? "rad" : "m", d.max(),
                    s -> motion(ctx, probes, s, false, false) * (pp ? 2 : 1)));
        } else if (criterion instanceof Criterion.Velocity v) {
            boolean rms = v.measure() == Criterion.VelocityMeasure.RMS;
            List<Probe> probes = ctx.system().probes(v.at());
            return Optional.of(curve(ctx, "velocity " + v.measure().key(), rotational ? "rad/s" : "m/s", v.max(),
                    s -> motion(ctx, probes, s, true, rms)));
        } else if (criterion instanceof Criterion.TransmittedForce f) {
            List<Integer> rows = new ArrayList<>();
            List<ElementRow> all = ctx.system().elementRows();
            for (int r = 0; r < all.size(); r++) {
                // the rows the rule looks at: every one, or those along the criterion's axis
                if (f.axis().isEmpty() || all.get(r).axis().isEmpty() || all.get(r).axis().equals(f.axis())) {
                    rows.add(r);
                }
            }
            return Optional.of(curve(ctx, rotational ? "dynamic torque peak" : "dynamic force peak",
                    rotational ? "N·m" : "N", f.max(), s -> force(ctx, rows, s)));
        } else if (criterion instanceof Criterion.Isolation i) {
            double limit = i.limit() instanceof Criterion.IsolationLimit.MinEfficiency e
                    ? 1 - e.value().value() : i.limit().value().value();
            List<Sample> samples = sample(ctx, s -> transmissibility(ctx, i, s));
            return Optional.of(new Curve("transmissibility", "1", limit, "1", 1, samples));
        }
        return Optional.empty();
    }

    private interface Reading {
        double at(double speed);
    }

    private static Curve curve(RuleContext ctx, String quantity, String unit, Quantity max, Reading reading) {
        Display.UserUnit uu = Display.UserUnit.of(max, unit);
        return new Curve(quantity, unit, max.si(), uu.unit(), uu.factor(), sample(ctx, reading));
    }

    private static List<Sample> sample(RuleContext ctx, Reading reading) {
        List<Sample> out = new ArrayList<>();
        for (double rpm : speedsRpm(ctx)) {
            double value = reading.at(rpm * 2 * Math.PI / 60);
            if (Double.isFinite(value)) {
                out.add(new Sample(rpm, value));
            }
        }
        return out;
    }

    /**
     * The sample speeds (rpm), ascending: an even grid to {@value #REACH}× the top speed, both
     * ends of the operating range, and for every mode and every order that carries a load the
     * resonance speed 60·f_n/k and the half-power points f_n·(1 ± ζ) either side.
     */
    public static double[] speedsRpm(RuleContext ctx) {
        double top = REACH * ctx.maxSpeed() * 60 / (2 * Math.PI);
        TreeSet<Double> speeds = new TreeSet<>();
        for (int i = 1; i <= GRID; i++) {
            speeds.add(top * i / GRID);
        }
        speeds.add(ctx.minSpeed() * 60 / (2 * Math.PI));
        speeds.add(ctx.maxSpeed() * 60 / (2 * Math.PI));
        for (Excitation e : ctx.excitations()) {
            if (e instanceof Excitation.OrderOnly || !(e.frequency() instanceof ExcitationFrequency.Order o)
                    || !(o.order() > 0)) {
                continue;
            }
            for (Mode m : ctx.system().modes()) {
                double z = m.dampingRatio().orElse(0);
                for (double k : new double[] {1 - z, 1, 1 + z}) {
                    double rpm = m.frequencyHz() * k * 60 / o.order();
                    if (rpm > 0 && rpm <= top) {
                        speeds.add(rpm);
                    }
                }
            }
        }
        speeds.removeIf(s -> !(s > 0));
        return speeds.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** The largest combined component of displacement (or velocity) over the probes at one speed. */
    private static double motion(RuleContext ctx, List<Probe> probes, double speed, boolean velocity, boolean rms) {
        List<RuleContext.Driven> driven = ctx.respondAt(speed);
        double worst = 0;
        for (Probe p : probes) {
            List<Combination.Contribution> parts = new ArrayList<>(driven.size());
            for (RuleContext.Driven d : driven) {
                double w = d.drive().omega();
                Complex x = p.of(d.response());
                parts.add(new Combination.Contribution(w, velocity ? x.multiply(new Complex(0, w)) : x));
            }
            worst = Math.max(worst, rms ? Combination.rms(parts) : Combination.peak(parts));
        }
        return worst;
    }

    /** The largest combined peak force over the chosen element rows at one speed. */
    private static double force(RuleContext ctx, List<Integer> rows, double speed) {
        List<RuleContext.Driven> driven = ctx.respondAt(speed);
        double worst = 0;
        for (int row : rows) {
            List<Combination.Contribution> parts = new ArrayList<>(driven.size());
            for (RuleContext.Driven d : driven) {
                parts.add(new Combination.Contribution(d.drive().omega(), d.response().elementForces().get(row)));
            }
            worst = Math.max(worst, Combination.peak(parts));
        }
        return worst;
    }

    /**
     * The largest transmissibility of any single loaded excitation at one speed: ground-force
     * peak over the load for a force, response over ground amplitude for base motion (as the
     * isolation rule defines them). An excitation without load at this speed is left out.
     */
    private static double transmissibility(RuleContext ctx, Criterion.Isolation c, double speed) {
        double worst = Double.NaN;
        for (Excitation e : ctx.excitations()) {
            if (e instanceof Excitation.OrderOnly) {
                continue;
            }
            RuleContext.Driven d = ctx.respondTo(e, speed);
            double amplitude = d.drive().load().amplitude().abs();
            if (!(amplitude > 0)) {
                continue;
            }
            Response r = d.response();
            double t;
            if (d.drive().load() instanceof Load.GroundMotion g) {
                t = 0;
                for (Probe p : ctx.probesAlong(c.at(), g.direction())) {
                    t = Math.max(t, p.of(r).abs() / amplitude);
                }
            } else {
                t = r.groundForces().peakOverCycle() / amplitude;
            }
            worst = Double.isNaN(worst) ? t : Math.max(worst, t);
        }
        return worst;
    }
}
