package org.resonancegate.report;

/**
 * How one criterion moved between a baseline and the current run. "Failing" means broken and
 * not covered by a valid waiver (status {@code fail} or {@code warning}); a criterion waived at
 * the baseline counts as not failing there, so a waiver that has since expired gives {@link #NEW}.
 */
public enum Transition {
    /** Fails now; passed, was waived or did not exist at the baseline. */
    NEW("new", "new"),
    /** Failed at the baseline and still fails. */
    CARRIED_OVER("carried-over", "carried over"),
    /** Failed at the baseline, does not fail now. */
    FIXED("fixed", "fixed"),
    /** Does not fail now and did not fail at the baseline (or did not exist there). */
    PASS("pass", "pass"),
    /** Judged at the baseline, not now: the criterion or its spec is gone, or the spec has errors now. */
    REMOVED("removed", "removed");

    private final String key;
    private final String words;

    Transition(String key, String words) {
        this.key = key;
        this.words = words;
    }

    /** The value in {@code results.json}. */
    public String key() {
        return key;
    }

    /** As the console says it. */
    public String words() {
        return words;
    }
}
