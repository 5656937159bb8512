package org.resonancegate.baseline;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;

/** What fails the build. */
public enum FailOn {
    /** Every failing criterion, old or new. */
    VIOLATION("violation"),
    /** Only criteria that fail now and did not fail at the baseline (a ratchet); needs a baseline. */
    NEW_VIOLATION("new-violation");

    private final String key;

    FailOn(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }

    /** The value as a user writes it, {@code violation} or {@code new-violation}; empty when it is neither. */
    public static Optional<FailOn> parse(String text) {
        String t = text.trim().toLowerCase(Locale.ROOT);
        return Arrays.stream(values()).filter(f -> f.key.equals(t)).findFirst();
    }
}
