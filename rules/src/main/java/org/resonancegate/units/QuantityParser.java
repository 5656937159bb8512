package org.resonancegate.units;

import java.util.List;
import java.util.Optional;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

/**
 * Reads {@code "<number> <unit>"} strings ({@code "1850 kg"}, {@code "2.4 MN/m"}) into SI values,
 * checking the unit against the dimension the key expects. Messages name the key and list the
 * units that would be accepted, so a user can fix the value from the message alone.
 */
public final class QuantityParser {

    private static final Pattern NON_FINITE =
            Pattern.compile("\\s*[+-]?(?:nan|inf|infinity|∞)\\b.*", Pattern.CASE_INSENSITIVE);

    private QuantityParser() {
    }

    /**
     * Reads {@code text} as a quantity of dimension {@code expected}.
     *
     * @param key the key the text was written under, named in messages
     */
    public static UnitParse parse(String written, Dimension expected, String key) {
        // The SI style puts a (narrow) no-break space between number and unit; editors paste those too.
        String text = hasOddSpace(written)
                ? written.replace('\u00A0', ' ').replace('\u202F', ' ').replace('\u2009', ' ') : written;
        // every value of every spec passes here: a hand-written scan instead of a regex, and the
        // words of a message are put together only when there is one
        String what = UnitTable.describe(expected);
        Scan m = Scan.of(text);
        if (m == null) {
            if (NON_FINITE.matcher(text).matches()) {
                String example = exampleFor(expected, "1");
                return new UnitParse.Problem("\"" + key + "\": \"" + text + "\" is not a finite number; write " + article(what)
                        + what + " such as \"" + example + "\"");
            }
            String example = exampleFor(expected, "1");
            String accepted = UnitTable.acceptedSymbols(expected);
            return new UnitParse.Problem("\"" + key + "\": \"" + text + "\" does not start with a number; write " + article(what)
                    + what + " as \"<number> <unit>\", such as \"" + example + "\" (units: " + accepted + ")");
        }
        String number = m.number();
        String unitText = m.unit();
        double value = Double.parseDouble(number);
        if (Double.isInfinite(value)) {
            return new UnitParse.Problem("\"" + key + "\": the number " + number
                    + " is too large to hold (beyond ±1.8e308); write a finite " + what);
        }
        if (unitText.isEmpty()) {
            String accepted = UnitTable.acceptedSymbols(expected);
            return new UnitParse.Problem("\"" + key + "\": \"" + text + "\" has no unit; " + article(what) + what
                    + " needs one, such as \"" + exampleFor(expected, number) + "\" (units: " + accepted + ")");
        }
        if (unitText.length() > 1 && unitText.charAt(0) == ',' && unitText.charAt(1) >= '0' && unitText.charAt(1) <= '9') {
            return new UnitParse.Problem("\"" + key + "\": \"" + text + "\" uses a decimal comma; write the decimal"
                    + " point as '.', such as \"" + number + "." + unitText.substring(1) + "\"");
        }
        if (!m.spaced()) {
            // The format writes number, space, unit; a file that runs them together would read
            // differently elsewhere (and "5e3" against "5 e3" shows why the space matters).
            return new UnitParse.Problem("\"" + key + "\": \"" + text + "\" needs a space between the number and"
                    + " the unit, such as \"" + number + " " + unitText + "\"");
        }
        Optional<Unit> unit = UnitTable.find(unitText, expected);
        if (unit.isPresent()) {
            double si = unit.get().toSi(number);
            if (Double.isInfinite(si)) {
                return new UnitParse.Problem("\"" + key + "\": \"" + text + "\" is too large to hold in SI");
            }
            return new UnitParse.Value(si, unit.get());
        }
        String accepted = UnitTable.acceptedSymbols(expected);
        List<Unit> others = UnitTable.findAny(unitText);
        if (!others.isEmpty()) {
            String is = others.stream().map(u -> UnitTable.describe(u.dimension()))
                    .distinct().collect(Collectors.joining(" or "));
            String hint = expected == Dimension.ACCELERATION && unitText.equals("g")
                    ? " ('g' is the gram; standard gravity is written 'gn')" : "";
            return new UnitParse.Problem("\"" + key + "\": the unit '" + unitText + "' is " + article(is) + is
                    + ", but \"" + key + "\" expects " + article(what) + what + "; accepted units: " + accepted + hint);
        }
        StringBuilder message = new StringBuilder("\"" + key + "\": unknown unit '" + unitText + "' for " + article(what) + what
                + "; accepted units: " + accepted);
        List<String> spellings = UnitTable.units(expected).stream().map(Unit::symbol).toList();
        Optional<String> near = Suggestions.closest(unitText, spellings);
        near.ifPresent(s -> message.append(" (did you mean '").append(s).append("'?)"));
        return new UnitParse.Problem(message.toString());
    }

