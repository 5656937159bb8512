package org.resonancegate.spec;

import java.util.List;
import java.util.Optional;

import org.resonancegate.units.Dimension;

/**
 * Reads the damping a spring or mount carries itself: {@code {"coefficient": Q}} (a dashpot in
 * parallel) or {@code {"lossFactor": η}} (hysteretic). A spring takes one value; a mount one value
 * for all axes or {@code {"x", "y", "z"}}.
 */
final class ElementDampingReader {

    static final List<String> FORMS = List.of("coefficient", "lossFactor");

    private ElementDampingReader() {
    }

    /** A spring's damping: one value. */
    static Optional<ElementDamping> spring(JsonNode node, Dimension coefficient, String where, Problems problems) {
        Optional<JsonNode.Member> form = form(node, where, "{\"coefficient\": \"2 kN·s/m\"} or {\"lossFactor\": 0.1}",
                problems);
        if (form.isEmpty()) {
            return Optional.empty();
        }
        JsonNode value = form.get().value();
        if (value instanceof JsonNode.JsonObject) {
            problems.add(value.location(), "\"" + form.get().key() + "\" of " + where + " is one value: a spring acts"
                    + " along the line only (per-axis values are for the mounts of a rigid body)");
            return Optional.empty();
        }
        return one(value, form.get().key(), coefficient, problems).map(v -> {
            AxisValues values = AxisValues.all(v, value.location());
            return form.get().key().equals("coefficient") ? new ElementDamping.Viscous(values)
                    : new ElementDamping.Hysteretic(values);
        });
    }

    /**
     * A mount's damping: one value or {@code {"x", "y", "z"}}. An axis may be left undamped (zero)
     * only where the mount has no stiffness: elsewhere it would let a mode ring without limit.
     */
    static Optional<ElementDamping> mount(JsonNode node, AxisValues stiffness, String where, Problems problems) {
        Optional<JsonNode.Member> form = form(node, where,
                "{\"coefficient\": \"2 kN·s/m\"}, {\"lossFactor\": 0.1} or {\"lossFactor\": {\"x\": 0.1, \"y\": 0.1, \"z\": 0.15}}",
                problems);
        if (form.isEmpty()) {
            return Optional.empty();
        }
        String key = form.get().key();
        JsonNode value = form.get().value();
        Optional<AxisValues> values;
        if (value instanceof JsonNode.JsonObject perAxis) {
            Fields.checkKeys(perAxis, "\"" + key + "\" of " + where, Geometry.XYZ, problems);
            double[] v = new double[3];
            boolean ok = true;
            for (int i = 0; i < 3; i++) {
                String axis = Geometry.XYZ.get(i);
                Optional<JsonNode> n = Fields.required(perAxis, axis, "\"" + key + "\" of " + where,
                        "\"" + axis + "\": " + (key.equals("coefficient") ? "\"2 kN·s/m\"" : "0.1"), problems);
                Optional<Double> d = n.flatMap(x -> nonNegative(x, axis, key, problems));
                if (d.isPresent() && d.get() == 0 && stiffness.get(Axis.values()[i]) > 0) {
                    problems.add(n.get().location(), "\"" + key + "\" of " + where + " along " + axis + " is zero, but the"
                            + " mount is stiff along " + axis + "; an undamped axis would claim an infinite amplitude"
                            + " at resonance: give it a positive value");
                    d = Optional.empty();
                }
                ok &= d.isPresent();
                v[i] = d.orElse(0.0);
            }
            values = ok ? Optional.of(new AxisValues(v[0], v[1], v[2], perAxis.location())) : Optional.empty();
        } else {
            values = one(value, key, Dimension.DAMPING_COEFFICIENT, problems).map(v -> AxisValues.all(v, value.location()));
        }
        return values.map(v -> key.equals("coefficient") ? new ElementDamping.Viscous(v) : new ElementDamping.Hysteretic(v));
    }

    private static Optional<JsonNode.Member> form(JsonNode node, String where, String example, Problems problems) {
        Optional<JsonNode.JsonObject> object = Fields.object(node, "damping", example, problems);
        if (object.isEmpty()) {
            return Optional.empty();
        }
        JsonNode.JsonObject d = object.get();
        List<String> modal = List.of("ratio", "q", "logDecrement");
        for (JsonNode.Member m : d.members()) {
            if (modal.contains(m.key())) {
                problems.add(m.keyLocation(), "\"" + m.key() + "\" is a modal damping and belongs in the model's"
                        + " \"damping\"; " + where + " takes {\"coefficient\": …} (a dashpot) or {\"lossFactor\": η}");
            }
        }
        JsonNode.JsonObject rest = new JsonNode.JsonObject(
                d.members().stream().filter(m -> !modal.contains(m.key())).toList(), d.location());
        Fields.checkKeys(rest, "the damping of " + where, FORMS, problems);
        if (rest.members().size() < d.members().size()) {
            return Optional.empty();
        }
        return Fields.exactlyOne(d, FORMS, "the damping of " + where, problems);
    }

    /** One positive value: a coefficient in {@code dimension}, or a loss factor. */
    private static Optional<Double> one(JsonNode value, String key, Dimension coefficient, Problems problems) {
        String why = " (damping must be positive; an undamped element would claim an infinite amplitude at resonance)";
        if (key.equals("coefficient")) {
            return Fields.positive(value, "coefficient", coefficient, problems).map(Quantity::si);
        }
        return Fields.dimensionlessIn(value, "lossFactor", "0.1", 0, false, Double.POSITIVE_INFINITY, false, why, problems)
                .map(Dimensionless::value);
    }

    private static Optional<Double> nonNegative(JsonNode value, String axis, String key, Problems problems) {
        if (key.equals("coefficient")) {
            return Fields.nonNegative(value, axis, Dimension.DAMPING_COEFFICIENT, problems).map(Quantity::si);
        }
        return Fields.dimensionlessIn(value, axis, "0.1", 0, true, Double.POSITIVE_INFINITY, false,
                " (a loss factor)", problems).map(Dimensionless::value);
    }
}
