package org.resonancegate.spec;

import java.nio.file.Path;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.resonancegate.units.Dimension;

/** Validates the top level of one spec file (format 1) into a {@link Spec}. */
final class SpecReader {

    static final String SPEC_FORMAT = "resonance-gate/1";
    static final String PROFILE_FORMAT = "resonance-gate-profile/1";
    static final List<String> TOP_KEYS = List.of("format", "id", "title", "revision", "model", "operation",
            "excitations", "criteria", "profiles", "tolerances", "waivers", "$schema");

    /** What reading one spec file gave: its id, if it got that far, and the spec if nothing was wrong. */
    record Outcome(Optional<String> id, Optional<SourceLocation> idLocation, Optional<Spec> spec) {
    }

    private SpecReader() {
    }

    static Outcome read(JsonNode.JsonObject root, String file, Path specPath, ProfileResolver resolver,
                        Problems problems) {
        Optional<JsonNode> formatNode = Fields.required(root, "format", "the spec",
                "\"format\": \"" + SPEC_FORMAT + "\"", problems);
        Optional<String> format = formatNode.flatMap(n -> Fields.string(n, "format", "\"" + SPEC_FORMAT + "\"", problems));
        if (format.isPresent() && !format.get().equals(SPEC_FORMAT)) {
            problems.add(formatNode.get().location(), "unsupported format \"" + format.get() + "\"; this version reads \""
                    + SPEC_FORMAT + "\" (equipment specs) and \"" + PROFILE_FORMAT + "\" (criteria profiles)");
            // The id is still worth knowing (reports name the item), though nothing else is read.
            Optional<JsonNode> idNode = root.get("id").filter(n -> n instanceof JsonNode.JsonString s && !s.value().isBlank());
            return new Outcome(idNode.map(n -> ((JsonNode.JsonString) n).value()), idNode.map(JsonNode::location),
                    Optional.empty());
        }
        Fields.checkKeys(root, "the spec", TOP_KEYS, problems);

        Optional<JsonNode> idNode = Fields.required(root, "id", "the spec", "\"id\": \"CHW-P-02\"", problems);
        Optional<String> id = idNode.flatMap(n -> Fields.text(n, "id", "\"CHW-P-02\" (the item's tag)", problems));
        Optional<SourceLocation> idLocation = id.isPresent() ? idNode.map(JsonNode::location) : Optional.empty();
        Optional<String> title = root.get("title").flatMap(n -> Fields.string(n, "title", "\"Chilled water pump 2\"", problems));
        Optional<String> revision = root.get("revision").flatMap(n -> Fields.string(n, "revision", "\"C\"", problems));
        // "$schema" is for editors; the format says the engine ignores its value, whatever its type.

        ModelShape shape = ModelShape.of(root.get("model"));
        Optional<Model> model = Fields.required(root, "model", "the spec",
                        "\"model\": {\"kind\": \"single\", \"mass\": \"1850 kg\", ...}", problems)
                .flatMap(n -> ModelReader.read(n, problems));
        Optional<Operation> operation = Fields.required(root, "operation", "the spec",
                        "\"operation\": {\"speed\": {\"min\": \"900 rpm\", \"max\": \"1480 rpm\"}}", problems)
                .flatMap(n -> operation(n, problems));
        Optional<List<Excitation>> excitations = Fields.required(root, "excitations", "the spec",
                        "\"excitations\": [{\"name\": \"impeller\", \"kind\": \"unbalance\", ...}]", problems)
                .flatMap(n -> ExcitationReader.read(n, shape, problems));

        Optional<JsonNode> criteriaNode = Fields.required(root, "criteria", "the spec",
                "\"criteria\": [{\"id\": \"SEP\", \"rule\": \"separation\", \"margin\": \"20 %\"}]"
                        + " (it may be [] when \"profiles\" supply criteria)", problems);
        Optional<List<Criterion>> own = criteriaNode.flatMap(n -> CriterionReader.read(n, problems));
        Optional<List<ProfileRef>> refs = root.get("profiles").isPresent()
                ? ProfileRef.readList(root.get("profiles").get(), problems)
                : Optional.of(List.of());
        boolean profilesComplete = refs.isPresent();
        List<Criterion> criteria = new ArrayList<>(own.orElse(List.of()));
        if (refs.isPresent() && !refs.get().isEmpty()) {
            Set<String> ownIds = new HashSet<>();
            criteria.forEach(c -> ownIds.add(c.id()));
            ProfileResolver.Resolution resolved = resolver.resolve(refs.get(), specPath.getParent(), ownIds, problems);
            criteria.addAll(resolved.criteria());
            profilesComplete = resolved.complete();
        }
        if (own.isPresent() && profilesComplete && criteria.isEmpty()) {
            problems.add(criteriaNode.get().location(), "no criteria in force: \"criteria\" is empty and no profile"
                    + " supplies any; add one, such as {\"id\": \"SEP\", \"rule\": \"separation\", \"margin\": \"20 %\"}");
        }

        boolean baseMotion = root.get("excitations").filter(n -> n instanceof JsonNode.JsonArray).stream()
                .flatMap(n -> ((JsonNode.JsonArray) n).items().stream())
                .anyMatch(e -> e instanceof JsonNode.JsonObject o && o.get("kind").orElse(null)
                        instanceof JsonNode.JsonString k && k.value().equals("base-motion"));
        criteria = CriterionFit.fit(criteria, shape, baseMotion, file, problems);

        Tolerances tolerances = root.get("tolerances").flatMap(n -> tolerances(n, problems)).orElse(Tolerances.none());
        Set<String> inForce = new HashSet<>();
        criteria.forEach(c -> inForce.add(c.id()));
        // Waivers are checked against the criteria in force only when that set is fully known.
        boolean knowAll = own.isPresent() && profilesComplete;
        List<Waiver> waivers = root.get("waivers")
                .flatMap(n -> waivers(n, inForce, knowAll, problems)).orElse(List.of());

        if (!problems.isEmpty() || id.isEmpty() || model.isEmpty() || operation.isEmpty() || excitations.isEmpty()) {
            return new Outcome(id, idLocation, Optional.empty());
        }
        return new Outcome(id, idLocation, Optional.of(new Spec(file, id.get(), title, revision, model.get(),
                operation.get(), excitations.get(), criteria, tolerances, waivers)));
    }

