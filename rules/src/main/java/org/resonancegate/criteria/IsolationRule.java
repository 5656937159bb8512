package org.resonancegate.criteria;

import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.Supplier;
import org.apache.commons.math3.complex.Complex;
import org.resonancegate.dynamics.Drive;
import org.resonancegate.dynamics.Drives;
import org.resonancegate.dynamics.Load;
import org.resonancegate.dynamics.Probe;
import org.resonancegate.dynamics.Response;
import org.resonancegate.spec.Criterion;
import org.resonancegate.spec.Excitation;
import org.resonancegate.spec.ExcitationFrequency;
import org.resonancegate.spec.ResponsePoint;

/**
 * isolation: for each force, unbalance or base-motion excitation alone, the transmissibility T
 * stays at or below the limit; the worst excitation over the speed range counts. For a force,
 * T = the peak over a cycle of the total ground-force vector / the applied amplitude (for a
 * rotating force on a body, the major semi-axis of the ellipse the ground force traces); for base
 * motion, T = the response at {@code at} (default: the mass, or the centre of gravity) along the
 * motion's direction / the ground amplitude. Order-only excitations carry no load and are left
 * out. With {@code minEfficiency} the value is 1 − T.
 */
final class IsolationRule {

    private IsolationRule() {
    }

    /** T and where it is read (the response point for base motion; empty for a force). */
    private record Reading(double t, String where) {
    }

    /**
     * T of one excitation at its frequency. The system is linear, so T is the ratio of the
     * response to the load it answers; a load of zero amplitude (an unbalance at standstill) is
     * replaced by a unit load of the same pattern so that T is still defined.
     */
    private static Reading transmissibility(Drive d, Response r, RuleContext ctx, Optional<ResponsePoint> at) {
        double amplitude = d.load().amplitude().abs();
        if (!(amplitude > 0)) {
            Load unit = d.load() instanceof Load.Force f ? new Load.Force(Complex.ONE, f.placement())
                    : new Load.GroundMotion(Complex.ONE, ((Load.GroundMotion) d.load()).direction());
            r = ctx.system().respond(unit, d.omega());
            amplitude = 1;
        }
        if (d.load() instanceof Load.Force) {
            return new Reading(r.groundForces().peakOverCycle() / amplitude, "");
        }
        Load.GroundMotion g = (Load.GroundMotion) d.load();
        double worst = -1;
        String where = "";
        for (Probe p : ctx.probesAlong(at, g.direction())) {
            double t = p.of(r).abs() / amplitude;
            if (t > worst && !Ties.same(t, worst)) {
                worst = t;
                where = p.label();
            }
        }
        return new Reading(worst, where);
    }

    /** T of one excitation at running speed {@code speed}, from the responses the context shares. */
    private static Reading transmissibilityAt(Excitation e, RuleContext ctx, double speed, Optional<ResponsePoint> at) {
        // Only this excitation's response: the others' are not needed to refine its peak.
        RuleContext.Driven d = ctx.respondTo(e, speed);
        Reading reading = transmissibility(d.drive(), d.response(), ctx, at);
        if (!Double.isFinite(reading.t())) {
            CriterionProblem.requireFinite(reading.t(), "transmissibility of '" + e.name() + "'");
        }
        return reading;
    }

    static Finding evaluate(Criterion.Isolation c, RuleContext ctx) {
        if (!ctx.hasDrives()) {
            throw new CriterionProblem("isolation needs a force, unbalance or base-motion excitation; "
                    + "the spec lists only order-only ones. Add one, or remove the criterion");
        }
        // Each excitation alone, each over the whole speed range; the worst counts, the first
        // listed among equals.
        SpeedSweep.Peak peak = null;
        Excitation worst = null;
        for (Excitation e : ctx.excitations()) {
            if (e instanceof Excitation.OrderOnly) {
                continue;
            }
            boolean follows = e.frequency() instanceof ExcitationFrequency.Order;
            SpeedSweep.Peak p = ctx.fixedSpeed() || !follows
                    ? new SpeedSweep.Peak(ctx.minSpeed(), transmissibilityAt(e, ctx, ctx.minSpeed(), c.at()).t())
                    : SpeedSweep.maximiseOver(s -> transmissibilityAt(e, ctx, s, c.at()).t(), ctx.minSpeed(),
                    ctx.maxSpeed(), ctx.sweepSpeeds(), "transmissibility of '" + e.name() + "'");
            if (peak == null || (p.value() > peak.value() && !Ties.same(p.value(), peak.value()))) {
                peak = p;
                worst = e;
            }
        }
        Drive governing = Drives.at(worst, peak.speed(), ctx.operation()).orElseThrow();
        String point = transmissibilityAt(worst, ctx, peak.speed(), c.at()).where();
        double t = peak.value();
        OptionalDouble speedRpm = ctx.fixedSpeed() || governing.speedDependent()
                ? OptionalDouble.of(Display.rpmValue(peak.speed())) : OptionalDouble.empty();
        OptionalDouble hz = OptionalDouble.of(Display.hzValue(governing.omega()));
        // Worded only if this case governs (the message of every other tolerance case is never read).
        double topSpeed = peak.speed();
        Supplier<String> where = () -> " for '" + governing.source().name() + "'" + Display.named(" at ", point) + " "
                + (speedRpm.isPresent() ? Display.speedAndFrequency(topSpeed, governing.omega())
                : "at " + Display.hz(governing.omega()));
        if (c.limit() instanceof Criterion.IsolationLimit.MinEfficiency e) {
            double limit = e.value().value();
            double efficiency = 1 - t;
            double badness = Finding.belowBound(efficiency, limit);
            Supplier<String> verdict = () -> badness > 0
                    ? " is below the required " + Display.percent(limit) + " by "
                    + Display.sig((limit - efficiency) * 100, 3) + " percentage points"
                    : " meets the required " + Display.percent(limit) + " with "
                    + Display.sig((efficiency - limit) * 100, 3) + " percentage points to spare";
            return new Finding(efficiency, limit, "1", speedRpm, hz, badness,
                    () -> "isolation efficiency " + Display.percent(efficiency) + " (transmissibility "
                            + Display.sig(t) + ")" + where.get() + verdict.get() + nearest(ctx, governing.omega()));
        }
        double limit = c.limit().value().value();
        double badness = Finding.aboveBound(t, limit);
        Supplier<String> verdict = () -> badness > 0
                ? " exceeds " + Display.sig(limit) + " by " + Display.percent(badness)
                : " is within " + Display.sig(limit) + " (" + Display.percent(-badness) + " below)";
        return new Finding(t, limit, "1", speedRpm, hz, badness,
                () -> "transmissibility " + Display.sig(t) + where.get() + verdict.get()
                        + nearest(ctx, governing.omega()));
    }

    static String nearest(RuleContext ctx, double omega) {
        return ctx.nearestMode(omega).map(m -> "; nearest " + Display.mode(m)).orElse("");
    }
}
