package org.resonancegate.criteria;

import java.util.List;
import java.util.OptionalDouble;
import org.resonancegate.dynamics.Drive;
import org.resonancegate.dynamics.Load;
import org.resonancegate.dynamics.Response;
import org.resonancegate.spec.Criterion;

/**
 * isolation: for each force, unbalance or base-motion excitation alone, the transmissibility T
 * (|force into the ground| / |applied force|, or |response| / |ground motion|) stays at or below
 * the limit; the worst excitation over the speed range counts. Order-only excitations carry no
 * load and are left out. With {@code minEfficiency} the value is 1 − T.
 */
final class IsolationRule {

    private IsolationRule() {
    }

    static double transmissibility(Drive d, Response r) {
        double applied = d.load().amplitude().abs();
        if (d.load() instanceof Load.Force) {
            double worst = 0;
            for (var g : r.groundForces()) {
                worst = Math.max(worst, g.abs());
            }
            return worst / applied;
        }
        // Base motion: the response point (the mass) along the motion's direction.
        return r.displacements().get(0).abs() / applied;
    }

    /** The largest T over all loaded excitations at one speed, and the index of the first that reaches it. */
    private static double[] worstAt(RuleContext ctx, double speed) {
        List<Drive> drives = ctx.drivesAt(speed);
        double worst = Double.NEGATIVE_INFINITY;
        int which = -1;
        for (int i = 0; i < drives.size(); i++) {
            Drive d = drives.get(i);
            double t = CriterionProblem.requireFinite(transmissibility(d, ctx.system().respond(d.load(), d.omega())),
                    "transmissibility of '" + d.source().name() + "'");
            if (which < 0 || (t > worst && !Ties.same(t, worst))) {
                worst = t;
                which = i;
            }
        }
        return new double[] {worst, which};
    }

    static Finding evaluate(Criterion.Isolation c, RuleContext ctx) {
        if (!ctx.hasDrives()) {
            throw new CriterionProblem("isolation needs a force, unbalance or base-motion excitation; "
                    + "the spec lists only order-only ones. Add one, or remove the criterion");
        }
        SpeedSweep.Peak peak = ctx.fixedSpeed()
                ? new SpeedSweep.Peak(ctx.minSpeed(), worstAt(ctx, ctx.minSpeed())[0])
                : SpeedSweep.maximise(s -> worstAt(ctx, s)[0], ctx.minSpeed(), ctx.maxSpeed(),
                ctx.specialSpeeds(), "transmissibility");
        Drive governing = ctx.drivesAt(peak.speed()).get((int) worstAt(ctx, peak.speed())[1]);
        double t = peak.value();
        OptionalDouble speedRpm = ctx.fixedSpeed() || governing.speedDependent()
                ? OptionalDouble.of(peak.speed() * 60 / (2 * Math.PI)) : OptionalDouble.empty();
        OptionalDouble hz = OptionalDouble.of(governing.frequencyHz());
        String where = " for '" + governing.source().name() + "' "
                + (speedRpm.isPresent() ? Display.speedAndFrequency(peak.speed(), governing.omega())
                : "at " + Display.hz(governing.omega()));
        if (c.limit() instanceof Criterion.IsolationLimit.MinEfficiency e) {
            double limit = e.value().value();
            double efficiency = 1 - t;
            double badness = Finding.belowBound(efficiency, limit);
            String verdict = badness > 0
                    ? " is below the required " + Display.percent(limit) + " by "
                    + Display.sig((limit - efficiency) * 100, 3) + " percentage points"
                    : " meets the required " + Display.percent(limit) + " with "
                    + Display.sig((efficiency - limit) * 100, 3) + " percentage points to spare";
            return new Finding(efficiency, limit, "1", speedRpm, hz, badness,
                    "isolation efficiency " + Display.percent(efficiency) + " (transmissibility " + Display.sig(t)
                            + ")" + where + verdict + nearest(ctx, governing.omega()));
        }
        double limit = c.limit().value().value();
        double badness = Finding.aboveBound(t, limit);
        String verdict = badness > 0
                ? " exceeds " + Display.sig(limit) + " by " + Display.percent(badness)
                : " is within " + Display.sig(limit) + " (" + Display.percent(-badness) + " below)";
        return new Finding(t, limit, "1", speedRpm, hz, badness,
                "transmissibility " + Display.sig(t) + where + verdict + nearest(ctx, governing.omega()));
    }

    static String nearest(RuleContext ctx, double omega) {
        return ctx.nearestMode(omega)
                .map(m -> "; nearest mode " + m.index() + " at " + Display.hz(m.angularFrequency()))
                .orElse("");
    }
}
