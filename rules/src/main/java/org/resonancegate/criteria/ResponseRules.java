package org.resonancegate.criteria;

import java.util.OptionalDouble;
import org.resonancegate.spec.Criterion;
import org.resonancegate.spec.Quantity;

/**
 * The three response-amplitude rules (displacement, velocity, transmitted force): each holds
 * when the combined response, worst over the speed range and over the components it looks at
 * (the axes of its point, or every spring and mount axis), stays at or below {@code max}.
 */
final class ResponseRules {

    private ResponseRules() {
    }

    static Finding displacement(Criterion.Displacement c, RuleContext ctx) {
        ResponseEnvelope.Measure measure = c.measure() == Criterion.DisplacementMeasure.PEAK_TO_PEAK
                ? ResponseEnvelope.Measure.PEAK_TO_PEAK : ResponseEnvelope.Measure.PEAK;
        return judge(ctx, ResponseEnvelope.Channels.motion(ctx, ResponseEnvelope.Quantity.DISPLACEMENT, c.at()),
                measure, c.max(), ctx.system().rotational() ? "rad" : "m", "displacement", " at ", c.measure().key());
    }

    static Finding velocity(Criterion.Velocity c, RuleContext ctx) {
        ResponseEnvelope.Measure measure = c.measure() == Criterion.VelocityMeasure.PEAK
                ? ResponseEnvelope.Measure.PEAK : ResponseEnvelope.Measure.RMS;
        return judge(ctx, ResponseEnvelope.Channels.motion(ctx, ResponseEnvelope.Quantity.VELOCITY, c.at()),
                measure, c.max(), ctx.system().rotational() ? "rad/s" : "m/s", "velocity", " at ", c.measure().key());
    }

    static Finding transmittedForce(Criterion.TransmittedForce c, RuleContext ctx) {
        boolean torque = ctx.system().rotational();
        return judge(ctx, ResponseEnvelope.Channels.forces(ctx, c.axis()), ResponseEnvelope.Measure.PEAK, c.max(),
                torque ? "N·m" : "N", torque ? "dynamic torque" : "dynamic force", " in ",
                "peak");
    }

    private static Finding judge(RuleContext ctx, ResponseEnvelope.Channels channels, ResponseEnvelope.Measure measure,
                                 Quantity max, String unit, String what, String preposition, String measureWord) {
        ResponseEnvelope.Worst w = ResponseEnvelope.worst(ctx, channels, measure, what);
        double limit = max.si();
        double badness = Finding.aboveBound(w.value(), limit);
        Display.UserUnit uu = Display.UserUnit.of(max, unit);
        boolean speedShown = ctx.fixedSpeed() || w.speedDependent();
        OptionalDouble speedRpm = speedShown ? OptionalDouble.of(Display.rpmValue(w.speed())) : OptionalDouble.empty();
        OptionalDouble hz = Double.isFinite(w.omega()) ? OptionalDouble.of(Display.hzValue(w.omega()))
                : OptionalDouble.empty();
        // Worded only if this case governs (the message of every other tolerance case is never read).
        return new Finding(w.value(), limit, unit, speedRpm, hz, badness, () -> {
            String frequency = w.frequencies() > 1 ? "largest share at " + Display.hz(w.omega())
                    : Display.hz(w.omega());
            String where = speedShown ? " at " + Display.rpm(w.speed()) + " (" + frequency + ")"
                    : " (" + frequency + ")";
            String verdict = badness > 0
                    ? " exceeds " + uu.format(limit) + " by " + Display.percent(badness)
                    : " is within " + uu.format(limit) + " (" + Display.percent(-badness) + " below)";
            // A single spring keeps the wording it always had; several are named.
            String subject = w.label().isEmpty() && preposition.equals(" in ") ? what + " in the spring"
                    : what + Display.named(preposition, w.label());
            return subject + " " + uu.format(w.value()) + " " + measureWord + where + verdict
                    + IsolationRule.nearest(ctx, w.omega());
        });
    }
}
