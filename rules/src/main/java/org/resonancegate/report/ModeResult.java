package org.resonancegate.report;

import java.util.List;
import java.util.OptionalDouble;

/**
 * One natural mode (undamped frequency) with its damping ratio (empty for a zero-frequency mode)
 * and, for a reader, the motions that dominate it with their share of the mode's kinetic energy
 * (largest first; for a rigid body "x" … "rz", for a chain the masses by name; empty for a single mass).
 */
public record ModeResult(int index, double frequencyHz, OptionalDouble dampingRatio, List<Share> shares) {

    public ModeResult {
        shares = List.copyOf(shares);
    }

    public ModeResult(int index, double frequencyHz, OptionalDouble dampingRatio) {
        this(index, frequencyHz, dampingRatio, List.of());
    }

    /** One motion's share of a mode, a fraction from 0 to 1. */
    public record Share(String motion, double fraction) {
    }
}
