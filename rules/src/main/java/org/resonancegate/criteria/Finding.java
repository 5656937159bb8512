package org.resonancegate.criteria;

import java.util.Objects;
import java.util.OptionalDouble;
import java.util.function.Supplier;

/**
 * What one rule found for one model case: the governing value and where it occurs.
 *
 * <p>Not a record, so that the message can be worded lazily: every tolerance case is judged, but
 * only the governing one's message is read, and wording a value (significant figures, user units)
 * cost more than some of the rules. The accessors are those a record would have.
 */
public final class Finding {

    private final double value;
    private final double limit;
    private final String unit;
    private final OptionalDouble speedRpm;
    private final OptionalDouble frequencyHz;
    private final double badness;
    private Supplier<String> wording;
    private String message;

    /**
     * @param value       the governing value in SI ({@code unit})
     * @param limit       the bound it is held against (the nearer one to being broken when there are two)
     * @param unit        SI unit of value and limit: "1", "m", "m/s", "N"
     * @param speedRpm    running speed where it occurs; empty where the value does not depend on speed
     * @param frequencyHz excitation frequency where it occurs; empty where none applies
     * @param badness     signed relative exceedance of the bound: positive means the rule is broken,
     *                    larger means worse; it ranks tolerance cases in the rule's own direction
     * @param message     a sentence for a reviewer, in the units the spec was written in
     */
    public Finding(double value, double limit, String unit, OptionalDouble speedRpm, OptionalDouble frequencyHz,
                   double badness, String message) {
        this(value, limit, unit, speedRpm, frequencyHz, badness, () -> message);
        Objects.requireNonNull(message, "message");
    }

    /** As the public constructor, with the message worded when first read (once; a finding is read by one thread). */
    Finding(double value, double limit, String unit, OptionalDouble speedRpm, OptionalDouble frequencyHz,
            double badness, Supplier<String> message) {
        this.value = value;
        this.limit = limit;
        this.unit = Objects.requireNonNull(unit, "unit");
        this.speedRpm = Objects.requireNonNull(speedRpm, "speedRpm");
        this.frequencyHz = Objects.requireNonNull(frequencyHz, "frequencyHz");
        this.badness = badness;
        this.wording = Objects.requireNonNull(message, "message");
    }

    public double value() {
        return value;
    }

    public double limit() {
        return limit;
    }

    public String unit() {
        return unit;
    }

    public OptionalDouble speedRpm() {
        return speedRpm;
    }

    public OptionalDouble frequencyHz() {
        return frequencyHz;
    }

    public double badness() {
        return badness;
    }

    /** A sentence for a reviewer, in the units the spec was written in. */
    public String message() {
        if (message == null) {
            message = Objects.requireNonNull(wording.get(), "message");
            wording = null;
        }
        return message;
    }

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

    @Override
    public boolean equals(Object o) {
        return o instanceof Finding f && Double.compare(value, f.value) == 0 && Double.compare(limit, f.limit) == 0
                && unit.equals(f.unit) && speedRpm.equals(f.speedRpm) && frequencyHz.equals(f.frequencyHz)
                && Double.compare(badness, f.badness) == 0 && message().equals(f.message());
    }

    @Override
    public int hashCode() {
        return Objects.hash(value, limit, unit, speedRpm, frequencyHz, badness, message());
    }

    @Override
    public String toString() {
        return "Finding[value=" + value + ", limit=" + limit + ", unit=" + unit + ", speedRpm=" + speedRpm
                + ", frequencyHz=" + frequencyHz + ", badness=" + badness + ", message=" + message() + "]";
    }
}
