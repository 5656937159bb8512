package org.resonancegate.criteria;

import java.util.OptionalDouble;
import org.resonancegate.spec.Criterion;
import org.resonancegate.spec.Quantity;

/**
 * The three response-amplitude rules (displacement, velocity, transmitted force): each holds
 * when the combined response, worst over the speed range, stays at or below {@code max}.
 */
final class ResponseRules {

    private ResponseRules() {
    }

    static Finding displacement(Criterion.Displacement c, RuleContext ctx) {
        ResponseEnvelope.Measure measure = c.measure() == Criterion.DisplacementMeasure.PEAK_TO_PEAK
                ? ResponseEnvelope.Measure.PEAK_TO_PEAK : ResponseEnvelope.Measure.PEAK;
        return judge(ctx, ResponseEnvelope.Quantity.DISPLACEMENT, measure, c.max(), "m",
                "displacement", c.measure().key());
    }

    static Finding velocity(Criterion.Velocity c, RuleContext ctx) {
        ResponseEnvelope.Measure measure = c.measure() == Criterion.VelocityMeasure.PEAK
                ? ResponseEnvelope.Measure.PEAK : ResponseEnvelope.Measure.RMS;
        return judge(ctx, ResponseEnvelope.Quantity.VELOCITY, measure, c.max(), "m/s", "velocity",
                c.measure().key());
    }

    static Finding transmittedForce(Criterion.TransmittedForce c, RuleContext ctx) {
        return judge(ctx, ResponseEnvelope.Quantity.ELEMENT_FORCE, ResponseEnvelope.Measure.PEAK, c.max(), "N",
                "dynamic force in the spring", "peak");
    }

    private static Finding judge(RuleContext ctx, ResponseEnvelope.Quantity quantity,
                                 ResponseEnvelope.Measure measure, Quantity max, String unit, String what,
                                 String measureWord) {
        ResponseEnvelope.Worst w = ResponseEnvelope.worst(ctx, quantity, measure, what);
        double limit = max.si();
        double badness = Finding.aboveBound(w.value(), limit);
        Display.UserUnit uu = Display.UserUnit.of(max, unit);
        boolean speedShown = ctx.fixedSpeed() || w.speedDependent();
        OptionalDouble speedRpm = speedShown ? OptionalDouble.of(w.speed() * 60 / (2 * Math.PI)) : OptionalDouble.empty();
        OptionalDouble hz = Double.isFinite(w.omega()) ? OptionalDouble.of(w.omega() / (2 * Math.PI))
                : OptionalDouble.empty();
        String frequency = w.frequencies() > 1 ? "largest share at " + Display.hz(w.omega())
                : Display.hz(w.omega());
        String where = speedShown ? " at " + Display.rpm(w.speed()) + " (" + frequency + ")"
                : " (" + frequency + ")";
        String verdict = badness > 0
                ? " exceeds " + uu.format(limit) + " by " + Display.percent(badness)
                : " is within " + uu.format(limit) + " (" + Display.percent(-badness) + " below)";
        String message = what + " " + uu.format(w.value()) + " " + measureWord + where + verdict
                + IsolationRule.nearest(ctx, w.omega());
        return new Finding(w.value(), limit, unit, speedRpm, hz, badness, message);
    }
}
