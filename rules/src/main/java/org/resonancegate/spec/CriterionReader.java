package org.resonancegate.spec;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.resonancegate.units.Dimension;
import org.resonancegate.units.Suggestions;

/** Reads a {@code criteria} list, from a spec or from a profile (the rules are the same). */
final class CriterionReader {

    private static final List<String> COMMON = List.of("id", "rule", "severity");
    private static final Map<String, List<String>> KEYS = Map.of(
            "separation", List.of("margin"),
            "isolation", List.of("maxTransmissibility", "minEfficiency"),
            "displacement", List.of("max", "measure"),
            "velocity", List.of("max", "measure"),
            "transmitted-force", List.of("max"),
            "static-deflection", List.of("min", "max"));
    /** Keys that name a point in a lumped or rigid-body model; checked against the model by {@link CriterionFit}. */
    private static final List<String> PLACEMENT = List.of("at", "axis");
    /** Rules that look at the response at a point ({@code at}) and, on a rigid body, along an axis. */
    private static final List<Rule> AT_RULES = List.of(Rule.ISOLATION, Rule.DISPLACEMENT, Rule.VELOCITY);
    private static final List<String> RULES = Arrays.stream(Rule.values()).map(Rule::key).toList();
    private static final String EXAMPLE = "{\"id\": \"SEP\", \"rule\": \"separation\", \"margin\": \"20 %\"}";

    private CriterionReader() {
    }

    /** The criteria of a list; ids must be unique within it. Empty when any has a diagnostic. */
    static Optional<List<Criterion>> read(JsonNode node, Problems problems) {
        Optional<JsonNode.JsonArray> array = Fields.array(node, "criteria", "[" + EXAMPLE + "]", problems);
        if (array.isEmpty()) {
            return Optional.empty();
        }
        int before = problems.count();
        List<Criterion> criteria = new ArrayList<>();
        Map<String, SourceLocation> ids = new HashMap<>();
        for (JsonNode item : array.get().items()) {
            Optional<Criterion> c = readOne(item, problems);
            if (c.isPresent()) {
                SourceLocation first = ids.putIfAbsent(c.get().id(), c.get().location());
                if (first != null) {
                    problems.add(c.get().location(), "criterion id \"" + c.get().id() + "\" is used twice in this file"
                            + " (first at line " + first.line() + "); reports and waivers refer to criteria by id,"
                            + " give each its own");
                } else {
                    criteria.add(c.get());
                }
            }
        }
        return problems.count() == before ? Optional.of(criteria) : Optional.empty();
    }

    private static Optional<Criterion> readOne(JsonNode node, Problems problems) {
        Optional<JsonNode.JsonObject> object = Fields.object(node, "criteria", EXAMPLE, problems);
        if (object.isEmpty()) {
            return Optional.empty();
        }
        JsonNode.JsonObject c = object.get();
        int before = problems.count();
        Optional<String> id = Fields.required(c, "id", "a criterion", "\"id\": \"SEP\"", problems)
                .flatMap(n -> Fields.text(n, "id", "\"SEP\"", problems));
        Optional<String> ruleText = Fields.required(c, "rule", "a criterion", "\"rule\": \"separation\"", problems)
                .flatMap(n -> Fields.text(n, "rule", "\"separation\"", problems));
        String where = id.map(i -> "criterion \"" + i + "\"").orElse("a criterion");
        Optional<Rule> rule = ruleText.flatMap(r -> {
            Optional<Rule> found = Arrays.stream(Rule.values()).filter(x -> x.key().equals(r)).findFirst();
            if (found.isEmpty()) {
                StringBuilder message = new StringBuilder("unknown rule \"" + r + "\" in " + where);
                Suggestions.closest(r, RULES).ifPresent(s -> message.append(" (did you mean \"").append(s).append("\"?)"));
                message.append("; accepted: ").append(String.join(", ", RULES));
                problems.add(c.get("rule").orElseThrow().location(), message.toString());
            }
            return found;
        });
        Optional<Severity> severity = c.get("severity").isPresent()
                ? severity(c.get("severity").get(), problems)
                : Optional.of(Severity.ERROR);
        if (rule.isEmpty()) {
            return Optional.empty();
        }
        List<String> accepted = new ArrayList<>(COMMON);
        accepted.addAll(KEYS.get(rule.get().key()));
        JsonNode.JsonObject withoutPlacement = new JsonNode.JsonObject(
                c.members().stream().filter(m -> !PLACEMENT.contains(m.key())).toList(), c.location());
        Fields.checkKeys(withoutPlacement, where + " (rule \"" + rule.get().key() + "\")", accepted, problems);
        if (id.isEmpty() || severity.isEmpty()) {
            return Optional.empty();
        }
        Optional<Optional<ResponsePoint>> point = at(c, rule.get(), where, problems);
        Optional<Optional<Axis>> forceAxis = rule.get() == Rule.TRANSMITTED_FORCE && c.has("axis")
                ? Geometry.axis(c.get("axis").get(), problems).map(Optional::of)
                : Optional.of(Optional.empty());
        if (point.isEmpty() || forceAxis.isEmpty()) {
            return Optional.empty();
        }
        Optional<Criterion> result = rule(rule.get(), c, id.get(), severity.get(), where, point.get(),
                forceAxis.get(), problems);
        return problems.count() == before ? result : Optional.empty();
    }

