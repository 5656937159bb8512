package org.resonancegate.dynamics;

import java.util.OptionalDouble;

/**
 * One undamped natural mode.
 *
 * @param index            one-based, in ascending frequency
 * @param angularFrequency ω_r in rad/s
 * @param dampingRatio     the equivalent viscous modal damping ratio; empty for a zero-frequency mode
 */
public record Mode(int index, double angularFrequency, OptionalDouble dampingRatio) {

    public double frequencyHz() {
        return angularFrequency / (2 * Math.PI);
    }
}
