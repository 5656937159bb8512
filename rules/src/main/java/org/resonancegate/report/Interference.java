package org.resonancegate.report;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * What an interference diagram needs: the natural frequencies of one model case, the separation
 * margin held around them, the excitation frequencies against running speed and the operating range.
 *
 * @param basis            the tolerance case the modes belong to: the one that governs the
 *                         separation criterion, or "nominal"
 * @param margin           the separation criterion's margin as a fraction, empty without one
 * @param marginCriterion  the id of that criterion
 * @param minSpeedRpm      bottom of the operating range
 * @param maxSpeedRpm      top of the operating range (equal to the bottom for a fixed speed)
 */
public record Interference(String basis, List<ModeLine> modes, OptionalDouble margin,
                           Optional<String> marginCriterion, List<ExcitationLine> excitations,
                           double minSpeedRpm, double maxSpeedRpm) {

    public Interference {
        modes = List.copyOf(modes);
        excitations = List.copyOf(excitations);
    }

    /** A natural frequency (Hz); zero-frequency modes are left out. */
    public record ModeLine(int index, double frequencyHz) {
    }

    /**
     * An excitation: an {@code order} of running speed (a line through the origin), or a fixed
     * {@code frequencyHz} (a level line); exactly one is present.
     */
    public record ExcitationLine(String name, OptionalDouble order, OptionalDouble frequencyHz) {
    }
}