    private static Optional<Severity> severity(JsonNode node, Problems problems) {
        Optional<String> text = Fields.string(node, "severity", "\"error\" or \"warning\"", problems);
        if (text.isEmpty()) {
            return Optional.empty();
        }
        for (Severity s : Severity.values()) {
            if (s.key().equals(text.get())) {
                return Optional.of(s);
            }
        }
        StringBuilder message = new StringBuilder("unknown severity \"" + text.get() + "\"");
        List<String> keys = Arrays.stream(Severity.values()).map(Severity::key).toList();
        Suggestions.closest(text.get(), keys).ifPresent(s -> message.append(" (did you mean \"").append(s).append("\"?)"));
        message.append("; accepted: error (the default; fails the build), warning");
        problems.add(node.location(), message.toString());
        return Optional.empty();
    }

    /**
     * The {@code at} of a criterion as written, before the model is known (a profile serves several
     * specs): a mass name, or a point with an optional {@code axis}. Empty when written wrong.
     */
    private static Optional<Optional<ResponsePoint>> at(JsonNode.JsonObject c, Rule rule, String where,
                                                        Problems problems) {
        Optional<JsonNode.Member> at = c.member("at");
        Optional<JsonNode.Member> axis = c.member("axis");
        int before = problems.count();
        if (!AT_RULES.contains(rule)) {
            at.ifPresent(m -> problems.add(m.keyLocation(), "\"at\" in " + where + ": rule \"" + rule.key()
                    + "\" " + (rule == Rule.SEPARATION ? "looks at the modes" : "holds for every spring or mount")
                    + ", not at a point; remove it"));
            if (rule != Rule.TRANSMITTED_FORCE) {
                axis.ifPresent(m -> problems.add(m.keyLocation(), "\"axis\" in " + where + ": rule \"" + rule.key()
                        + "\" takes no axis; remove it"));
            }
            return problems.count() == before ? Optional.of(Optional.empty()) : Optional.empty();
        }
        if (rule == Rule.ISOLATION) {
            axis.ifPresent(m -> problems.add(m.keyLocation(), "\"axis\" in " + where + ": isolation looks along the"
                    + " base motion's direction (or at the whole force into the ground); remove it"));
        } else if (axis.isPresent() && at.isEmpty()) {
            problems.add(axis.get().keyLocation(), "\"axis\" in " + where + " goes beside \"at\", the point on a rigid"
                    + " body it looks at, such as \"at\": " + Geometry.POINT_EXAMPLE + ", \"axis\": \"z\"");
        }
        if (at.isEmpty()) {
            return problems.count() == before ? Optional.of(Optional.empty()) : Optional.empty();
        }
        JsonNode value = at.get().value();
        Optional<ResponsePoint> point = Optional.empty();
        if (value instanceof JsonNode.JsonObject) {
            Optional<Point> p = Geometry.point(value, "at", problems);
            Optional<Optional<Axis>> a = rule == Rule.ISOLATION || axis.isEmpty() ? Optional.of(Optional.empty())
                    : Geometry.axis(axis.get().value(), problems).map(Optional::of);
            if (p.isPresent() && a.isPresent()) {
                point = Optional.of(new ResponsePoint.OnBody(p.get(), a.get()));
            }
        } else if (value instanceof JsonNode.JsonString) {
            if (rule != Rule.ISOLATION && axis.isPresent()) {
                problems.add(axis.get().keyLocation(), "\"axis\" in " + where + " goes with a point on a rigid body;"
                        + " a mass of a lumped line moves along the line only; remove it");
            }
            point = Fields.text(value, "at", "the name of a mass, such as \"pump\"", problems)
                    .map(n -> new ResponsePoint.Mass(n, value.location()));
        } else {
            Fields.wrongType(value, "at", "a mass name or a point", "\"pump\" (lumped) or " + Geometry.POINT_EXAMPLE
                    + " (rigid body)", problems);
        }
        return problems.count() == before && point.isPresent() ? Optional.of(point) : Optional.empty();
    }

