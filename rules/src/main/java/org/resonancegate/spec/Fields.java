package org.resonancegate.spec;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Supplier;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.resonancegate.units.Dimension;
import org.resonancegate.units.QuantityParser;
import org.resonancegate.units.Suggestions;
import org.resonancegate.units.UnitParse;
import org.resonancegate.units.UnitTable;

/**
 * Typed access to the values of a JSON tree. Each accessor either returns the value or records a
 * diagnostic (found what, would accept what) and returns empty, so reading goes on and every
 * problem of a file is reported in one pass.
 */
final class Fields {

    private static final Pattern PERCENT = Pattern.compile("\\s*([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)(\\s*)%\\s*");

    private Fields() {
    }

    /**
     * Reports every key of {@code object} that is not in {@code accepted}, with a "did you mean"
     * hint where one is close and the list of accepted keys.
     *
     * @param where what the object is, for the message ("the model", "criterion \"SEP\"")
     */
    static void checkKeys(JsonNode.JsonObject object, String where, List<String> accepted, Problems problems) {
        checkKeys(object, () -> where, accepted, problems);
    }

    /** As {@link #checkKeys(JsonNode.JsonObject, String, List, Problems)}, wording {@code where} only for a message. */
    static void checkKeys(JsonNode.JsonObject object, Supplier<String> where, List<String> accepted, Problems problems) {
        for (JsonNode.Member member : object.members()) {
            if (!accepted.contains(member.key())) {
                StringBuilder message = new StringBuilder("unknown key \"" + member.key() + "\" in " + where.get());
                Optional<String> meant = Suggestions.closest(member.key(), accepted);
                meant.ifPresent(s -> message.append(" (did you mean \"").append(s).append("\"?)"));
                message.append("; accepted keys: ").append(String.join(", ", accepted));
                problems.unknownKey(member.keyLocation(), object.location(), meant, message.toString());
            }
        }
    }

    /** The value under {@code key}, or a diagnostic at the object saying it is missing. */
    static Optional<JsonNode> required(JsonNode.JsonObject object, String key, String where, String example,
                                       Problems problems) {
        return required(object, key, () -> where, () -> example, problems);
    }

    /**
     * As {@link #required(JsonNode.JsonObject, String, String, String, Problems)}, wording
     * {@code where} and {@code example} only for a message: the hot paths read every coordinate
     * and axis of every spec through here.
     */
    static Optional<JsonNode> required(JsonNode.JsonObject object, String key, Supplier<String> where,
                                       Supplier<String> example, Problems problems) {
        Optional<JsonNode> value = object.get(key);
        if (value.isEmpty()) {
            problems.missingKey(object.location(), key, "missing required key \"" + key + "\" in " + where.get()
                    + "; add it, for example " + example.get());
        }
        return value;
    }

    static Optional<JsonNode.JsonObject> object(JsonNode node, String key, String example, Problems problems) {
        if (node instanceof JsonNode.JsonObject o) {
            return Optional.of(o);
        }
        wrongType(node, key, "an object", example, problems);
        return Optional.empty();
    }

    static Optional<JsonNode.JsonArray> array(JsonNode node, String key, String example, Problems problems) {
        if (node instanceof JsonNode.JsonArray a) {
            return Optional.of(a);
        }
        wrongType(node, key, "a list", example, problems);
        return Optional.empty();
    }

    static Optional<String> string(JsonNode node, String key, String example, Problems problems) {
        if (node instanceof JsonNode.JsonString s) {
            return Optional.of(s.value());
        }
        wrongType(node, key, "a string", example, problems);
        return Optional.empty();
    }

    /** A string with at least one non-blank character. */
    static Optional<String> text(JsonNode node, String key, String example, Problems problems) {
        Optional<String> s = string(node, key, example, problems);
        if (s.isPresent() && s.get().isBlank()) {
            problems.add(node.location(), "\"" + key + "\" is empty; write " + example);
            return Optional.empty();
        }
        return s;
    }

