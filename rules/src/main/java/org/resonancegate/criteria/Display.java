package org.resonancegate.criteria;

import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.resonancegate.spec.Quantity;
import org.resonancegate.units.Decimal;

/** Number formatting for messages: deterministic, locale-independent, a few significant digits. */
final class Display {

    private static final Pattern NUMBER_THEN_UNIT =
            Pattern.compile("^\\s*([-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?)\\s*(.*?)\\s*$");

    private Display() {
    }

    /** {@code x} rounded to {@code digits} significant digits, without trailing zeros. */
    static String sig(double x, int digits) {
        return Decimal.text(x, digits);
    }

    static String sig(double x) {
        return sig(x, 4);
    }

    /**
     * A running speed (rad/s) as the rpm value a report carries. The trip rpm → rad/s → rpm
     * leaves a last-digit residue (999.9999999999999 for "1000 rpm"); twelve significant digits
     * are far finer than any speed a spec states and remove it.
     */
    static double rpmValue(double speed) {
        return twelveDigits(speed * 60 / (2 * Math.PI));
    }

    /** An angular frequency (rad/s) as the Hz value a report carries, rounded like {@link #rpmValue}. */
    static double hzValue(double omega) {
        return twelveDigits(omega / (2 * Math.PI));
    }

    private static double twelveDigits(double x) {
        return Decimal.round(x, 12);
    }

    /** A running speed (rad/s) in rpm. */
    static String rpm(double speed) {
        return sig(speed * 60 / (2 * Math.PI)) + " rpm";
    }

    /** An angular frequency (rad/s) in Hz. */
    static String hz(double omega) {
        return sig(omega / (2 * Math.PI)) + " Hz";
    }

    /** A fraction as a percentage: 0.153 → "15.3 %". */
    static String percent(double fraction) {
        return sig(fraction * 100, 3) + " %";
    }

    /**
     * "mode 3 (rocking about y 71 %, x 27 %) at 8.4 Hz"; a mode of a one-degree-of-freedom model
     * has no shares and reads "mode 1 at 5.74 Hz".
     */
    static String mode(org.resonancegate.dynamics.Mode m) {
        StringBuilder b = new StringBuilder("mode ").append(m.index());
        if (!m.shares().isEmpty()) {
            b.append(" (");
            for (int i = 0; i < m.shares().size(); i++) {
                org.resonancegate.dynamics.MotionShare s = m.shares().get(i);
                b.append(i > 0 ? ", " : "").append(s.reading()).append(' ')
                        .append(Math.round(s.fraction() * 100)).append(" %");
            }
            b.append(')');
        }
        return b.append(" at ").append(hz(m.angularFrequency())).toString();
    }

    /** " in spring 'pads'" style suffix; nothing for an empty label. */
    static String named(String prefix, String label) {
        return label.isEmpty() ? "" : prefix + label;
    }

    static String speedAndFrequency(double speed, double omega) {
        return "at " + rpm(speed) + " (" + hz(omega) + ")";
    }

    /**
     * The unit a limit was written in, recovered from its text ("4.5 mm/s" with si 0.0045 gives
     * mm/s with factor 0.001), so a value can be shown the way the user thinks of it. Falls back to
     * SI when the text cannot be read that way.
     */
    record UserUnit(double factor, String unit) {

        static UserUnit of(Quantity q, String siUnit) {
            Matcher m = NUMBER_THEN_UNIT.matcher(q.text());
            if (m.matches() && !m.group(2).isEmpty()) {
                double written = Double.parseDouble(m.group(1));
                double factor = q.si() / written;
                if (written != 0 && Double.isFinite(factor) && factor > 0) {
                    return new UserUnit(factor, m.group(2));
                }
            }
            return new UserUnit(1, siUnit);
        }

        String format(double si) {
            return sig(si / factor) + " " + unit;
        }
    }
}