    /** {@code {"speed": {"min": Q, "max": Q}}} or {@code {"speed": Q}} for a fixed-speed machine. */
    static Optional<Operation> operation(JsonNode node, Problems problems) {
        String example = "{\"speed\": {\"min\": \"900 rpm\", \"max\": \"1480 rpm\"}} or {\"speed\": \"1480 rpm\"}";
        Optional<JsonNode.JsonObject> object = Fields.object(node, "operation", example, problems);
        if (object.isEmpty()) {
            return Optional.empty();
        }
        JsonNode.JsonObject op = object.get();
        Fields.checkKeys(op, "\"operation\"", List.of("speed"), problems);
        Optional<JsonNode> speed = Fields.required(op, "speed", "\"operation\"", "\"speed\": \"1480 rpm\"", problems);
        if (speed.isEmpty()) {
            return Optional.empty();
        }
        if (speed.get() instanceof JsonNode.JsonObject range) {
            Fields.checkKeys(range, "\"speed\"", List.of("min", "max"), problems);
            Optional<Quantity> min = Fields.required(range, "min", "\"speed\"", "\"min\": \"900 rpm\"", problems)
                    .flatMap(n -> Fields.nonNegative(n, "min", Dimension.SPEED, problems));
            // A range may start at standstill, but a machine that never turns has nothing to
            // judge, and a balance grade's unbalance M·G/Ω_max needs a top speed above zero.
            Optional<Quantity> max = Fields.required(range, "max", "\"speed\"", "\"max\": \"1480 rpm\"", problems)
                    .flatMap(n -> Fields.positive(n, "max", Dimension.SPEED, problems));
            if (min.isEmpty() || max.isEmpty()) {
                return Optional.empty();
            }
            if (min.get().si() > max.get().si()) {
                problems.add(min.get().location(), "speed \"min\" (" + min.get().text() + ") is above \"max\" ("
                        + max.get().text() + "); swap them, or write {\"speed\": \"" + max.get().text()
                        + "\"} for a fixed-speed machine");
                return Optional.empty();
            }
            return Optional.of(new Operation(min.get(), max.get(), false, op.location()));
        }
        return Fields.positive(speed.get(), "speed", Dimension.SPEED, problems)
                .map(s -> new Operation(s, s, true, op.location()));
    }

