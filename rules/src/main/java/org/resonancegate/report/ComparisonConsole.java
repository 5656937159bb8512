package org.resonancegate.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The console's account of a baseline comparison: one summary line, then for each spec that
 * moved a short block of what changed (inputs as written, modes, criteria with their margins).
 * Input lines keep the {@code path:line:col:} shape so an IDE can jump to the changed value.
 */
final class ComparisonConsole {

    private static final int MAX_TEXT = 60;

    private ComparisonConsole() {
    }

    static void block(Comparison c, List<ConsoleLine> lines) {
        long changed = count(c, SpecChange.Kind.CHANGED);
        long renamed = count(c, SpecChange.Kind.RENAMED);
        long added = count(c, SpecChange.Kind.ADDED);
        long removed = count(c, SpecChange.Kind.REMOVED);
        long unchanged = count(c, SpecChange.Kind.UNCHANGED);
        info(lines, "compared with " + c.ref() + " (" + shortId(c) + ", waivers judged on " + c.judgedOn() + "): "
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
            int from = differFrom(i.before().orElse(""), i.after().orElse(""));
            info(lines, "  " + where + "input " + i.path() + ": " + i.before().map(t -> cut(t, from)).orElse("(absent)")
                    + " → " + i.after().map(t -> cut(t, from)).orElse("(removed)"));
        }
        for (ModeChange m : s.modes()) {
            if (m.moved()) {
                info(lines, "  mode " + m.index() + ": " + hz(m.baselineHz()) + " → " + hz(m.currentHz())
                        + change(m.baselineHz(), m.currentHz()));
            }
        }
        for (CriterionChange k : s.criteria()) {
            if (k.changed() || k.transition() != Transition.PASS) {
                info(lines, "  " + k.criterion() + " " + k.rule() + ": "
                        + k.baselineStatus().map(CheckStatus::key).orElse("absent") + " → "
                        + k.currentStatus().map(CheckStatus::key).orElse("absent")
                        + (k.transition() == Transition.PASS ? "" : tag(k.transition()))
                        + "; value " + number(k.baselineValue(), k.unit()) + " → " + number(k.currentValue(), k.unit())
                        + limit(k) + "; margin " + percent(k.baselineMargin()) + " → " + percent(k.currentMargin()));
            }
        }
    }

    private static String limit(CriterionChange k) {
        if (k.baselineLimit().equals(k.currentLimit())) {
            return ", limit " + number(k.currentLimit(), k.unit());
        }
        return ", limit " + number(k.baselineLimit(), k.unit()) + " → " + number(k.currentLimit(), k.unit());
    }

    static String tag(Transition t) {
        return " (" + t.words() + ")";
    }

    private static long count(Comparison c, SpecChange.Kind kind) {
        return c.specs().stream().filter(s -> s.kind() == kind).count();
    }

    private static String shortId(Comparison c) {
        return c.commit().length() > 10 ? c.commit().substring(0, 10) : c.commit();
    }

    private static void info(List<ConsoleLine> lines, String text) {
        lines.add(new ConsoleLine(ConsoleLevel.INFO, text));
    }

    /**
     * Where to start showing two long texts so the difference is in view: a few characters before
     * the first one that differs (0 for short texts).
     */
    private static int differFrom(String a, String b) {
        if (a.codePointCount(0, a.length()) <= MAX_TEXT && b.codePointCount(0, b.length()) <= MAX_TEXT) {
            return 0;
        }
        int same = 0;
        while (same < a.length() && same < b.length() && a.charAt(same) == b.charAt(same)) {
            same++;
        }
        int start = Math.max(0, same - 12);
        return start > 0 && Character.isLowSurrogate(a.charAt(start)) ? start - 1 : start;
    }

    /** The text from {@code from} on, at most {@link #MAX_TEXT} characters, with "…" where it is cut. */
    private static String cut(String text, int from) {
        String tail = from <= 0 ? text : "…" + text.substring(Math.min(from, text.length()));
        int n = tail.codePointCount(0, tail.length());
        return n <= MAX_TEXT ? tail : tail.substring(0, tail.offsetByCodePoints(0, MAX_TEXT)) + "…";
    }

    private static String hz(OptionalDouble f) {
        return f.isPresent() ? sig(f.getAsDouble()) + " Hz" : "(none)";
    }

    private static String change(OptionalDouble from, OptionalDouble to) {
        if (from.isEmpty() || to.isEmpty() || from.getAsDouble() == 0) {
            return "";
        }
        double rel = (to.getAsDouble() - from.getAsDouble()) / from.getAsDouble();
        return " (" + (rel >= 0 ? "+" : "−") + sig(Math.abs(rel) * 100) + " %)";
    }

    private static String number(OptionalDouble v, String unit) {
        if (v.isEmpty()) {
            return "(none)";
        }
        return Double.isFinite(v.getAsDouble()) ? sig(v.getAsDouble()) + (unit.equals("1") ? "" : " " + unit) : "n/a";
    }

    private static String percent(OptionalDouble m) {
        if (m.isEmpty()) {
            return "n/a";
        }
        double p = m.getAsDouble() * 100;
        return (p >= 0 ? "+" : "−") + sig(Math.abs(p)) + " %";
    }

    /** Four significant digits, no exponent, no trailing zeros. */
    static String sig(double x) {
        if (x == 0 || !Double.isFinite(x)) {
            return x == 0 ? "0" : Double.toString(x);
        }
        return new BigDecimal(x).round(new MathContext(4)).stripTrailingZeros().toPlainString();
    }

    static Optional<Transition> transition(Optional<Comparison> c, SpecResult spec, CheckResult check) {
        return c.flatMap(x -> x.criterion(spec.file(), check.criterion())).map(CriterionChange::transition);
    }
}
