package org.resonancegate.criteria;

import java.util.OptionalDouble;

/**
 * What one rule found for one model case: the governing value and where it occurs.
 *
 * @param value       the governing value in SI ({@code unit})
 * @param limit       the bound it is held against (the nearer one to being broken when there are two)
 * @param unit        SI unit of value and limit: "1", "m", "m/s", "N"
 * @param speedRpm    running speed where it occurs; empty where the value does not depend on speed
 * @param frequencyHz excitation frequency where it occurs; empty where none applies
 * @param badness     signed relative exceedance of the bound: positive means the rule is broken,
 *                    larger means worse; it ranks tolerance cases in the rule's own direction
 * @param message     a sentence for a reviewer, in the units the spec was written in
 */
public record Finding(double value, double limit, String unit, OptionalDouble speedRpm, OptionalDouble frequencyHz,
                      double badness, String message) {

    public boolean fails() {
        return badness > 0;
    }

    /** Relative exceedance of an upper bound: positive when {@code value > limit}. */
    static double aboveBound(double value, double limit) {
        return limit != 0 ? (value - limit) / Math.abs(limit) : value - limit;
    }

    /** Relative shortfall below a lower bound: positive when {@code value < limit}. */
    static double belowBound(double value, double limit) {
        return limit != 0 ? (limit - value) / Math.abs(limit) : limit - value;
    }
}
