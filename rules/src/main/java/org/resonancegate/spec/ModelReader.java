package org.resonancegate.spec;

import java.util.List;
import java.util.Optional;

import org.resonancegate.units.Dimension;
import org.resonancegate.units.Suggestions;

/** Reads the {@code model} object: {@code single} here, {@code lumped} and {@code rigid-body} by their readers. */
final class ModelReader {

    static final List<String> SUPPORTED_KINDS = List.of("single", "lumped", "rigid-body");
    static final List<String> SINGLE_KEYS = List.of("kind", "mass", "stiffness", "staticDeflection",
            "naturalFrequency", "damping");
    static final List<String> STIFFNESS_FORMS = List.of("stiffness", "staticDeflection", "naturalFrequency");
    static final List<String> DAMPING_FORMS = List.of("ratio", "lossFactor", "q", "logDecrement", "coefficient");

    private static final String EXAMPLE =
            "{\"kind\": \"single\", \"mass\": \"1850 kg\", \"stiffness\": \"2.4 MN/m\", \"damping\": {\"ratio\": 0.05}}";

    private ModelReader() {
    }

    static Optional<Model> read(JsonNode node, Problems problems) {
        Optional<JsonNode.JsonObject> object = Fields.object(node, "model", EXAMPLE, problems);
        if (object.isEmpty()) {
            return Optional.empty();
        }
        JsonNode.JsonObject model = object.get();
        Optional<String> kind = Fields.required(model, "kind", "the model", "\"kind\": \"single\"", problems)
                .flatMap(k -> Fields.text(k, "kind", "\"single\"", problems));
        if (kind.isEmpty()) {
            return Optional.empty();
        }
        JsonNode kindNode = model.get("kind").orElseThrow();
        return switch (kind.get()) {
            case "single" -> readSingle(model, problems).map(m -> m);
            case "lumped" -> LumpedReader.read(model, problems).map(m -> m);
            case "rigid-body" -> RigidBodyReader.read(model, problems).map(m -> m);
            default -> {
                StringBuilder message = new StringBuilder("unknown model kind \"" + kind.get() + "\"");
                Suggestions.closest(kind.get(), SUPPORTED_KINDS)
                        .ifPresent(s -> message.append(" (did you mean \"").append(s).append("\"?)"));
                message.append("; accepted: \"single\" (one mass on one spring), \"lumped\" (masses or inertias along"
                        + " one line) and \"rigid-body\" (a rigid machine on mounts)");
                problems.add(kindNode.location(), message.toString());
                yield Optional.empty();
            }
        };
    }

    private static Optional<Model.Single> readSingle(JsonNode.JsonObject model, Problems problems) {
        int before = problems.count();
        Fields.checkKeys(model, "a single model", SINGLE_KEYS, problems);
        Optional<Quantity> mass = Fields.required(model, "mass", "the model", "\"mass\": \"1850 kg\"", problems)
                .flatMap(n -> Fields.positive(n, "mass", Dimension.MASS, problems));
        Optional<Stiffness> stiffness = Fields.exactlyOne(model, STIFFNESS_FORMS, "a single model", problems)
                .flatMap(m -> readStiffness(m, problems));
        Optional<Damping> damping = Fields.required(model, "damping", "the model",
                        "\"damping\": {\"ratio\": 0.05} (an undamped model would claim an infinite amplitude at resonance)",
                        problems)
                .flatMap(n -> readDamping(n, problems));
        if (problems.count() != before || mass.isEmpty() || stiffness.isEmpty() || damping.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new Model.Single(mass.get(), stiffness.get(), damping.get(), model.location()));
    }

    private static Optional<Stiffness> readStiffness(JsonNode.Member member, Problems problems) {
        return switch (member.key()) {
            case "stiffness" -> Fields.positive(member.value(), "stiffness", Dimension.STIFFNESS, problems)
                    .map(Stiffness.Direct::new);
            case "staticDeflection" -> Fields.positive(member.value(), "staticDeflection", Dimension.LENGTH, problems)
                    .map(Stiffness.FromStaticDeflection::new);
            case "naturalFrequency" -> Fields.positive(member.value(), "naturalFrequency", Dimension.FREQUENCY, problems)
                    .map(Stiffness.FromNaturalFrequency::new);
            default -> throw new IllegalStateException("not a stiffness form: " + member.key());
        };
    }

    /**
     * Damping must be positive: zero would claim an infinite amplitude at resonance. A
     * {@code ratio} is accepted in (0, 1) only: ζ ≥ 1 is an overdamped system, which has no
     * resonance to speak of and almost always means a percentage was typed as a number. The
     * other ratio forms are held to the same ζ < 1 (η < 2, Q > 0.5; a log decrement is always
     * below it).
     */
    static Optional<Damping> readDamping(JsonNode node, Problems problems) {
        Optional<JsonNode.JsonObject> object = Fields.object(node, "damping", "{\"ratio\": 0.05}", problems);
        if (object.isEmpty()) {
            return Optional.empty();
        }
        JsonNode.JsonObject damping = object.get();
        Fields.checkKeys(damping, "damping", DAMPING_FORMS, problems);
        Optional<JsonNode.Member> form = Fields.exactlyOne(damping, DAMPING_FORMS, "damping", problems);
        if (form.isEmpty()) {
            return Optional.empty();
        }
        JsonNode value = form.get().value();
        SourceLocation at = damping.location();
        String positive = " (damping must be stated and positive; an undamped model would claim an infinite amplitude at resonance)";
        return switch (form.get().key()) {
            case "ratio" -> Fields.dimensionlessIn(value, "ratio", "0.05 or \"5 %\"", 0, false, 1, false,
                            " (a ratio of 1 or more is overdamped; 5 % is written 0.05 or \"5 %\")", problems)
                    .map(d -> new Damping.Ratio(d, at));
            case "lossFactor" -> Fields.dimensionlessIn(value, "lossFactor", "0.1", 0, false, 2, false,
                            " (η = 2ζ: a loss factor of 2 or more is an overdamped system, ζ ≥ 1)", problems)
                    .map(d -> new Damping.LossFactor(d, at));
            case "q" -> Fields.dimensionlessIn(value, "q", "10", 0.5, false, Double.POSITIVE_INFINITY, false,
                            " (Q = 1/(2ζ): a Q of 0.5 or less is an overdamped system, ζ ≥ 1; did you mean a"
                                    + " damping ratio, {\"ratio\": ...}?)", problems)
                    .map(d -> new Damping.QualityFactor(d, at));
            case "logDecrement" -> Fields.dimensionlessIn(value, "logDecrement", "0.3", 0, false,
                            Double.POSITIVE_INFINITY, false, positive, problems)
                    .map(d -> new Damping.LogDecrement(d, at));
            case "coefficient" -> Fields.positive(value, "coefficient", Dimension.DAMPING_COEFFICIENT, problems)
                    .map(q -> new Damping.Coefficient(q, at));
            default -> throw new IllegalStateException("not a damping form: " + form.get().key());
        };
    }
}
