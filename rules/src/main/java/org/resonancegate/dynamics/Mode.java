package org.resonancegate.dynamics;

import java.util.List;
import java.util.OptionalDouble;

/**
 * One undamped natural mode.
 *
 * @param index            one-based, in ascending frequency
 * @param angularFrequency ω_r in rad/s
 * @param dampingRatio     the equivalent viscous modal damping ratio; empty for a zero-frequency mode
 * @param shares           the dominant motions (≥ 5 % of the kinetic energy), largest first; empty
 *                         for a model with one degree of freedom
 */
public record Mode(int index, double angularFrequency, OptionalDouble dampingRatio, List<MotionShare> shares) {

    public Mode {
        shares = List.copyOf(shares);
    }

    public Mode(int index, double angularFrequency, OptionalDouble dampingRatio) {
        this(index, angularFrequency, dampingRatio, List.of());
    }

    public double frequencyHz() {
        return angularFrequency / (2 * Math.PI);
    }
}