    /** A finite JSON number. */
    static Optional<Double> number(JsonNode node, String key, String example, Problems problems) {
        if (node instanceof JsonNode.JsonNumber n) {
            if (!Double.isFinite(n.value())) {
                problems.add(node.location(), "\"" + key + "\": the number " + n.text()
                        + " is too large to hold (beyond ±1.8e308); write a finite number, such as " + example);
                return Optional.empty();
            }
            return Optional.of(n.value());
        }
        wrongType(node, key, "a number", example, problems);
        return Optional.empty();
    }

    static void wrongType(JsonNode node, String key, String expected, String example, Problems problems) {
        problems.add(node.location(), "\"" + key + "\" must be " + expected + ", such as " + example
                + "; found " + node.typeName());
    }

    /** A {@code "<number> <unit>"} string of the expected dimension. */
    static Optional<Quantity> quantity(JsonNode node, String key, Dimension dimension, Problems problems) {
        if (node instanceof JsonNode.JsonNumber n) {
            problems.add(node.location(), "\"" + key + "\": the bare number " + n.text() + " has no unit; "
                    + QuantityParser.article(UnitTable.describe(dimension)) + UnitTable.describe(dimension)
                    + " is written as a string with its unit, such as \""
                    + QuantityParser.exampleFor(dimension, n.text()) + "\" (units: "
                    + UnitTable.acceptedSymbols(dimension) + ")");
            return Optional.empty();
        }
        if (!(node instanceof JsonNode.JsonString s)) {
            wrongType(node, key, "a string with a unit", "\"" + QuantityParser.exampleFor(dimension, "1") + "\"", problems);
            return Optional.empty();
        }
        UnitParse parsed = QuantityParser.parse(s.value(), dimension, key);
        if (parsed instanceof UnitParse.Value v) {
            return Optional.of(new Quantity(v.si(), dimension, s.value(), node.location()));
        }
        problems.add(node.location(), ((UnitParse.Problem) parsed).message());
        return Optional.empty();
    }

    /** A quantity that must be greater than zero (a mass, a stiffness, a limit). */
    static Optional<Quantity> positive(JsonNode node, String key, Dimension dimension, Problems problems) {
        Optional<Quantity> q = quantity(node, key, dimension, problems);
        if (q.isPresent() && !(q.get().si() > 0)) {
            problems.add(node.location(), "\"" + key + "\" must be greater than zero; found \"" + q.get().text() + "\"");
            return Optional.empty();
        }
        return q;
    }

    /**
     * A positive quantity of {@code primary} dimension, or of {@code alternative} when the text reads
     * as that (a criterion's limit is a length on a translation line and an angle in torsion, and a
     * profile is read before the model that uses it is known). A problem is reported against the
     * primary dimension.
     */
    static Optional<Quantity> positiveEither(JsonNode node, String key, Dimension primary, Dimension alternative,
                                             Problems problems) {
        if (node instanceof JsonNode.JsonString s
                && QuantityParser.parse(s.value(), alternative, key) instanceof UnitParse.Value) {
            return positive(node, key, alternative, problems);
        }
        return positive(node, key, primary, problems);
    }

    /** A quantity that must not be negative (a speed). */
    static Optional<Quantity> nonNegative(JsonNode node, String key, Dimension dimension, Problems problems) {
        Optional<Quantity> q = quantity(node, key, dimension, problems);
        if (q.isPresent() && q.get().si() < 0) {
            problems.add(node.location(), "\"" + key + "\" must not be negative; found \"" + q.get().text() + "\"");
            return Optional.empty();
        }
        return q;
    }

