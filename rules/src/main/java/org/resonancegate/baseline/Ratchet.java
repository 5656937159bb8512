package org.resonancegate.baseline;

import java.util.ArrayList;
import java.util.List;
import org.resonancegate.report.CheckResult;
import org.resonancegate.report.CheckStatus;
import org.resonancegate.report.Comparison;
import org.resonancegate.report.Results;
import org.resonancegate.report.SpecResult;
import org.resonancegate.report.SpecStatus;
import org.resonancegate.report.Transition;

/**
 * Turns results into a build verdict. With {@link FailOn#VIOLATION} every failing spec breaks the
 * build; with {@link FailOn#NEW_VIOLATION} only a criterion that fails now and did not fail at the
 * baseline does. A spec in error always breaks it: a file that cannot be read now is never old news.
 */
public final class Ratchet {

    /**
     * @param failure what breaks the build ("2 specs failed"); empty when the build may pass
     * @param note    failures the verdict let through, to be said ("1 carried-over failure ..."); may be empty
     */
    public record Verdict(String failure, String note) {

        public boolean fails() {
            return !failure.isEmpty();
        }
    }

    private Ratchet() {
    }

    /** @throws IllegalArgumentException for {@code NEW_VIOLATION} on results without a baseline */
    public static Verdict judge(Results results, FailOn failOn) {
        long broken = results.specs().stream().filter(s -> s.status() == SpecStatus.ERROR).count();
        List<String> parts = new ArrayList<>();
        String note = "";
        if (failOn == FailOn.VIOLATION) {
            long failed = results.specs().stream().filter(s -> s.status() == SpecStatus.FAIL).count();
            add(parts, failed, " spec failed", " specs failed");
        } else {
            Comparison comparison = results.baseline().orElseThrow(() -> new IllegalArgumentException(
                    "failOn=new-violation compares with a baseline; none was given"));
            long fresh = 0;
            long carried = 0;
            for (SpecResult spec : results.specs()) {
                for (CheckResult check : spec.checks()) {
                    if (check.status() != CheckStatus.FAIL) {
                        continue;
                    }
                    Transition t = comparison.criterion(spec.file(), check.criterion())
                            .map(c -> c.transition()).orElse(Transition.NEW);
                    if (t == Transition.CARRIED_OVER) {
                        carried++;
                    } else {
                        fresh++;
                    }
                }
            }
            add(parts, fresh, " new failing criterion", " new failing criteria");
            if (carried > 0) {
                note = carried + (carried == 1 ? " failing criterion was" : " failing criteria were")
                        + " already failing at " + comparison.ref() + " (carried over); failOn=new-violation lets "
                        + (carried == 1 ? "it" : "them") + " pass";
            }
        }
        add(parts, broken, " spec has errors", " specs have errors");
        return new Verdict(String.join(", ", parts), note);
    }

    private static void add(List<String> parts, long n, String one, String many) {
        if (n > 0) {
            parts.add(n + (n == 1 ? one : many));
        }
    }
}