    /** Symmetric relative tolerances in [0, 1): a tolerance of 100 % would allow a zero mass or stiffness. */
    static Optional<Tolerances> tolerances(JsonNode node, Problems problems) {
        Optional<JsonNode.JsonObject> object = Fields.object(node, "tolerances",
                "{\"stiffness\": \"15 %\", \"mass\": \"5 %\"}", problems);
        if (object.isEmpty()) {
            return Optional.empty();
        }
        JsonNode.JsonObject t = object.get();
        Fields.checkKeys(t, "\"tolerances\"", List.of("stiffness", "mass"), problems);
        String why = " (a relative tolerance; 100 % or more would allow a zero or negative value)";
        Optional<Dimensionless> stiffness = t.get("stiffness").flatMap(n ->
                Fields.dimensionlessIn(n, "stiffness", "0.15 or \"15 %\"", 0, true, 1, false, why, problems));
        Optional<Dimensionless> mass = t.get("mass").flatMap(n ->
                Fields.dimensionlessIn(n, "mass", "0.05 or \"5 %\"", 0, true, 1, false, why, problems));
        return Optional.of(new Tolerances(stiffness, mass));
    }

    static Optional<List<Waiver>> waivers(JsonNode node, Set<String> inForce, boolean knowAll, Problems problems) {
        String example = "{\"criterion\": \"SEP\", \"reason\": \"accepted at design review 14\", \"expires\": \"2027-03-31\"}";
        Optional<JsonNode.JsonArray> array = Fields.array(node, "waivers", "[" + example + "]", problems);
        if (array.isEmpty()) {
            return Optional.empty();
        }
        List<Waiver> waivers = new ArrayList<>();
        Map<String, SourceLocation> seen = new HashMap<>();
        for (JsonNode item : array.get().items()) {
            Optional<JsonNode.JsonObject> object = Fields.object(item, "waivers", example, problems);
            if (object.isEmpty()) {
                continue;
            }
            JsonNode.JsonObject w = object.get();
            Fields.checkKeys(w, "a waiver", List.of("criterion", "reason", "expires"), problems);
            Optional<JsonNode> criterionNode = Fields.required(w, "criterion", "a waiver", "\"criterion\": \"SEP\"", problems);
            Optional<String> criterion = criterionNode.flatMap(n -> Fields.text(n, "criterion", "\"SEP\"", problems));
            Optional<String> reason = Fields.required(w, "reason", "a waiver",
                            "\"reason\": \"accepted at design review 14\"", problems)
                    .flatMap(n -> Fields.text(n, "reason", "why the deviation is accepted", problems));
            Optional<LocalDate> expires = Fields.required(w, "expires", "a waiver", "\"expires\": \"2027-03-31\"", problems)
                    .flatMap(n -> date(n, problems));
            if (criterion.isPresent()) {
                SourceLocation at = criterionNode.get().location();
                if (knowAll && !inForce.contains(criterion.get())) {
                    List<String> ids = inForce.stream().sorted().toList();
                    problems.add(at, "the waiver names criterion \"" + criterion.get() + "\", which is not in force for"
                            + " this spec; criteria in force: " + (ids.isEmpty() ? "none" : String.join(", ", ids)));
                }
                SourceLocation first = seen.putIfAbsent(criterion.get(), at);
                if (first != null) {
                    problems.add(at, "a second waiver for criterion \"" + criterion.get() + "\" (the first at line "
                            + first.line() + "); keep one, with the reason and expiry that hold");
                }
            }
            if (criterion.isPresent() && reason.isPresent() && expires.isPresent()) {
                waivers.add(new Waiver(criterion.get(), reason.get(), expires.get(), w.location()));
            }
        }
        return Optional.of(waivers);
    }

    private static Optional<LocalDate> date(JsonNode node, Problems problems) {
        Optional<String> text = Fields.string(node, "expires", "\"2027-03-31\"", problems);
        if (text.isEmpty()) {
            return Optional.empty();
        }
        try {
            return Optional.of(LocalDate.parse(text.get()));
        } catch (DateTimeParseException e) {
            problems.add(node.location(), "\"expires\" must be a date written year-month-day (ISO 8601), such as"
                    + " \"2027-03-31\"; found \"" + text.get() + "\"");
            return Optional.empty();
        }
    }
}