    private static boolean hasOddSpace(String s) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '\u00A0' || c == '\u202F' || c == '\u2009') {
                return true;
            }
        }
        return false;
    }

    /** "a " or "an ", by the first letter of the word that follows. */
    public static String article(String word) {
        return "aeiou".indexOf(Character.toLowerCase(word.charAt(0))) >= 0 ? "an " : "a ";
    }

    /** An example for messages, with the number the user wrote and the dimension's usual unit. */
    public static String exampleFor(Dimension dimension, String number) {
        return number + " " + UnitTable.usualSymbol(dimension);
    }

    /**
     * {@code text} split as {@code <spaces><number><spaces><unit><spaces>}, the number being
     * {@code [+-]digits[.digits][e[+-]digits]} or {@code [+-].digits[e[+-]digits]}; null when it
     * does not start with a number, or when the unit holds a line break.
     *
     * @param spaced whether a space separates the number from the unit
     */
    private record Scan(String number, boolean spaced, String unit) {

        static Scan of(String text) {
            int n = text.length();
            int i = skipSpaces(text, 0);
            int start = i;
            if (i < n && (text.charAt(i) == '+' || text.charAt(i) == '-')) {
                i++;
            }
            int intDigits = digits(text, i);
            i += intDigits;
            if (intDigits > 0) {
                if (i < n && text.charAt(i) == '.') {
                    i += 1 + digits(text, i + 1);
                }
            } else {
                int fraction = i < n && text.charAt(i) == '.' ? digits(text, i + 1) : 0;
                if (fraction == 0) {
                    return null;
                }
                i += 1 + fraction;
            }
            if (i < n && (text.charAt(i) == 'e' || text.charAt(i) == 'E')) {
                int j = i + 1;
                if (j < n && (text.charAt(j) == '+' || text.charAt(j) == '-')) {
                    j++;
                }
                int exponent = digits(text, j);
                if (exponent > 0) {
                    i = j + exponent;
                }
            }
            String number = text.substring(start, i);
            int unitStart = skipSpaces(text, i);
            int end = n;
            while (end > unitStart && isSpace(text.charAt(end - 1))) {
                end--;
            }
            for (int k = unitStart; k < end; k++) {
                if (isLineBreak(text.charAt(k))) {
                    return null;
                }
            }
            return new Scan(number, unitStart > i, text.substring(unitStart, end));
        }

        private static int digits(String text, int from) {
            int i = from;
            while (i < text.length() && text.charAt(i) >= '0' && text.charAt(i) <= '9') {
                i++;
            }
            return i - from;
        }

        private static int skipSpaces(String text, int from) {
            int i = from;
            while (i < text.length() && isSpace(text.charAt(i))) {
                i++;
            }
            return i;
        }

        /** The characters a regular expression's {@code \s} matches. */
        private static boolean isSpace(char c) {
            return c == ' ' || c == '\t' || c == '\n' || c == 0x0B || c == '\f' || c == '\r';
        }

        /** The line terminators a regular expression's {@code .} does not match. */
        private static boolean isLineBreak(char c) {
            return c == '\n' || c == '\r' || c == '\u0085' || c == '\u2028' || c == '\u2029';
        }
    }
}
