package org.resonancegate.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.OptionalInt;

/**
 * A double rounded to a number of significant decimal digits, exactly as {@link BigDecimal}
 * rounds the double's exact binary value, but without building that value when the answer is
 * clear from double arithmetic: every number in every message and report passes here, and the
 * exact expansion of a double runs to fifty digits.
 *
 * <p>Why the quick way is exact: scaling by an exact power of ten (10⁰ … 10²² are doubles) costs
 * one rounding, an error below {@code 10^digits × 2⁻⁵³}. Unless the scaled value lies that close
 * to a half, it rounds the same way as the exact value; near a half (a tie, or almost one) the
 * exact way decides.
 */
public final class Decimal {

    private static final double[] POWERS_OF_TEN = new double[23];
    /** The doubles nearest 10⁻ⁱ (not exact, but what a unit factor such as 1e-3 is). */
    private static final double[] NEGATIVE_POWERS_OF_TEN = new double[23];

    static {
        for (int i = 0; i < POWERS_OF_TEN.length; i++) {
            POWERS_OF_TEN[i] = Double.parseDouble("1e" + i);
            NEGATIVE_POWERS_OF_TEN[i] = Double.parseDouble("1e-" + i);
        }
    }

    /** The digits kept and the power of ten they stand at: the value is {@code ±digits × 10^exponent}. */
    private record Rounded(boolean negative, long digits, int exponent) {
    }

    private Decimal() {
    }

    /**
     * {@code x} rounded half-even to {@code digits} significant digits, as plain text without
     * trailing zeros ({@code 0.0070999 → "0.0071"}, {@code 12345 → "12340"} for 4 digits);
     * "0" for zero of either sign, {@link Double#toString} for NaN and infinities.
     */
    public static String text(double x, int digits) {
        return text(x, digits, RoundingMode.HALF_EVEN);
    }

    /**
     * As {@link #text(double, int)}, rounding ties by {@code ties}: {@link RoundingMode#HALF_EVEN}
     * or {@link RoundingMode#HALF_UP} (the two differ only at an exact half).
     */
    public static String text(double x, int digits, RoundingMode ties) {
        if (ties != RoundingMode.HALF_EVEN && ties != RoundingMode.HALF_UP) {
            throw new IllegalArgumentException("rounds to nearest only, not " + ties);
        }
        if (!Double.isFinite(x)) {
            return Double.toString(x);
        }
        if (x == 0) {
            return "0";
        }
        Rounded r = quick(x, digits);
        if (r == null) {
            String exact = new BigDecimal(x).round(new MathContext(digits, ties))
                    .stripTrailingZeros().toPlainString();
            return exact.equals("-0") ? "0" : exact;
        }
        long m = r.digits();
        int k = r.exponent();
        while (m % 10 == 0) {
            m /= 10;
            k++;
        }
        String s = Long.toString(m);
        StringBuilder b = new StringBuilder(s.length() + Math.abs(k) + 3);
        if (r.negative()) {
            b.append('-');
        }
        if (k >= 0) {
            b.append(s);
            b.append("0".repeat(k));
        } else if (s.length() > -k) {
            b.append(s, 0, s.length() + k).append('.').append(s, s.length() + k, s.length());
        } else {
            b.append("0.").append("0".repeat(-k - s.length())).append(s);
        }
        return b.toString();
    }

    /**
     * {@code x} rounded half-up to {@code digits} significant digits, back as the nearest double
     * (what {@code new BigDecimal(x).round(new MathContext(digits)).doubleValue()} gives).
     */
    public static double round(double x, int digits) {
        if (!Double.isFinite(x) || x == 0) {
            return x;
        }
        Rounded r = quick(x, digits);
        if (r == null) {
            return new BigDecimal(x).round(new MathContext(digits, RoundingMode.HALF_UP)).doubleValue();
        }
        // digits < 2⁵³ and the power of ten are exact, so this is the one rounding BigDecimal does too
        double magnitude = r.exponent() >= 0 ? r.digits() * POWERS_OF_TEN[r.exponent()]
                : r.digits() / POWERS_OF_TEN[-r.exponent()];
        return r.negative() ? -magnitude : magnitude;
    }

