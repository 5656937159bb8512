package org.resonancegate.units;

/**
 * One accepted unit spelling: its symbol as a user writes it, the dimension it measures and the
 * factor that turns a value in it into SI ({@code si = value × factor}).
 */
public record Unit(String symbol, Dimension dimension, double factor) {

    /**
     * The value written as {@code number} (decimal text), in SI. A decimal factor (mm, µm, mm/s,
     * MN/m, …) shifts the decimal point exactly, so "7.1 mm/s" becomes the double nearest 0.0071
     * rather than 7.1 × 0.001, whose rounding would show as 0.0070999999999999995 in reports.
     */
    public double toSi(String number) {
        int exponent = factor == 1 ? 0 : (int) Math.round(Math.log10(factor));
        if (factor == 1 || factor == Double.parseDouble("1e" + exponent)) {
            // both ways round the exact decimal once; the text way avoids a BigDecimal per value
            double si = number.indexOf('e') < 0 && number.indexOf('E') < 0
                    ? Double.parseDouble(exponent == 0 ? number : number + "e" + exponent)
                    : new java.math.BigDecimal(number).scaleByPowerOfTen(exponent).doubleValue();
            return si == 0 ? 0.0 : si; // "-0 mm" is zero, as a decimal number has no sign of zero
        }
        return Double.parseDouble(number) * factor;
    }
}
