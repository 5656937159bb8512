package org.resonancegate.units;

import java.util.OptionalInt;

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
        OptionalInt exponent = Decimal.powerOfTen(factor);
        if (exponent.isPresent()) {
            return Decimal.shifted(number, exponent.getAsInt()); // "-0 mm" is zero: a decimal has no sign of zero
        }
        return Double.parseDouble(number) * factor;
    }
}
