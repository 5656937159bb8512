package org.resonancegate.report;

import java.util.OptionalDouble;

/** A nominal mode's frequency at the baseline and now, paired by index; empty where a side has no such mode. */
public record ModeChange(int index, OptionalDouble baselineHz, OptionalDouble currentHz) {

    /** Whether the frequency moved (by more than the tie tolerance), appeared or went away. */
    public boolean moved() {
        if (baselineHz.isEmpty() || currentHz.isEmpty()) {
            return baselineHz.isPresent() != currentHz.isPresent();
        }
        double a = baselineHz.getAsDouble();
        double b = currentHz.getAsDouble();
        return Math.abs(a - b) > 1e-9 * Math.max(Math.abs(a), Math.abs(b));
    }
}
