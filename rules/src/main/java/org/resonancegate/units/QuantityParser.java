package org.resonancegate.units;

import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

/**
 * Reads {@code "<number> <unit>"} strings ({@code "1850 kg"}, {@code "2.4 MN/m"}) into SI values,
 * checking the unit against the dimension the key expects. Messages name the key and list the
 * units that would be accepted, so a user can fix the value from the message alone.
 */
public final class QuantityParser {

    private static final Pattern NUMBER_AND_UNIT =
            Pattern.compile("\\s*([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)(\\s*)(.*?)\\s*");
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
        String text = written.replace('\u00A0', ' ').replace('\u202F', ' ').replace('\u2009', ' ');
        // the words of a message are put together only when there is one: every value of every spec passes here
        String what = UnitTable.describe(expected);
        if (NON_FINITE.matcher(text).matches()) {
            String example = exampleFor(expected, "1");
            return new UnitParse.Problem("\"" + key + "\": \"" + text + "\" is not a finite number; write " + article(what)
                    + what + " such as \"" + example + "\"");
        }
        Matcher m = NUMBER_AND_UNIT.matcher(text);
        if (!m.matches()) {
            String example = exampleFor(expected, "1");
            String accepted = UnitTable.acceptedSymbols(expected);
            return new UnitParse.Problem("\"" + key + "\": \"" + text + "\" does not start with a number; write " + article(what)
                    + what + " as \"<number> <unit>\", such as \"" + example + "\" (units: " + accepted + ")");
        }
        String number = m.group(1);
        String unitText = m.group(3);
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
        if (m.group(2).isEmpty()) {
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

    /** "a " or "an ", by the first letter of the word that follows. */
    public static String article(String word) {
        return "aeiou".indexOf(Character.toLowerCase(word.charAt(0))) >= 0 ? "an " : "a ";
    }

    /** An example for messages, with the number the user wrote and the dimension's usual unit. */
    public static String exampleFor(Dimension dimension, String number) {
        return number + " " + UnitTable.usualSymbol(dimension);
    }
}
