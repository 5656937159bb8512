package org.resonancegate.criteria;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.resonancegate.dynamics.Drive;
import org.resonancegate.dynamics.Response;

/**
 * The combined response of all excitations over the speed range, for one response quantity and
 * one way of combining: component by component the excitations are combined (phasors at a shared
 * frequency; peak arithmetically or rms as root sum of squares across frequencies), the largest
 * component counts, and the worst running speed is found by {@link SpeedSweep}.
 */
final class ResponseEnvelope {

    /** Which response quantity is judged. */
    enum Quantity {
        DISPLACEMENT, VELOCITY, ELEMENT_FORCE
    }

    /** How the excitations are combined, and the factor on the result (2 for peak-to-peak). */
    enum Measure {
        PEAK(1), PEAK_TO_PEAK(2), RMS(1);

        final double factor;

        Measure(double factor) {
            this.factor = factor;
        }
    }

    /**
     * The worst point found.
     *
     * @param speed          running speed (rad/s)
     * @param value          the combined value there
     * @param omega          the dominant excitation frequency there (rad/s)
     * @param frequencies    how many distinct frequencies contribute
     * @param speedDependent whether any contribution moves with the running speed
     */
    record Worst(double speed, double value, double omega, int frequencies, boolean speedDependent) {
    }

    private ResponseEnvelope() {
    }

    static Worst worst(RuleContext ctx, Quantity quantity, Measure measure, String what) {
        if (!ctx.hasDrives()) {
            throw new CriterionProblem(what + " needs a force, unbalance or base-motion excitation; "
                    + "the spec lists only order-only ones. Add one, or remove the criterion");
        }
        SpeedSweep.Peak peak = ctx.fixedSpeed()
                ? new SpeedSweep.Peak(ctx.minSpeed(), CriterionProblem.requireFinite(
                valueAt(ctx, quantity, measure, ctx.minSpeed()), what))
                : SpeedSweep.maximise(s -> valueAt(ctx, quantity, measure, s), ctx.minSpeed(), ctx.maxSpeed(),
                ctx.specialSpeeds(), what);
        List<Combination.Contribution> governing = governingComponent(ctx, quantity, measure, peak.speed());
        boolean moves = ctx.drivesAt(peak.speed()).stream().anyMatch(Drive::speedDependent);
        return new Worst(peak.speed(), peak.value(), Combination.dominantOmega(governing),
                Combination.groups(governing).size(), moves);
    }

    static double valueAt(RuleContext ctx, Quantity quantity, Measure measure, double speed) {
        double worst = 0;
        for (List<Combination.Contribution> component : components(ctx, quantity, speed)) {
            worst = Math.max(worst, combine(component, measure));
        }
        return worst;
    }

    private static double combine(List<Combination.Contribution> component, Measure measure) {
        double v = measure == Measure.RMS ? Combination.rms(component) : Combination.peak(component);
        return measure.factor * v;
    }

    private static List<Combination.Contribution> governingComponent(RuleContext ctx, Quantity quantity,
                                                                     Measure measure, double speed) {
        List<List<Combination.Contribution>> all = components(ctx, quantity, speed);
        List<Combination.Contribution> best = all.get(0);
        double bestValue = combine(best, measure);
        for (List<Combination.Contribution> c : all) {
            double v = combine(c, measure);
            if (v > bestValue && !Ties.same(v, bestValue)) {
                best = c;
                bestValue = v;
            }
        }
        return best;
    }

    /** Per response component, each excitation's complex amplitude of the quantity. */
    private static List<List<Combination.Contribution>> components(RuleContext ctx, Quantity quantity,
                                                                   double speed) {
        List<List<Combination.Contribution>> out = new ArrayList<>();
        for (Drive d : ctx.drivesAt(speed)) {
            Response r = ctx.system().respond(d.load(), d.omega());
            List<Complex> values = switch (quantity) {
                case DISPLACEMENT -> r.displacements();
                case VELOCITY -> r.displacements().stream().map(x -> x.multiply(new Complex(0, d.omega()))).toList();
                case ELEMENT_FORCE -> r.elementForces();
            };
            for (int j = 0; j < values.size(); j++) {
                if (out.size() <= j) {
                    out.add(new ArrayList<>());
                }
                Complex v = values.get(j);
                if (v.isNaN() || v.isInfinite()) {
                    throw new CriterionProblem("numerical trouble: the response to '" + d.source().name() + "' at "
                            + Display.rpm(speed) + " came out as " + v
                            + "; check that mass, stiffness and damping are positive and that damping is not zero");
                }
                out.get(j).add(new Combination.Contribution(d.omega(), v));
            }
        }
        return out;
    }
}
