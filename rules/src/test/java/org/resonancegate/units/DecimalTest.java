package org.resonancegate.units;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The quick rounding against the JDK's {@link BigDecimal}, the reference for rounding a double's
 * exact binary value: every result must be the same text and the same bits, ties included.
 */
class DecimalTest {

    private static final int[] DIGITS = {1, 2, 3, 4, 6, 12, 15};

    private static String reference(double x, int digits, RoundingMode ties) {
        if (!Double.isFinite(x)) {
            return Double.toString(x);
        }
        if (x == 0) {
            return "0";
        }
        String text = new BigDecimal(x).round(new MathContext(digits, ties)).stripTrailingZeros().toPlainString();
        return text.equals("-0") ? "0" : text;
    }

    /** Values of every kind a report shows, and the hard ones: exact halves, powers of ten, their neighbours. */
    private static double draw(Random random) {
        double x = switch (random.nextInt(7)) {
            case 0 -> random.nextDouble() * Math.pow(10, random.nextInt(60) - 30);
            case 1 -> (random.nextInt(200_000) + 0.5) * Math.pow(10, random.nextInt(20) - 10);
            case 2 -> random.nextInt(100_000) / (double) (1 << random.nextInt(12)); // exact binary halves
            case 3 -> Math.nextUp((random.nextInt(100_000) + 0.5) / 1000.0);
            case 4 -> Double.longBitsToDouble(random.nextLong());
            case 5 -> Math.pow(10, random.nextInt(50) - 25) * (random.nextBoolean() ? 1 : 1 + 2.3e-16);
            default -> (random.nextInt(20_000) + 1) * Math.pow(10, random.nextInt(10) - 5);
        };
        return random.nextBoolean() ? -x : x;
    }

    @Test
    void textIsWhatBigDecimalWrites() {
        Random random = new Random(20261202L);
        for (int i = 0; i < 300_000; i++) {
            double x = draw(random);
            int digits = DIGITS[random.nextInt(DIGITS.length)];
            assertEquals(reference(x, digits, RoundingMode.HALF_EVEN), Decimal.text(x, digits), () -> x + " to " + digits);
            assertEquals(reference(x, digits, RoundingMode.HALF_UP), Decimal.text(x, digits, RoundingMode.HALF_UP),
                    () -> x + " to " + digits + " half up");
        }
    }

    @Test
    void roundIsTheDoubleBigDecimalGives() {
        Random random = new Random(1202L);
        for (int i = 0; i < 300_000; i++) {
            double x = draw(random);
            int digits = DIGITS[random.nextInt(DIGITS.length)];
            double expected = x == 0 || !Double.isFinite(x) ? x
                    : new BigDecimal(x).round(new MathContext(digits, RoundingMode.HALF_UP)).doubleValue();
            assertEquals(Double.doubleToLongBits(expected), Double.doubleToLongBits(Decimal.round(x, digits)),
                    () -> x + " to " + digits);
        }
    }

    /** Decimal text shifted by a power of ten, as BigDecimal shifts it: bit for bit, zero always +0. */
    @Test
    void shiftedIsWhatBigDecimalGives() {
        Random random = new Random(3_1415L);
        for (int i = 0; i < 300_000; i++) {
            StringBuilder b = new StringBuilder(random.nextInt(4) == 0 ? "-" : "");
            b.append(random.nextInt(5) == 0 ? "0" : Long.toString(Math.abs(random.nextLong()) >>> random.nextInt(64)));
            if (random.nextBoolean()) {
                b.append('.').append("0".repeat(random.nextInt(4))).append(random.nextInt(1_000_000));
            }
            if (random.nextInt(6) == 0) {
                b.append('e').append(random.nextInt(40) - 20);
            }
            String number = b.toString();
            int exponent = random.nextInt(40) - 20;
            double reference = new BigDecimal(number).scaleByPowerOfTen(exponent).doubleValue();
            double expected = reference == 0 ? 0.0 : reference;
            assertEquals(Double.doubleToLongBits(expected), Double.doubleToLongBits(Decimal.shifted(number, exponent)),
                    () -> number + " e" + exponent);
        }
    }

    /** Hand-picked: the ties go the way each mode says (0.125 is exact in binary; 2.675 is just below a half). */
    @Test
    void tiesAndNearTies() {
        assertEquals("0.12", Decimal.text(0.125, 2));
        assertEquals("0.13", Decimal.text(0.125, 2, RoundingMode.HALF_UP));
        assertEquals("2.67", Decimal.text(2.675, 3));
        assertEquals("10000", Decimal.text(9999.7, 4));
        assertEquals("0.0071", Decimal.text(0.0070999999999999995, 4));
        assertEquals("-12340", Decimal.text(-12_345.0, 4));
        assertEquals("0", Decimal.text(-0.0, 4));
        assertEquals("NaN", Decimal.text(Double.NaN, 4));
    }
}