    private static Optional<Criterion> rule(Rule rule, JsonNode.JsonObject c, String id, Severity severity,
                                            String where, Optional<ResponsePoint> point, Optional<Axis> forceAxis,
                                            Problems problems) {
        SourceLocation at = c.location();
        return switch (rule) {
            case SEPARATION -> Fields.required(c, "margin", where, "\"margin\": \"20 %\"", problems)
                    .flatMap(n -> Fields.dimensionlessIn(n, "margin", "0.2 or \"20 %\"", 0, false, 1, false,
                            " (β must stay outside (1 − margin, 1 + margin))", problems))
                    .map(m -> new Criterion.Separation(id, severity, m, at));
            case ISOLATION -> Fields.exactlyOne(c, List.of("maxTransmissibility", "minEfficiency"), where, problems)
                    .flatMap(m -> m.key().equals("maxTransmissibility")
                            ? Fields.dimensionlessIn(m.value(), m.key(), "0.1 or \"10 %\"", 0, false,
                                    Double.POSITIVE_INFINITY, false, "", problems)
                            .map(d -> (Criterion.IsolationLimit) new Criterion.IsolationLimit.MaxTransmissibility(d))
                            : Fields.dimensionlessIn(m.value(), m.key(), "0.9 or \"90 %\"", 0, false, 1, false,
                                    " (efficiency is 1 − T)", problems)
                            .map(d -> (Criterion.IsolationLimit) new Criterion.IsolationLimit.MinEfficiency(d)))
                    .map(limit -> new Criterion.Isolation(id, severity, limit, point, at));
            case DISPLACEMENT -> {
                Optional<Quantity> max = Fields.required(c, "max", where, "\"max\": \"0.2 mm\"", problems)
                        .flatMap(n -> Fields.positiveEither(n, "max", Dimension.LENGTH, Dimension.ANGLE, problems));
                Optional<Criterion.DisplacementMeasure> measure = measure(c, Criterion.DisplacementMeasure.values(),
                        Criterion.DisplacementMeasure.PEAK, Criterion.DisplacementMeasure::key, problems);
                yield max.isPresent() && measure.isPresent()
                        ? Optional.of(new Criterion.Displacement(id, severity, max.get(), measure.get(), point, at))
                        : Optional.empty();
            }
            case VELOCITY -> {
                Optional<Quantity> max = Fields.required(c, "max", where, "\"max\": \"4.5 mm/s\"", problems)
                        .flatMap(n -> Fields.positiveEither(n, "max", Dimension.VELOCITY, Dimension.ANGULAR_VELOCITY,
                                problems));
                Optional<Criterion.VelocityMeasure> measure = measure(c, Criterion.VelocityMeasure.values(),
                        Criterion.VelocityMeasure.RMS, Criterion.VelocityMeasure::key, problems);
                yield max.isPresent() && measure.isPresent()
                        ? Optional.of(new Criterion.Velocity(id, severity, max.get(), measure.get(), point, at))
                        : Optional.empty();
            }
            case TRANSMITTED_FORCE -> Fields.required(c, "max", where, "\"max\": \"2 kN\"", problems)
                    .flatMap(n -> Fields.positiveEither(n, "max", Dimension.FORCE, Dimension.TORQUE, problems))
                    .map(max -> new Criterion.TransmittedForce(id, severity, max, forceAxis, at));
            case STATIC_DEFLECTION -> staticDeflection(c, id, severity, where, problems);
        };
    }

    private static Optional<Criterion> staticDeflection(JsonNode.JsonObject c, String id, Severity severity,
                                                        String where, Problems problems) {
        if (!c.has("min") && !c.has("max")) {
            problems.add(c.location(), where + " needs \"min\", \"max\" or both, such as \"min\": \"3 mm\"; found neither");
            return Optional.empty();
        }
        int before = problems.count();
        Optional<Quantity> min = c.get("min").flatMap(n -> Fields.nonNegative(n, "min", Dimension.LENGTH, problems));
        Optional<Quantity> max = c.get("max").flatMap(n -> Fields.positive(n, "max", Dimension.LENGTH, problems));
        if (problems.count() != before) {
            return Optional.empty();
        }
        if (min.isPresent() && max.isPresent() && min.get().si() > max.get().si()) {
            problems.add(min.get().location(), where + ": \"min\" (" + min.get().text() + ") is above \"max\" ("
                    + max.get().text() + "); swap them");
            return Optional.empty();
        }
        return Optional.of(new Criterion.StaticDeflection(id, severity, min, max, c.location()));
    }

    private static <E> Optional<E> measure(JsonNode.JsonObject c, E[] values, E fallback,
                                           java.util.function.Function<E, String> key, Problems problems) {
        Optional<JsonNode> node = c.get("measure");
        if (node.isEmpty()) {
            return Optional.of(fallback);
        }
        List<String> keys = Arrays.stream(values).map(key).toList();
        Optional<String> text = Fields.string(node.get(), "measure", "\"" + keys.get(0) + "\"", problems);
        if (text.isEmpty()) {
            return Optional.empty();
        }
        for (E v : values) {
            if (key.apply(v).equals(text.get())) {
                return Optional.of(v);
            }
        }
        StringBuilder message = new StringBuilder("unknown measure \"" + text.get() + "\"");
        Suggestions.closest(text.get(), keys).ifPresent(s -> message.append(" (did you mean \"").append(s).append("\"?)"));
        message.append("; accepted: ").append(String.join(", ", keys)).append(" (default ")
                .append(key.apply(fallback)).append(")");
        problems.add(node.get().location(), message.toString());
        return Optional.empty();
    }
}
