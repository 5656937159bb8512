package org.resonancegate.report;

import java.util.Optional;
import java.util.OptionalDouble;
import org.resonancegate.spec.SourceLocation;

/**
 * One criterion at the baseline and now, matched by {@code id}. Each side is empty where the
 * criterion was not judged. The margin is how far the governing value lies from the limit, as a
 * fraction of the limit: positive on the passing side, negative when the rule is broken (as the
 * status says), empty for a zero limit.
 *
 * @param location where the criterion is written now (at the baseline for a removed one)
 */
public record CriterionChange(String criterion, String rule, Transition transition,
                              Optional<CheckStatus> baselineStatus, Optional<CheckStatus> currentStatus,
                              OptionalDouble baselineValue, OptionalDouble currentValue,
                              OptionalDouble baselineLimit, OptionalDouble currentLimit, String unit,
                              OptionalDouble baselineMargin, OptionalDouble currentMargin,
                              SourceLocation location) {

    /** Whether anything a reader would see differs: status, value or limit. */
    public boolean changed() {
        return !baselineStatus.equals(currentStatus) || differs(baselineValue, currentValue)
                || differs(baselineLimit, currentLimit);
    }

    private static boolean differs(OptionalDouble a, OptionalDouble b) {
        if (a.isEmpty() || b.isEmpty()) {
            return a.isPresent() != b.isPresent();
        }
        double x = a.getAsDouble();
        double y = b.getAsDouble();
        return Math.abs(x - y) > 1e-9 * Math.max(Math.abs(x), Math.abs(y));
    }
}
