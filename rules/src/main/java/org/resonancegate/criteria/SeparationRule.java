package org.resonancegate.criteria;

import java.util.OptionalDouble;
import org.resonancegate.dynamics.Drives;
import org.resonancegate.dynamics.Mode;
import org.resonancegate.spec.Criterion;
import org.resonancegate.spec.Excitation;
import org.resonancegate.spec.ExcitationFrequency;

/**
 * separation: for every mode f_n and every excitation frequency f (order-only ones included),
 * β = f/f_n stays outside (1 − margin, 1 + margin). The value is the smallest |f/f_n − 1|; an
 * order sweeps the band n·[N_min, N_max]/60, so a band containing a mode gives 0. Ties go to the
 * lowest mode, then the lowest speed, then the first excitation listed.
 */
final class SeparationRule {

    private SeparationRule() {
    }

    /** One mode against one excitation at the closest approach. */
    private record Approach(double value, Mode mode, Excitation excitation, double omega, OptionalDouble speed,
                            double tieSpeed) {
    }

    static Finding evaluate(Criterion.Separation c, RuleContext ctx) {
        Approach worst = null;
        for (Mode mode : ctx.system().modes()) {
            double wn = mode.angularFrequency();
            if (!(wn > 0)) {
                continue; // a zero-frequency (free-body) mode is left out of separation
            }
            for (Excitation e : ctx.excitations()) {
                Approach a = approach(mode, wn, e, ctx);
                CriterionProblem.requireFinite(a.value(), "separation of mode " + mode.index() + " from '"
                        + e.name() + "'");
                if (worst == null || closer(a, worst)) {
                    worst = a;
                }
            }
        }
        if (worst == null) {
            throw new CriterionProblem("separation: the model has no mode with a non-zero frequency to check");
        }
        double margin = c.margin().value();
        double badness = margin != 0 ? (margin - worst.value()) / Math.abs(margin) : -worst.value();
        OptionalDouble speedRpm = worst.speed().isPresent()
                ? OptionalDouble.of(Display.rpmValue(worst.speed().getAsDouble())) : OptionalDouble.empty();
        Approach governing = worst;
        return new Finding(worst.value(), margin, "1", speedRpm,
                OptionalDouble.of(Display.hzValue(worst.omega())), badness,
                () -> message(governing, margin, badness > 0)); // worded only if this case governs
    }

    private static Approach approach(Mode mode, double wn, Excitation e, RuleContext ctx) {
        if (e.frequency() instanceof ExcitationFrequency.Order o) {
            double lo = o.order() * ctx.minSpeed();
            double hi = o.order() * ctx.maxSpeed();
            if (lo <= wn && wn <= hi) {
                double speed = ctx.fixedSpeed() ? ctx.minSpeed() : wn / o.order();
                return new Approach(0, mode, e, wn, OptionalDouble.of(speed), speed);
            }
            if (wn < lo) {
                return new Approach(lo / wn - 1, mode, e, lo, OptionalDouble.of(ctx.minSpeed()), ctx.minSpeed());
            }
            return new Approach(1 - hi / wn, mode, e, hi, OptionalDouble.of(ctx.maxSpeed()), ctx.maxSpeed());
        }
        double w = Drives.omega(e.frequency(), ctx.minSpeed());
        // A fixed frequency does not move with speed; a fixed-speed machine still reports its speed.
        OptionalDouble speed = ctx.fixedSpeed() ? OptionalDouble.of(ctx.minSpeed()) : OptionalDouble.empty();
        return new Approach(Math.abs(w / wn - 1), mode, e, w, speed, ctx.minSpeed());
    }

    /** Smaller value wins; among equals the lower mode, then the lower speed; else the earlier one stays. */
    private static boolean closer(Approach a, Approach current) {
        if (!Ties.same(a.value(), current.value())) {
            return a.value() < current.value();
        }
        if (a.mode().index() != current.mode().index()) {
            return a.mode().index() < current.mode().index();
        }
        return a.tieSpeed() < current.tieSpeed() && !Ties.same(a.tieSpeed(), current.tieSpeed());
    }

    private static String message(Approach a, double margin, boolean fails) {
        String mode = Display.mode(a.mode());
        String source = "excitation '" + a.excitation().name() + "'" + describe(a.excitation());
        if (a.value() == 0) {
            String where = a.speed().isPresent() ? " at " + Display.rpm(a.speed().getAsDouble()) : "";
            return source + " meets " + mode + where + "; the required separation is " + Display.percent(margin);
        }
        String at = a.speed().isPresent()
                ? " " + Display.speedAndFrequency(a.speed().getAsDouble(), a.omega())
                : " at " + Display.hz(a.omega());
        String verdict = fails
                ? "inside the " + Display.percent(margin) + " margin by "
                + Display.sig((margin - a.value()) * 100, 3) + " percentage points"
                : "outside the " + Display.percent(margin) + " margin";
        return source + at + " is " + Display.percent(a.value()) + " from " + mode + ", " + verdict;
    }

    private static String describe(Excitation e) {
        if (e.frequency() instanceof ExcitationFrequency.Order o) {
            return " (order " + Display.sig(o.order()) + ")";
        }
        return "";
    }
}
