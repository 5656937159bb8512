package org.resonancegate.report;

import java.util.OptionalDouble;

/** One natural mode (undamped frequency) with its damping ratio; empty ratio for a zero-frequency mode. */
public record ModeResult(int index, double frequencyHz, OptionalDouble dampingRatio) {
}
