package org.resonancegate.check;

import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import org.resonancegate.report.CheckResult;
import org.resonancegate.report.CheckStatus;
import org.resonancegate.spec.Severity;
import org.resonancegate.spec.Waiver;

/**
 * Turns a finding into a check status. A failing criterion with a waiver valid on the build date
 * (expires ≥ today, inclusive) is waived whatever its severity; otherwise it fails (or warns, for
 * warning severity) and an expired waiver is said so.
 */
final class WaiverJudgement {

    record Verdict(CheckStatus status, Optional<CheckResult.WaiverNote> note, String suffix) {
    }

    private WaiverJudgement() {
    }

    static Verdict judge(String criterionId, Severity severity, boolean fails, List<Waiver> waivers,
                         LocalDate today) {
        Optional<Waiver> waiver = pick(criterionId, waivers);
        Optional<CheckResult.WaiverNote> note = waiver.map(w ->
                new CheckResult.WaiverNote(w.reason(), w.expires(), valid(w, today), w.location()));
        if (!fails) {
            return new Verdict(CheckStatus.PASS, note, "");
        }
        if (waiver.isPresent() && valid(waiver.get(), today)) {
            return new Verdict(CheckStatus.WAIVED, note,
                    "; waived through " + waiver.get().expires() + ": " + waiver.get().reason());
        }
        CheckStatus broken = severity == Severity.WARNING ? CheckStatus.WARNING : CheckStatus.FAIL;
        String suffix = waiver.map(w -> "; waiver expired on " + w.expires()).orElse("");
        return new Verdict(broken, note, suffix);
    }

    static boolean valid(Waiver w, LocalDate today) {
        return !w.expires().isBefore(today);
    }

    /** The waiver naming this criterion (the reader refuses a second one for the same criterion). */
    private static Optional<Waiver> pick(String criterionId, List<Waiver> waivers) {
        return waivers.stream().filter(w -> w.criterion().equals(criterionId)).findFirst();
    }
}
