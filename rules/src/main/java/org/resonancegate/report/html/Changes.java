package org.resonancegate.report.html;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.resonancegate.report.ChangeWords;
import org.resonancegate.report.CheckStatus;
import org.resonancegate.report.Comparison;
import org.resonancegate.report.CriterionChange;
import org.resonancegate.report.InputChange;
import org.resonancegate.report.Interference;
import org.resonancegate.report.ModeChange;
import org.resonancegate.report.SpecChange;
import org.resonancegate.report.SpecStatus;
import org.resonancegate.report.Transition;

/** Words a baseline comparison for the page: the "what changed" block and the dashed modes of a diagram. */
final class Changes {

    private Changes() {
    }

    /** @param anchors each current spec file's section anchor */
    static Page.Changes of(Comparison c, Map<String, String> anchors) {
        long[] n = new long[Transition.values().length];
        c.specs().forEach(s -> s.criteria().forEach(k -> n[k.transition().ordinal()]++));
        long changed = c.specs().stream().filter(s -> s.kind() != SpecChange.Kind.UNCHANGED).count();
        String lead = n[Transition.NEW.ordinal()] + " new failing, " + n[Transition.CARRIED_OVER.ordinal()]
                + " carried over, " + n[Transition.FIXED.ordinal()] + " fixed; " + changed
                + (changed == 1 ? " spec changed, " : " specs changed, ") + (c.specs().size() - changed) + " unchanged";
        List<Page.SpecDelta> specs = new ArrayList<>();
        for (SpecChange s : c.specs()) {
            if (s.kind() != SpecChange.Kind.UNCHANGED) {
                specs.add(spec(s, s.currentFile().map(f -> anchors.getOrDefault(f, "")).orElse("")));
            }
        }
        return new Page.Changes(c.ref(), c.commit(), c.judgedOn().toString(), lead, c.notes(), specs);
    }

    private static Page.SpecDelta spec(SpecChange s, String anchor) {
        String kind = s.kind() == SpecChange.Kind.RENAMED
                ? "renamed from " + s.baselineFile().orElseThrow() : s.kind().key();
        String status = s.baselineStatus().map(SpecStatus::key).orElse("absent") + " → "
                + s.currentStatus().map(SpecStatus::key).orElse("absent");
        List<Page.InputDelta> inputs = new ArrayList<>();
        for (InputChange i : s.inputs()) {
            inputs.add(new Page.InputDelta(i.path(), ChangeWords.before(i), ChangeWords.after(i),
                    i.location().map(l -> l.display()).orElse(s.file())));
        }
        List<Page.ModeDelta> modes = new ArrayList<>();
        for (ModeChange m : s.modes()) {
            if (m.moved()) {
                modes.add(new Page.ModeDelta(Integer.toString(m.index()), ChangeWords.hz(m.baselineHz()),
                        ChangeWords.hz(m.currentHz()), ChangeWords.change(m.baselineHz(), m.currentHz()).replaceAll("[ ()]+$|^[ (]+", "")));
            }
        }
        List<Page.CriterionDelta> criteria = new ArrayList<>();
        for (CriterionChange k : s.criteria()) {
            if (k.changed() || k.transition() != Transition.PASS) {
                String limit = k.baselineLimit().equals(k.currentLimit()) ? ChangeWords.number(k.currentLimit(), k.unit())
                        : ChangeWords.number(k.baselineLimit(), k.unit()) + " → " + ChangeWords.number(k.currentLimit(), k.unit());
                criteria.add(new Page.CriterionDelta(k.criterion(), k.rule(), k.transition().key(),
                        k.transition().words(),
                        k.baselineStatus().map(CheckStatus::key).orElse("absent") + " → "
                                + k.currentStatus().map(CheckStatus::key).orElse("absent"),
                        ChangeWords.number(k.baselineValue(), k.unit()) + " → " + ChangeWords.number(k.currentValue(), k.unit()),
                        limit, ChangeWords.percent(k.baselineMargin()) + " → " + ChangeWords.percent(k.currentMargin())));
            }
        }
        return new Page.SpecDelta(anchor, s.id().orElse(s.file()), kind, s.file(), status,
                Pages.errors(s.baselineErrors()), inputs, modes, criteria);
    }

    /** The baseline frequencies of a current spec's modes that moved, for the interference diagram. */
    static Optional<InterferencePlot.Baseline> overlay(Optional<Comparison> c, String currentFile) {
        return c.map(x -> {
            List<Interference.ModeLine> modes = new ArrayList<>();
            x.current(currentFile).stream()
                    .flatMap(s -> s.modes().stream())
                    .filter(m -> m.moved() && m.baselineHz().isPresent())
                    .forEach(m -> modes.add(new Interference.ModeLine(m.index(), m.baselineHz().getAsDouble())));
            return new InterferencePlot.Baseline(x.ref(), modes);
        });
    }

    /** The spec's change since the baseline, as the overview shows it; empty without a baseline. */
    static String kind(Optional<Comparison> c, String currentFile) {
        return c.flatMap(x -> x.current(currentFile).stream().findFirst()).map(s -> s.kind().key()).orElse("");
    }
}