    /** A number ({@code 0.05}) or a percentage string ({@code "5 %"}), as a plain fraction. */
    static Optional<Dimensionless> dimensionless(JsonNode node, String key, String example, Problems problems) {
        if (node instanceof JsonNode.JsonNumber n) {
            return number(node, key, example, problems).map(v -> new Dimensionless(v, n.text(), node.location()));
        }
        if (node instanceof JsonNode.JsonString s) {
            Matcher m = PERCENT.matcher(s.value());
            if (m.matches() && m.group(2).isEmpty()) {
                problems.add(node.location(), "\"" + key + "\": write a space before the percent sign, such as \""
                        + m.group(1) + " %\"; found \"" + s.value() + "\"");
                return Optional.empty();
            }
            if (m.matches()) {
                double percent = Double.parseDouble(m.group(1));
                if (!Double.isFinite(percent)) {
                    problems.add(node.location(), "\"" + key + "\": \"" + s.value() + "\" is too large to hold; write a finite percentage");
                    return Optional.empty();
                }
                return Optional.of(new Dimensionless(percent / 100, s.value(), node.location()));
            }
            if (s.value().trim().matches("[+-]?\\d+,\\d+\\s*%?")) {
                problems.add(node.location(), "\"" + key + "\": \"" + s.value() + "\" uses a decimal comma; write the"
                        + " decimal point as '.', such as \"" + s.value().trim().replace(',', '.') + "\"");
                return Optional.empty();
            }
            problems.add(node.location(), "\"" + key + "\" is dimensionless: write a number or a percentage, such as "
                    + example + "; found \"" + s.value() + "\"");
            return Optional.empty();
        }
        wrongType(node, key, "a number or a percentage string", example, problems);
        return Optional.empty();
    }

    /** A dimensionless value within a range; the bounds and their openness are stated in the message. */
    static Optional<Dimensionless> dimensionlessIn(JsonNode node, String key, String example, double low,
                                                   boolean lowIncluded, double high, boolean highIncluded,
                                                   String why, Problems problems) {
        Optional<Dimensionless> d = dimensionless(node, key, example, problems);
        if (d.isEmpty()) {
            return d;
        }
        double v = d.get().value();
        boolean ok = (lowIncluded ? v >= low : v > low) && (highIncluded ? v <= high : v < high);
        if (!ok) {
            String range = (lowIncluded ? "[" : "(") + format(low) + ", "
                    + (Double.isInfinite(high) ? "∞" : format(high)) + (highIncluded ? "]" : ")");
            problems.add(node.location(), "\"" + key + "\" must lie in " + range + why + "; found " + d.get().text());
            return Optional.empty();
        }
        return d;
    }

    private static String format(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }

    /** Of {@code keys}, the ones present in {@code object}, in the object's order. */
    static List<JsonNode.Member> present(JsonNode.JsonObject object, List<String> keys) {
        List<JsonNode.Member> found = new ArrayList<>();
        for (JsonNode.Member m : object.members()) {
            if (keys.contains(m.key())) {
                found.add(m);
            }
        }
        return found;
    }

    /**
     * Exactly one of {@code keys} must be present: the one, or a diagnostic (none: at the object;
     * several: at the second).
     */
    static Optional<JsonNode.Member> exactlyOne(JsonNode.JsonObject object, List<String> keys, String where,
                                               Problems problems) {
        List<JsonNode.Member> found = present(object, keys);
        String choices = String.join(", ", keys.stream().map(k -> "\"" + k + "\"").toList());
        if (found.isEmpty()) {
            problems.add(object.location(), where + " needs exactly one of " + choices + "; found none");
            return Optional.empty();
        }
        if (found.size() > 1) {
            JsonNode.Member first = found.get(0);
            for (JsonNode.Member extra : found.subList(1, found.size())) {
                problems.add(extra.keyLocation(), where + " takes only one of " + choices + "; \"" + extra.key()
                        + "\" conflicts with \"" + first.key() + "\" at line " + first.keyLocation().line()
                        + "; keep one");
            }
            return Optional.empty();
        }
        return Optional.of(found.get(0));
    }
}
