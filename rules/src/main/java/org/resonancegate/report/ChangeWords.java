package org.resonancegate.report;

import java.math.RoundingMode;
import java.util.Optional;
import java.util.OptionalDouble;
import org.resonancegate.units.Decimal;

/**
 * How every report words a baseline comparison: frequencies, values, margins and relative changes
 * to four significant digits, the same on the console, in the HTML report and in the summary, so a
 * number a reviewer reads in one can be found in the other.
 */
public final class ChangeWords {

    private static final int MAX_TEXT = 60;

    private ChangeWords() {
    }

    public static String hz(OptionalDouble f) {
        return f.isPresent() ? sig(f.getAsDouble()) + " Hz" : "(none)";
    }

    public static String change(OptionalDouble from, OptionalDouble to) {
        if (from.isEmpty() || to.isEmpty() || from.getAsDouble() == 0) {
            return "";
        }
        double rel = (to.getAsDouble() - from.getAsDouble()) / from.getAsDouble();
        return " (" + (rel >= 0 ? "+" : "−") + sig(Math.abs(rel) * 100) + " %)";
    }

    public static String number(OptionalDouble v, String unit) {
        if (v.isEmpty()) {
            return "(none)";
        }
        return Double.isFinite(v.getAsDouble()) ? sig(v.getAsDouble()) + (unit.equals("1") ? "" : " " + unit) : "n/a";
    }

    public static String percent(OptionalDouble m) {
        if (m.isEmpty()) {
            return "n/a";
        }
        double p = m.getAsDouble() * 100;
        return (p >= 0 ? "+" : "−") + sig(Math.abs(p)) + " %";
    }

    /** Four significant digits, no exponent, no trailing zeros. */
    public static String sig(double x) {
        return Decimal.text(x, 4, RoundingMode.HALF_UP);
    }

    /** The value before, as written (a JSON literal), cut around the difference when long; "(absent)" if new. */
    public static String before(InputChange i) {
        return i.before().map(t -> cut(t, differFrom(i))).orElse("(absent)");
    }

    /** The value now, cut like {@link #before}; "(removed)" if gone. */
    public static String after(InputChange i) {
        return i.after().map(t -> cut(t, differFrom(i))).orElse("(removed)");
    }

    private static int differFrom(InputChange i) {
        return differFrom(i.before().orElse(""), i.after().orElse(""));
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

    /** The transition of one current criterion, when the run was compared with a baseline. */
    public static Optional<Transition> transition(Optional<Comparison> c, SpecResult spec, CheckResult check) {
        return c.flatMap(x -> x.criterion(spec.file(), check.criterion())).map(CriterionChange::transition);
    }

    /** The first ten hex digits of the baseline commit, as the console names it. */
    public static String shortCommit(Comparison c) {
        return c.commit().length() > 10 ? c.commit().substring(0, 10) : c.commit();
    }
}
