package org.resonancegate.spec;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * What the excitation and criterion readers need to know of the model, taken from the raw
 * {@code model} object so they can check placements even when the model itself has problems:
 * its kind, a lumped line's motion and the names of its masses.
 *
 * @param massCount the number of entries in {@code masses}, or −1 when that list is unreadable
 * @param masses    the names written in {@code masses}, in order
 */
record ModelShape(Kind kind, Optional<Model.Motion> motion, int massCount, List<String> masses) {

    enum Kind { SINGLE, LUMPED, RIGID_BODY, UNKNOWN }

    ModelShape {
        masses = List.copyOf(masses);
    }

    static final ModelShape UNKNOWN = new ModelShape(Kind.UNKNOWN, Optional.empty(), -1, List.of());

    static ModelShape of(Optional<JsonNode> model) {
        if (model.isEmpty() || !(model.get() instanceof JsonNode.JsonObject o)) {
            return UNKNOWN;
        }
        String kind = o.get("kind").filter(k -> k instanceof JsonNode.JsonString)
                .map(k -> ((JsonNode.JsonString) k).value()).orElse("");
        return switch (kind) {
            case "single" -> new ModelShape(Kind.SINGLE, Optional.empty(), 1, List.of());
            case "rigid-body" -> new ModelShape(Kind.RIGID_BODY, Optional.empty(), 1, List.of());
            case "lumped" -> lumped(o);
            default -> UNKNOWN;
        };
    }

    private static ModelShape lumped(JsonNode.JsonObject o) {
        Optional<Model.Motion> motion = o.get("motion").filter(m -> m instanceof JsonNode.JsonString)
                .flatMap(m -> LumpedReader.motion(((JsonNode.JsonString) m).value()));
        Optional<JsonNode> list = o.get("masses");
        if (list.isEmpty() || !(list.get() instanceof JsonNode.JsonArray a)) {
            return new ModelShape(Kind.LUMPED, motion, -1, List.of());
        }
        List<String> names = new ArrayList<>();
        for (JsonNode item : a.items()) {
            if (item instanceof JsonNode.JsonObject m && m.get("name").orElse(null) instanceof JsonNode.JsonString s
                    && !s.value().isBlank()) {
                names.add(s.value());
            }
        }
        return new ModelShape(Kind.LUMPED, motion, a.items().size(), names);
    }

    boolean torsion() {
        return motion.filter(m -> m == Model.Motion.TORSION).isPresent();
    }

    /** Whether the number of masses is known to be more than one (then {@code at} is required). */
    boolean severalMasses() {
        return massCount > 1;
    }

    /** The one mass, when the line has exactly one whose name is known. */
    Optional<String> onlyMass() {
        return massCount == 1 && masses.size() == 1 ? Optional.of(masses.get(0)) : Optional.empty();
    }

    /** Whether a name can be checked against the masses (all of them have readable names). */
    boolean namesKnown() {
        return massCount >= 0 && masses.size() == massCount;
    }
}
