package org.resonancegate.report;

import java.util.List;
import java.util.Optional;

/**
 * The console's account of a baseline comparison: one summary line, then for each spec that
 * moved a short block of what changed (inputs as written, modes, criteria with their margins).
 * Input lines keep the {@code path:line:col:} shape so an IDE can jump to the changed value.
 */
final class ComparisonConsole {

    private ComparisonConsole() {
    }

    static void block(Comparison c, List<ConsoleLine> lines) {
        long changed = count(c, SpecChange.Kind.CHANGED);
        long renamed = count(c, SpecChange.Kind.RENAMED);
        long added = count(c, SpecChange.Kind.ADDED);
        long removed = count(c, SpecChange.Kind.REMOVED);
        long unchanged = count(c, SpecChange.Kind.UNCHANGED);
        info(lines, "compared with " + c.ref() + " (" + ChangeWords.shortCommit(c) + ", waivers judged on " + c.judgedOn() + "): "
                + changed + " changed, " + renamed + " renamed, " + added + " added, " + removed + " removed, "
                + unchanged + " unchanged");
        for (String note : c.notes()) {
            lines.add(new ConsoleLine(ConsoleLevel.WARNING, note));
        }
        for (SpecChange s : c.specs()) {
            if (s.kind() != SpecChange.Kind.UNCHANGED) {
                spec(c, s, lines);
            }
        }
    }

    private static void spec(Comparison c, SpecChange s, List<ConsoleLine> lines) {
        String name = s.id().orElse(s.file());
        String head = switch (s.kind()) {
            case RENAMED -> name + " renamed since " + c.ref() + ": " + s.baselineFile().orElseThrow() + " → "
                    + s.currentFile().orElseThrow();
            case ADDED -> name + " (" + s.file() + ") added since " + c.ref();
            case REMOVED -> name + " (" + s.file() + ") removed since " + c.ref();
            default -> name + " (" + s.file() + ") changed since " + c.ref();
        };
        String status = s.baselineStatus().map(SpecStatus::key).orElse("absent") + " → "
                + s.currentStatus().map(SpecStatus::key).orElse("absent");
        info(lines, head + "; status " + status);
        for (ErrorEntry e : s.baselineErrors()) {
            info(lines, "  at " + c.ref() + ": " + e.location().display() + ": " + e.message());
        }
        for (InputChange i : s.inputs()) {
            String where = i.location().map(l -> l.display() + ": ").orElse(s.file() + ": ");
            info(lines, "  " + where + "input " + i.path() + ": " + ChangeWords.before(i) + " → " + ChangeWords.after(i));
        }
        for (ModeChange m : s.modes()) {
            if (m.moved()) {
                info(lines, "  mode " + m.index() + ": " + ChangeWords.hz(m.baselineHz()) + " → " + ChangeWords.hz(m.currentHz())
                        + ChangeWords.change(m.baselineHz(), m.currentHz()));
            }
        }
        for (CriterionChange k : s.criteria()) {
            if (k.changed() || k.transition() != Transition.PASS) {
                info(lines, "  " + k.criterion() + " " + k.rule() + ": "
                        + k.baselineStatus().map(CheckStatus::key).orElse("absent") + " → "
                        + k.currentStatus().map(CheckStatus::key).orElse("absent")
                        + (k.transition() == Transition.PASS ? "" : tag(k.transition()))
                        + "; value " + ChangeWords.number(k.baselineValue(), k.unit()) + " → " + ChangeWords.number(k.currentValue(), k.unit())
                        + limit(k) + "; margin " + ChangeWords.percent(k.baselineMargin()) + " → " + ChangeWords.percent(k.currentMargin()));
            }
        }
    }

    private static String limit(CriterionChange k) {
        if (k.baselineLimit().equals(k.currentLimit())) {
            return ", limit " + ChangeWords.number(k.currentLimit(), k.unit());
        }
        return ", limit " + ChangeWords.number(k.baselineLimit(), k.unit()) + " → " + ChangeWords.number(k.currentLimit(), k.unit());
    }

    static String tag(Transition t) {
        return " (" + t.words() + ")";
    }

    private static long count(Comparison c, SpecChange.Kind kind) {
        return c.specs().stream().filter(s -> s.kind() == kind).count();
    }

    private static void info(List<ConsoleLine> lines, String text) {
        lines.add(new ConsoleLine(ConsoleLevel.INFO, text));
    }

    static Optional<Transition> transition(Optional<Comparison> c, SpecResult spec, CheckResult check) {
        return ChangeWords.transition(c, spec, check);
    }
}
