package org.resonancegate.maven;

import java.util.Optional;
import org.resonancegate.baseline.Ratchet;

/**
 * What a run means for the build, worked out in one place for every goal; each goal then decides
 * whether it fails the build on it ({@code check}) or only says so ({@code report}).
 *
 * @param nothingChecked why nothing was checked (no spec directory, no file matching, only
 *                       profiles), or empty when at least one spec was read
 * @param violations     what would break the build ("1 spec failed, 2 specs have errors"), or empty
 * @param letThrough     failures the baseline ratchet lets pass, to be said, or empty
 */
record Verdict(Optional<String> nothingChecked, Optional<String> violations, Optional<String> letThrough) {

    /**
     * @param judged  the ratchet's verdict on the results ({@code failOn} applied)
     * @param nothing why nothing was checked, or {@code ""}
     */
    static Verdict of(Ratchet.Verdict judged, String nothing) {
        return new Verdict(text(nothing), text(judged.failure()), text(judged.note()));
    }

    /** {@code ""} means none. */
    static Optional<String> text(String s) {
        return s.isEmpty() ? Optional.empty() : Optional.of(s);
    }
}
