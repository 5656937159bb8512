package org.resonancegate.units;

import java.util.Collection;
import java.util.Locale;
import java.util.Optional;

/**
 * "Did you mean" hints for misspelt keys and units: the closest candidate by edit distance,
 * offered only when it is close enough to be a plausible typo.
 */
public final class Suggestions {

    private Suggestions() {
    }

    /** The closest candidate to {@code written}, if one is within a typo's distance. */
    public static Optional<String> closest(String written, Collection<String> candidates) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        String lower = written.toLowerCase(Locale.ROOT);
        for (String candidate : candidates) {
            // A difference of letter case alone counts as one edit: "hz" is close to "Hz".
            int d = candidate.equals(written) ? 0
                    : candidate.toLowerCase(Locale.ROOT).equals(lower) ? 1
                    : distance(lower, candidate.toLowerCase(Locale.ROOT)) + 1;
            if (d < bestDistance) {
                bestDistance = d;
                best = candidate;
            }
        }
        if (best == null) {
            return Optional.empty();
        }
        // One- and two-letter words are only "close" when they differ in case: "x" is no typo of "t".
        int longer = Math.max(written.length(), best.length());
        int allowed = longer <= 2 ? 1 : Math.max(2, longer / 3 + 1);
        return bestDistance <= allowed ? Optional.of(best) : Optional.empty();
    }

    /** Levenshtein distance (insertions, deletions, substitutions; each costs one). */
    public static int distance(String a, String b) {
        int[] previous = new int[b.length() + 1];
        int[] current = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            previous[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            current[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                current[j] = Math.min(Math.min(current[j - 1] + 1, previous[j] + 1), previous[j - 1] + cost);
            }
            int[] swap = previous;
            previous = current;
            current = swap;
        }
        return previous[b.length()];
    }
}
