package org.resonancegate.criteria;

import org.resonancegate.spec.Criterion;

/** One entry for every rule: a criterion judged on one model case gives one {@link Finding}. */
public final class Rules {

    private Rules() {
    }

    /**
     * Judges {@code criterion} on {@code ctx}.
     *
     * @throws CriterionProblem when the criterion cannot be judged (numerical trouble, nothing to judge)
     */
    public static Finding evaluate(Criterion criterion, RuleContext ctx) {
        try {
            return dispatch(criterion, ctx);
        } catch (IllegalArgumentException e) {
            // The model refuses what the criterion asks of it (a point it does not have, a load it
            // cannot carry): an error entry at the criterion, never a pass.
            throw new CriterionProblem(e.getMessage());
        }
    }

    private static Finding dispatch(Criterion criterion, RuleContext ctx) {
        // Criterion is sealed; Java 17 has no pattern switch, so the kinds are tested in turn.
        if (criterion instanceof Criterion.Separation s) {
            return SeparationRule.evaluate(s, ctx);
        } else if (criterion instanceof Criterion.Isolation i) {
            return IsolationRule.evaluate(i, ctx);
        } else if (criterion instanceof Criterion.Displacement d) {
            return ResponseRules.displacement(d, ctx);
        } else if (criterion instanceof Criterion.Velocity v) {
            return ResponseRules.velocity(v, ctx);
        } else if (criterion instanceof Criterion.TransmittedForce f) {
            return ResponseRules.transmittedForce(f, ctx);
        } else if (criterion instanceof Criterion.StaticDeflection d) {
            return StaticDeflectionRule.evaluate(d, ctx);
        }
        throw new IllegalStateException("unknown criterion kind " + criterion.getClass().getName());
    }
}
