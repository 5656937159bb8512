package org.resonancegate.spec;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

import org.resonancegate.units.Dimension;
import org.resonancegate.units.Suggestions;

/** Reads the geometric values of lumped and rigid-body specs: points, directions and axes. */
final class Geometry {

    static final List<String> XYZ = List.of("x", "y", "z");
    static final String POINT_EXAMPLE = "{\"x\": \"0.4 m\", \"y\": \"0 m\", \"z\": \"0.9 m\"}";
    static final String DIRECTION_EXAMPLE = "{\"x\": 0, \"y\": 0, \"z\": 1}";

    private Geometry() {
    }

    /** A position {@code {"x", "y", "z"}}, each a length; all three are needed. */
    static Optional<Point> point(JsonNode node, String key, Problems problems) {
        Optional<JsonNode.JsonObject> object = Fields.object(node, key, POINT_EXAMPLE, problems);
        if (object.isEmpty()) {
            return Optional.empty();
        }
        JsonNode.JsonObject p = object.get();
        Fields.checkKeys(p, () -> "\"" + key + "\"", XYZ, problems);
        Optional<Quantity> x = coordinate(p, key, "x", problems);
        Optional<Quantity> y = coordinate(p, key, "y", problems);
        Optional<Quantity> z = coordinate(p, key, "z", problems);
        if (x.isEmpty() || y.isEmpty() || z.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new Point(x.get(), y.get(), z.get(), p.location()));
    }

    private static Optional<Quantity> coordinate(JsonNode.JsonObject p, String key, String axis, Problems problems) {
        return Fields.required(p, axis, () -> "\"" + key + "\"",
                        () -> "\"" + axis + "\": \"0 m\" (all three coordinates are needed)", problems)
                .flatMap(n -> Fields.quantity(n, axis, Dimension.LENGTH, problems));
    }

    /** A direction {@code {"x", "y", "z"}} of plain numbers, not all zero; kept normalised. */
    static Optional<Direction> direction(JsonNode node, String key, Problems problems) {
        Optional<JsonNode.JsonObject> object = Fields.object(node, key, DIRECTION_EXAMPLE, problems);
        if (object.isEmpty()) {
            return Optional.empty();
        }
        JsonNode.JsonObject d = object.get();
        Fields.checkKeys(d, () -> "\"" + key + "\"", XYZ, problems);
        double[] v = new double[3];
        boolean ok = true;
        for (int i = 0; i < 3; i++) {
            String axis = XYZ.get(i);
            Optional<Double> c = Fields.required(d, axis, () -> "\"" + key + "\"",
                            () -> "\"" + axis + "\": 0 (a direction takes all three components, plain numbers)", problems)
                    .flatMap(n -> Fields.number(n, axis, "0 or 1 (a direction is a plain vector, no unit)", problems));
            ok &= c.isPresent();
            v[i] = c.orElse(0.0);
        }
        if (!ok) {
            return Optional.empty();
        }
        double n = Math.sqrt(v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
        if (!(n > 0) || !Double.isFinite(n)) {
            problems.add(d.location(), "\"" + key + "\" must have a non-zero, finite length, such as "
                    + DIRECTION_EXAMPLE + " for straight up; found " + Arrays.toString(v));
            return Optional.empty();
        }
        return Optional.of(new Direction(v[0], v[1], v[2], d.location()));
    }

    /** A shaft axis, {@code "x"} … {@code "-z"}: the signed axis a rotating force turns about. */
    static Optional<ShaftAxis> shaftAxis(JsonNode node, Problems problems) {
        List<String> keys = Arrays.stream(ShaftAxis.values()).map(ShaftAxis::key).toList();
        Optional<String> text = Fields.string(node, "axis", "\"x\" or \"-z\"", problems);
        if (text.isEmpty()) {
            return Optional.empty();
        }
        for (ShaftAxis a : ShaftAxis.values()) {
            if (a.key().equals(text.get())) {
                return Optional.of(a);
            }
        }
        problems.add(node.location(), unknown("shaft axis", text.get(), keys)
                + " (the force turns about it by the right-hand rule; \"-x\" turns the other way)");
        return Optional.empty();
    }

    /** An unsigned axis, {@code "x"}, {@code "y"} or {@code "z"}, as criteria name one. */
    static Optional<Axis> axis(JsonNode node, Problems problems) {
        List<String> keys = Arrays.stream(Axis.values()).map(Axis::key).toList();
        Optional<String> text = Fields.string(node, "axis", "\"z\"", problems);
        if (text.isEmpty()) {
            return Optional.empty();
        }
        for (Axis a : Axis.values()) {
            if (a.key().equals(text.get())) {
                return Optional.of(a);
            }
        }
        String hint = text.get().startsWith("-") ? " (a criterion's axis has no sign: the amplitude is the same both ways)" : "";
        problems.add(node.location(), unknown("axis", text.get(), keys) + hint);
        return Optional.empty();
    }

    static String unknown(String what, String written, List<String> accepted) {
        StringBuilder message = new StringBuilder("unknown " + what + " \"" + written + "\"");
        Suggestions.closest(written, accepted).ifPresent(s -> message.append(" (did you mean \"").append(s).append("\"?)"));
        message.append("; accepted: ").append(String.join(", ", accepted));
        return message.toString();
    }

    /** "unknown mass "pmp" (did you mean "pump"?); the masses are: frame, pump". */
    static String unknownName(String what, String written, List<String> known, String knownAre) {
        StringBuilder message = new StringBuilder(what + " \"" + written + "\" is not defined");
        Suggestions.closest(written, known).ifPresent(s -> message.append(" (did you mean \"").append(s).append("\"?)"));
        message.append("; ").append(knownAre).append(": ").append(names(known));
        return message.toString();
    }

    /** Names for a message: all of a short list, the first few of a long one. */
    static String names(List<String> names) {
        int shown = 12;
        return names.size() <= shown ? String.join(", ", names)
                : String.join(", ", names.subList(0, shown)) + " and " + (names.size() - shown) + " more";
    }
}
