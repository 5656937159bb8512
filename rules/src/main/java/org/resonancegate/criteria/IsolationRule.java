package org.resonancegate.criteria;

import java.util.OptionalDouble;
import org.apache.commons.math3.complex.Complex;
import org.resonancegate.dynamics.Drive;
import org.resonancegate.dynamics.Drives;
import org.resonancegate.dynamics.Load;
import org.resonancegate.dynamics.Response;
import org.resonancegate.spec.Criterion;
import org.resonancegate.spec.Excitation;
import org.resonancegate.spec.ExcitationFrequency;

/**
 * isolation: for each force, unbalance or base-motion excitation alone, the transmissibility T
 * (|force into the ground| / |applied force|, or |response| / |ground motion|) stays at or below
 * the limit; the worst excitation over the speed range counts. Order-only excitations carry no
 * load and are left out. With {@code minEfficiency} the value is 1 − T.
 */
final class IsolationRule {

    private IsolationRule() {
    }

    /**
     * T of one excitation at its frequency. The system is linear, so T is taken from a unit load
     * of the same kind: an unbalance at standstill (zero force) still has its limit T = 1 instead
     * of 0/0. A rigid body will need the peak of the ground-force vector over a cycle here.
     */
    static double transmissibility(Drive d, RuleContext ctx) {
        if (d.load() instanceof Load.Force) {
            Response r = ctx.system().respond(new Load.Force(Complex.ONE), d.omega());
            double worst = 0;
            for (Complex g : r.groundForces()) {
                worst = Math.max(worst, g.abs());
            }
            return worst;
        }
        // Base motion: the response point (the mass) along the motion's direction.
        return ctx.system().respond(new Load.GroundMotion(Complex.ONE), d.omega()).displacements().get(0).abs();
    }

    /** T of one excitation at running speed {@code speed}. */
    private static double transmissibilityAt(Excitation e, RuleContext ctx, double speed) {
        Drive d = Drives.at(e, speed, ctx.operation()).orElseThrow();
        return CriterionProblem.requireFinite(transmissibility(d, ctx), "transmissibility of '" + e.name() + "'");
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
                    ? new SpeedSweep.Peak(ctx.minSpeed(), transmissibilityAt(e, ctx, ctx.minSpeed()))
                    : SpeedSweep.maximise(s -> transmissibilityAt(e, ctx, s), ctx.minSpeed(), ctx.maxSpeed(),
                    ctx.specialSpeeds(), "transmissibility of '" + e.name() + "'");
            if (peak == null || (p.value() > peak.value() && !Ties.same(p.value(), peak.value()))) {
                peak = p;
                worst = e;
            }
        }
        Drive governing = Drives.at(worst, peak.speed(), ctx.operation()).orElseThrow();
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
