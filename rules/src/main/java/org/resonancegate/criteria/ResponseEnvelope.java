package org.resonancegate.criteria;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.apache.commons.math3.complex.Complex;
import org.resonancegate.dynamics.Drive;
import org.resonancegate.dynamics.ElementRow;
import org.resonancegate.dynamics.Probe;
import org.resonancegate.dynamics.Response;
import org.resonancegate.spec.Axis;
import org.resonancegate.spec.ResponsePoint;

/**
 * The combined response of all excitations over the speed range, for one set of response
 * components (the axes of a point, or the rows of the springs and mounts) and one way of
 * combining: component by component the excitations are combined (phasors at a shared frequency;
 * peak arithmetically or rms as root sum of squares across frequencies), the largest component
 * counts, and the worst running speed is found by {@link SpeedSweep}.
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
     * The response components a criterion looks at: point probes (displacement, velocity) or
     * element rows (force), each with the label a message uses.
     */
    record Channels(Quantity quantity, List<Probe> probes, double[][] gathers, int[] rows, List<String> labels) {

        static Channels motion(RuleContext ctx, Quantity quantity, Optional<ResponsePoint> at) {
            List<Probe> probes = ctx.system().probes(at);
            // The rows as a plain array: the sweep reads them at every speed, and a list of
            // whichever kind the model made would be a call the compiler cannot settle.
            double[][] gathers = probes.stream().map(Probe::gather).toArray(double[][]::new);
            return new Channels(quantity, probes, gathers, new int[0], probes.stream().map(Probe::label).toList());
        }

        static Channels forces(RuleContext ctx, Optional<Axis> axis) {
            List<ElementRow> all = ctx.system().elementRows();
            List<Integer> keep = new ArrayList<>();
            List<String> labels = new ArrayList<>();
            for (int r = 0; r < all.size(); r++) {
                ElementRow row = all.get(r);
                if (axis.isEmpty() || row.axis().isEmpty() || row.axis().get() == axis.get()) {
                    keep.add(r);
                    labels.add(row.label());
                }
            }
            return new Channels(Quantity.ELEMENT_FORCE, List.of(), new double[0][],
                    keep.stream().mapToInt(Integer::intValue).toArray(), labels);
        }

        int size() {
            return quantity == Quantity.ELEMENT_FORCE ? rows.length : probes.size();
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
     * @param label          the governing component (point and axis, spring or mount axis); may be empty
     */
    record Worst(double speed, double value, double omega, int frequencies, boolean speedDependent, String label) {
    }

    private ResponseEnvelope() {
    }

    static Worst worst(RuleContext ctx, Channels channels, Measure measure, String what) {
        if (!ctx.hasDrives()) {
            throw new CriterionProblem(what + " needs a force, unbalance or base-motion excitation; "
                    + "the spec lists only order-only ones. Add one, or remove the criterion");
        }
        if (channels.size() == 0) {
            throw new CriterionProblem(what + ": the model has no response component of that kind to judge");
        }
        SpeedSweep.Peak peak = ctx.fixedSpeed()
                ? new SpeedSweep.Peak(ctx.minSpeed(), CriterionProblem.requireFinite(
                valueAt(ctx, channels, measure, ctx.minSpeed(), new Scratch(ctx.excitations().size(), channels.size())),
                what))
                : sweep(ctx, channels, measure, what);
        List<List<Combination.Contribution>> all = components(ctx, channels, peak.speed());
        int best = 0;
        double bestValue = combine(all.get(0), measure);
        for (int j = 1; j < all.size(); j++) {
            double v = combine(all.get(j), measure);
            if (v > bestValue && !Ties.same(v, bestValue)) {
                best = j;
                bestValue = v;
            }
        }
        List<Combination.Contribution> governing = all.get(best);
        boolean moves = ctx.drivesAt(peak.speed()).stream().anyMatch(Drive::speedDependent);
        return new Worst(peak.speed(), peak.value(), Combination.dominantOmega(governing),
                Combination.groups(governing).size(), moves, channels.labels().get(best));
    }

    /** Working arrays of one sweep, reused at every speed (a sweep runs on one thread). */
    private static final class Scratch {
        final int[] group;
        final boolean[] taken;
        final double[] groupOmega;
        final double[][] re;
        final double[][] im;

        Scratch(int drives, int size) {
            group = new int[drives];
            taken = new boolean[drives];
            groupOmega = new double[drives];
            re = new double[drives][size];
            im = new double[drives][size];
        }
    }

    private static SpeedSweep.Peak sweep(RuleContext ctx, Channels channels, Measure measure, String what) {
        Scratch scratch = new Scratch(ctx.excitations().size(), channels.size());
        return SpeedSweep.maximiseOver(s -> valueAt(ctx, channels, measure, s, scratch), ctx.minSpeed(),
                ctx.maxSpeed(), ctx.sweepSpeeds(), what);
    }

    /**
     * The largest combined component at one speed, without building per-component lists. Drives
     * at the very same frequency on a modal model are added as responses first (their modal
     * amplitudes add, so each component is formed once per frequency, not once per drive); the
     * bundles are grouped by frequency (within the tie rule), each bundle's components are read
     * into primitive arrays in one pass, then every component sums its phasors per group. This is
     * the sweep's inner loop.
     */
    private static double valueAt(RuleContext ctx, Channels channels, Measure measure, double speed, Scratch scratch) {
        List<RuleContext.Driven> driven = ctx.respondAt(speed);
        int drives = driven.size();
        int size = channels.size();
        int[] group = scratch.group;
        double[] groupOmega = scratch.groupOmega;
        double[][] re = scratch.re;
        double[][] im = scratch.im;
        int groups = 0;
        int bundles = 0;
        boolean[] taken = scratch.taken;
        Arrays.fill(taken, 0, drives, false);
        for (int d = 0; d < drives; d++) {
            if (taken[d]) {
                continue;
            }
            RuleContext.Driven first = driven.get(d);
            double w = first.drive().omega();
            Response sum = first.response();
            int members = 1;
            for (int e = d + 1; e < drives; e++) {
                if (!taken[e] && driven.get(e).drive().omega() == w) {
                    Optional<Response> both = sum.plusModal(driven.get(e).response());
                    if (both.isPresent()) {
                        taken[e] = true;
                        sum = both.get();
                        members++;
                    }
                }
            }
            int found = -1;
            for (int g = 0; g < groups; g++) {
                if (Ties.same(groupOmega[g], w)) {
                    found = g;
                    break;
                }
            }
            if (found < 0) {
                found = groups;
                groupOmega[groups++] = w;
            }
            group[bundles] = found;
            read(channels, sum, w, re[bundles], im[bundles]);
            if (!finite(re[bundles], im[bundles], size)) {
                refuse(channels, driven, d, members > 1 ? w : Double.NaN, speed);
            }
            bundles++;
        }
        double worst = 0;
        for (int j = 0; j < size; j++) {
            // Each group's phasor sum is formed in registers, bundles in listing order of their
            // first drive, with no arrays to clear per component.
            double v = 0;
            for (int g = 0; g < groups; g++) {
                double sr = 0;
                double si = 0;
                for (int b = 0; b < bundles; b++) {
                    if (group[b] == g) {
                        sr += re[b][j];
                        si += im[b][j];
                    }
                }
                v += measure == Measure.RMS ? (sr * sr + si * si) / 2 : Math.sqrt(sr * sr + si * si);
            }
            if (measure == Measure.RMS) {
                v = Math.sqrt(v);
            }
            worst = Math.max(worst, measure.factor * v);
        }
        return worst;
    }

    /** One response's complex amplitude of every component (frequency {@code w}), into {@code re}, {@code im}. */
    private static void read(Channels channels, Response response, double w, double[] re, double[] im) {
        int size = channels.size();
        if (channels.quantity() == Quantity.ELEMENT_FORCE) {
            response.elementForces(channels.rows(), re, im);
        } else {
            response.along(channels.gathers(), re, im);
            if (channels.quantity() == Quantity.VELOCITY) {
                for (int j = 0; j < size; j++) {
                    // v = iω·x
                    double r = re[j];
                    re[j] = -w * im[j];
                    im[j] = w * r;
                }
            }
        }
    }

    private static boolean finite(double[] re, double[] im, int size) {
        for (int j = 0; j < size; j++) {
            if (!Double.isFinite(re[j]) || !Double.isFinite(im[j])) {
                return false;
            }
        }
        return true;
    }

    /**
     * Non-finite response: names the drive that gave it, reading the drives of a bundle one by
     * one ({@code w} their shared frequency; NaN when drive {@code d} stands alone).
     */
    private static void refuse(Channels channels, List<RuleContext.Driven> driven, int d, double w, double speed) {
        int size = channels.size();
        double[] re = new double[size];
        double[] im = new double[size];
        for (int e = d; e < driven.size(); e++) {
            RuleContext.Driven dr = driven.get(e);
            if (e != d && dr.drive().omega() != w) {
                continue;
            }
            read(channels, dr.response(), dr.drive().omega(), re, im);
            for (int j = 0; j < size; j++) {
                if (!Double.isFinite(re[j]) || !Double.isFinite(im[j])) {
                    throw new CriterionProblem("numerical trouble: the response to '" + dr.drive().source().name()
                            + "' at " + Display.rpm(speed) + " came out as " + re[j] + " + " + im[j] + "i"
                            + "; check that mass, stiffness and damping are positive and that damping is not zero");
                }
            }
        }
        throw new CriterionProblem("numerical trouble: the combined response at " + Display.rpm(speed)
                + " is not finite; check that mass, stiffness and damping are positive and that damping is not zero");
    }

    private static double combine(List<Combination.Contribution> component, Measure measure) {
        double v = measure == Measure.RMS ? Combination.rms(component) : Combination.peak(component);
        return measure.factor * v;
    }

    /** Per response component, each excitation's complex amplitude of the quantity. */
    private static List<List<Combination.Contribution>> components(RuleContext ctx, Channels channels,
                                                                   double speed) {
        int size = channels.size();
        List<List<Combination.Contribution>> out = new ArrayList<>(size);
        for (int j = 0; j < size; j++) {
            out.add(new ArrayList<>());
        }
        for (RuleContext.Driven d : ctx.respondAt(speed)) {
            double w = d.drive().omega();
            for (int j = 0; j < size; j++) {
                Complex v = switch (channels.quantity()) {
                    case DISPLACEMENT -> channels.probes().get(j).of(d.response());
                    case VELOCITY -> channels.probes().get(j).of(d.response()).multiply(new Complex(0, w));
                    case ELEMENT_FORCE -> d.response().elementForces().get(channels.rows()[j]);
                };
                if (v.isNaN() || v.isInfinite()) {
                    throw new CriterionProblem("numerical trouble: the response to '" + d.drive().source().name()
                            + "' at " + Display.rpm(speed) + " came out as " + v
                            + "; check that mass, stiffness and damping are positive and that damping is not zero");
                }
                out.get(j).add(new Combination.Contribution(w, v));
            }
        }
        return out;
    }
}