    /**
     * The double nearest to {@code number × 10^exponent}, {@code number} being decimal text such as
     * {@code "-7.25"} or {@code "1.5e3"}: the decimal point moves exactly and the result is rounded
     * once, as {@code new BigDecimal(number).scaleByPowerOfTen(exponent).doubleValue()} gives it
     * (with +0 for a zero of either sign). Up to 15 significant digits and a net power of ten
     * within ±22 this is one exact division or multiplication; beyond, the text is parsed.
     */
    public static double shifted(String number, int exponent) {
        long digits = 0;
        int count = 0;
        int scale = 0;
        boolean negative = false;
        boolean point = false;
        int i = 0;
        int n = number.length();
        if (i < n && (number.charAt(i) == '-' || number.charAt(i) == '+')) {
            negative = number.charAt(i) == '-';
            i++;
        }
        for (; i < n; i++) {
            char c = number.charAt(i);
            if (c >= '0' && c <= '9') {
                if (digits == 0 && c == '0') {
                    if (point) {
                        scale--;
                    }
                    continue; // leading zeros carry no digits
                }
                if (++count > 15) {
                    return viaText(number, exponent);
                }
                digits = digits * 10 + (c - '0');
                if (point) {
                    scale--;
                }
            } else if (c == '.' && !point) {
                point = true;
            } else {
                return viaText(number, exponent); // an exponent, or anything unexpected
            }
        }
        if (digits == 0) {
            return 0.0;
        }
        int k = scale + exponent;
        if (Math.abs(k) >= POWERS_OF_TEN.length) {
            return viaText(number, exponent);
        }
        double magnitude = k >= 0 ? digits * POWERS_OF_TEN[k] : digits / POWERS_OF_TEN[-k];
        return negative ? -magnitude : magnitude;
    }

    private static double viaText(String number, int exponent) {
        double v = new BigDecimal(number).scaleByPowerOfTen(exponent).doubleValue();
        return v == 0 ? 0.0 : v;
    }

    /**
     * The {@code e} for which {@code x} is the double written {@code 1e<e>} (|e| ≤ 22), if any: the
     * factors by which a decimal unit ({@code mm}, {@code kN/m}) shifts the decimal point.
     */
    public static OptionalInt powerOfTen(double x) {
        for (int i = 0; i < POWERS_OF_TEN.length; i++) {
            if (x == POWERS_OF_TEN[i]) {
                return OptionalInt.of(i);
            }
            if (x == NEGATIVE_POWERS_OF_TEN[i]) {
                return OptionalInt.of(-i);
            }
        }
        return OptionalInt.empty();
    }

    /** The rounding when double arithmetic settles it; null when only the exact value can. */
    private static Rounded quick(double x, int digits) {
        if (digits < 1 || digits > 15) {
            return null;
        }
        double a = Math.abs(x);
        double low = POWERS_OF_TEN[digits - 1];
        double high = POWERS_OF_TEN[digits];
        int k = (int) Math.floor(Math.log10(a)) - digits + 1;
        for (int attempt = 0; attempt < 3; attempt++) {
            if (Math.abs(k) >= POWERS_OF_TEN.length) {
                return null;
            }
            double scaled = k >= 0 ? a / POWERS_OF_TEN[k] : a * POWERS_OF_TEN[-k];
            if (scaled < low) {
                k--;
            } else if (scaled >= high) {
                k++;
            } else {
                double floor = Math.floor(scaled);
                if (Math.abs(scaled - floor - 0.5) <= high * 1e-15) {
                    return null; // at or next to a half: the exact value decides
                }
                long m = (long) floor + (scaled - floor > 0.5 ? 1 : 0);
                if (m == (long) high) { // 9999.7 → 10000: one digit more, one power up
                    m /= 10;
                    k++;
                }
                return k < POWERS_OF_TEN.length ? new Rounded(x < 0, m, k) : null;
            }
        }
        return null;
    }
}
