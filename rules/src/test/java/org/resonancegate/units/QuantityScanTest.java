package org.resonancegate.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * The hand-written scan of {@code "<number> <unit>"} against the same grammar written as a
 * regular expression (java.util.regex as the reference): for random text built from the pieces
 * that matter (signs, digits, points, exponents, spaces, line breaks, units), the parser accepts
 * exactly what the expression matches, and reads the number the expression captures, shifted
 * exactly by the unit's power of ten (JDK BigDecimal as the reference for the shift).
 */
class QuantityScanTest {

    /** Number, then spaces, then the unit up to trailing spaces; {@code .} stops at line breaks. */
    private static final Pattern GRAMMAR =
            Pattern.compile("\\s*([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)(\\s*)(.*?)\\s*");

    private static final String[] PIECES = {" ", "  ", "\t", "\n", "\r", "\u0085", "\u2028", "1", "2", "0", "9",
        ".", "e", "E", "+", "-", "k", "g", "kg", "mm", "m/s", "nan", "inf", "µm", "N/mm", ",5", "\u00A0", "²", "*",
        " mm", " kg", " mm/s", " Hz", " rpm", " µm"};

    private static String pieces(Random random) {
        StringBuilder b = new StringBuilder();
        for (int k = random.nextInt(7); k > 0; k--) {
            b.append(PIECES[random.nextInt(PIECES.length)]);
        }
        return b.toString();
    }

    /** Mostly well-formed: spaces, sign, digits, fraction, exponent, spaces, unit, spaces, each part maybe missing. */
    private static String shaped(Random random) {
        String[] units = {"kg", "mm", "µm", "m/s", "mm/s", "N/mm", "MN/m", "g", "t", "in", "lb", "x"};
        StringBuilder b = new StringBuilder();
        b.append(" ".repeat(random.nextInt(2)));
        b.append(random.nextInt(4) == 0 ? (random.nextBoolean() ? "-" : "+") : "");
        b.append(random.nextInt(5) == 0 ? "" : Integer.toString(random.nextInt(100_000)));
        b.append(random.nextInt(3) == 0 ? "" : "." + (random.nextInt(4) == 0 ? "" : Integer.toString(random.nextInt(1000))));
        b.append(random.nextInt(4) == 0 ? "e" + (random.nextBoolean() ? "-" : "") + random.nextInt(12) : "");
        b.append(random.nextInt(6) == 0 ? "" : " ");
        b.append(units[random.nextInt(units.length)]);
        b.append(random.nextInt(4) == 0 ? PIECES[random.nextInt(PIECES.length)] : "");
        return b.toString();
    }

    @Test
    void acceptsWhatTheGrammarMatchesAndReadsItsNumber() {
        Random random = new Random(4711L);
        Dimension[] dimensions = {Dimension.MASS, Dimension.LENGTH, Dimension.VELOCITY, Dimension.STIFFNESS};
        int values = 0;
        for (int i = 0; i < 200_000; i++) {
            String text = (random.nextBoolean() ? pieces(random) : shaped(random)).replace('\u00A0', ' ');
            Dimension dimension = dimensions[random.nextInt(dimensions.length)];
            UnitParse parsed = QuantityParser.parse(text, dimension, "value");
            Matcher m = GRAMMAR.matcher(text);
            if (!m.matches()) {
                UnitParse.Problem problem = assertInstanceOf(UnitParse.Problem.class, parsed, () -> "[" + text + "]");
                assertTrue(problem.message().contains("does not start with a number")
                        || problem.message().contains("is not a finite number"), problem::message);
                continue;
            }
            boolean spaced = !m.group(2).isEmpty();
            var unit = UnitTable.find(m.group(3), dimension);
            if (spaced && unit.isPresent()) {
                values++;
                double factor = unit.get().factor();
                int exponent = (int) Math.round(Math.log10(factor));
                // a power of ten shifts the decimal point exactly; other factors (lb, in) multiply
                double expected = factor == Math.pow(10, exponent)
                        ? new BigDecimal(m.group(1)).scaleByPowerOfTen(exponent).doubleValue()
                        : Double.parseDouble(m.group(1)) * factor;
                UnitParse.Value value = assertInstanceOf(UnitParse.Value.class, parsed, () -> "[" + text + "]");
                assertEquals(expected, value.si(), () -> "[" + text + "]");
            } else {
                assertInstanceOf(UnitParse.Problem.class, parsed, () -> "[" + text + "]");
            }
        }
        assertTrue(values > 5_000, "too few well-formed values drawn: " + values);
    }
}
