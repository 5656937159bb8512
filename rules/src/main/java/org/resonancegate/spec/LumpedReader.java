package org.resonancegate.spec;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.resonancegate.units.Dimension;

/** Reads and validates a {@code lumped} model: masses (or inertias) along one line joined by springs. */
final class LumpedReader {

    static final List<String> KEYS = List.of("kind", "motion", "masses", "springs", "damping", "free");
    static final List<String> SPRING_KEYS = List.of("name", "from", "to", "stiffness", "damping");
    /** More elements than this is a diagnostic (spec-format.md, limits). */
    static final int LIMIT = 1000;

    /**
     * Masses (or inertias) in one lumped line. The line is solved as one dense eigenproblem per
     * spec, whose cost grows with the cube of the count: 1,000 masses took about half a minute
     * on two cores, 200 about 0.7 s in a fresh JVM. A machine on mounts is modelled with a few
     * masses (common practice, no source); a spec with hundreds would hold a CI build hostage.
     */
    static final int MASS_LIMIT = 200;

    private LumpedReader() {
    }

    static Optional<Model.Motion> motion(String text) {
        for (Model.Motion m : Model.Motion.values()) {
            if (m.key().equals(text)) {
                return Optional.of(m);
            }
        }
        return Optional.empty();
    }

    static Optional<Model.Lumped> read(JsonNode.JsonObject model, Problems problems) {
        int before = problems.count();
        Fields.checkKeys(model, "a lumped model", KEYS, problems);
        Optional<Model.Motion> motion = Fields.required(model, "motion", "a lumped model",
                        "\"motion\": \"translation\" (or \"torsion\" for a shaft line of inertias)", problems)
                .flatMap(n -> Fields.text(n, "motion", "\"translation\" or \"torsion\"", problems).flatMap(t -> {
                    Optional<Model.Motion> m = motion(t);
                    if (m.isEmpty()) {
                        problems.add(n.location(), Geometry.unknown("motion", t, List.of("translation", "torsion"))
                                + " (translation: masses in kg and springs in N/m; torsion: inertias in kg·m²"
                                + " and springs in N·m/rad)");
                    }
                    return m;
                }));
        boolean free = false;
        Optional<JsonNode> freeNode = model.get("free");
        if (freeNode.isPresent()) {
            if (freeNode.get() instanceof JsonNode.JsonBoolean b) {
                free = b.value();
            } else {
                Fields.wrongType(freeNode.get(), "free", "true or false", "\"free\": true", problems);
            }
        }
        Optional<Damping> damping = model.get("damping").flatMap(n -> modalDamping(n, "a lumped model",
                "on each spring, such as {\"name\": \"pads\", ..., \"damping\": {\"coefficient\": \"2 kN·s/m\"}}", problems));
        if (motion.isEmpty()) {
            // Units of masses and springs depend on the motion; their problems would only repeat this one.
            return Optional.empty();
        }
        boolean torsion = motion.get() == Model.Motion.TORSION;
        List<Model.LumpedMass> masses = masses(model, torsion, problems);
        List<Model.Spring> springs = springs(model, torsion, masses, problems);
        boolean modelDamped = model.has("damping");
        elementDamping(model, springs, modelDamped, problems);
        if (problems.count() == before) {
            groundTies(model, masses, springs, free, problems);
        }
        if (problems.count() != before || (modelDamped && damping.isEmpty())) {
            return Optional.empty();
        }
        return Optional.of(new Model.Lumped(motion.get(), masses, springs, damping, free, model.location()));
    }

    /**
     * Model-level damping of a lumped or rigid-body model: a modal ratio in one of its forms. A
     * dashpot coefficient has no single meaning for several modes; it belongs on the elements.
     */
    static Optional<Damping> modalDamping(JsonNode node, String where, String elsewhere, Problems problems) {
        if (node instanceof JsonNode.JsonObject d && d.member("coefficient").isPresent()) {
            problems.add(d.member("coefficient").get().keyLocation(), "model-level \"coefficient\" damping applies to a"
                    + " single model only; in " + where + " a dashpot belongs on the element: remove the model's"
                    + " \"damping\" and put \"damping\": {\"coefficient\": …} " + elsewhere
                    + ", or give a modal damping here: ratio, lossFactor, q or logDecrement");
            return Optional.empty();
        }
        return ModelReader.readDamping(node, problems);
    }

    private static Optional<JsonNode.JsonArray> list(JsonNode.JsonObject model, String key, String example,
                                                     Problems problems) {
        Optional<JsonNode.JsonArray> array = Fields.required(model, key, "a lumped model", "\"" + key + "\": [" + example + "]",
                problems).flatMap(n -> Fields.array(n, key, "[" + example + "]", problems));
        if (array.isPresent() && array.get().items().isEmpty()) {
            problems.add(array.get().location(), "\"" + key + "\" is empty; list at least one, such as " + example);
            return Optional.empty();
        }
        if (array.isPresent() && array.get().items().size() > LIMIT) {
            problems.add(array.get().location(), "\"" + key + "\" lists " + array.get().items().size() + " entries; this"
                    + " version reads at most " + LIMIT + " masses, springs or mounts per spec");
            return Optional.empty();
        }
        return array;
    }

    private static List<Model.LumpedMass> masses(JsonNode.JsonObject model, boolean torsion, Problems problems) {
        String valueKey = torsion ? "inertia" : "mass";
        String example = torsion ? "{\"name\": \"impeller\", \"inertia\": \"3.2 kg·m²\"}" : "{\"name\": \"frame\", \"mass\": \"400 kg\"}";
        List<Model.LumpedMass> masses = new ArrayList<>();
        Optional<JsonNode.JsonArray> array = list(model, "masses", example, problems);
        if (array.isPresent() && array.get().items().size() > MASS_LIMIT) {
            problems.add(array.get().location(), "\"masses\" lists " + array.get().items().size() + " entries; a lumped"
                    + " line takes at most " + MASS_LIMIT + " (it is solved as one dense eigenproblem, whose cost grows"
                    + " with the cube of the count); lump neighbouring masses together, or split the line into specs");
            return masses;
        }
        if (array.isEmpty()) {
            return masses;
        }
        Map<String, SourceLocation> names = new HashMap<>();
        for (JsonNode item : array.get().items()) {
            Optional<JsonNode.JsonObject> object = Fields.object(item, "masses", example, problems);
            if (object.isEmpty()) {
                continue;
            }
            JsonNode.JsonObject m = object.get();
            String other = torsion ? "mass" : "inertia";
            m.member(other).ifPresent(o -> problems.add(o.keyLocation(), "\"" + other + "\" does not fit a "
                    + (torsion ? "torsion" : "translation") + " line: its masses take \"" + valueKey + "\""
                    + (torsion ? " (kg·m²)" : " (kg)") + ", such as " + example));
            JsonNode.JsonObject rest = new JsonNode.JsonObject(
                    m.members().stream().filter(x -> !x.key().equals(other)).toList(), m.location());
            Fields.checkKeys(rest, "a mass", List.of("name", valueKey), problems);
            Optional<String> name = name(m, "a mass", "\"frame\"", names, "masses", problems);
            Optional<Quantity> value = Fields.required(m, valueKey, "mass " + name.map(n -> "\"" + n + "\"").orElse(""),
                            "\"" + valueKey + "\": " + (torsion ? "\"3.2 kg·m²\"" : "\"400 kg\""), problems)
                    .flatMap(n -> Fields.positive(n, valueKey, torsion ? Dimension.INERTIA : Dimension.MASS, problems));
            if (name.isPresent() && value.isPresent()) {
                masses.add(new Model.LumpedMass(name.get(), value.get(), m.location()));
            }
        }
        return masses;
    }

    /** A unique, non-blank element name; {@code ground} is reserved for the fixed reference. */
    private static Optional<String> name(JsonNode.JsonObject o, String what, String example,
                                         Map<String, SourceLocation> seen, String list, Problems problems) {
        Optional<JsonNode> node = Fields.required(o, "name", what, "\"name\": " + example, problems);
        Optional<String> name = node.flatMap(n -> Fields.text(n, "name", example, problems));
        if (name.isEmpty()) {
            return name;
        }
        if (list.equals("masses") && name.get().equals(Model.Lumped.GROUND)) {
            problems.add(node.get().location(), "\"ground\" is reserved for the fixed reference; springs name it"
                    + " without defining it: give this mass another name");
            return Optional.empty();
        }
        SourceLocation first = seen.putIfAbsent(name.get(), node.get().location());
        if (first != null) {
            problems.add(node.get().location(), "two " + list + " are named \"" + name.get() + "\" (the other at line "
                    + first.line() + "); springs and reports refer to them by name, give each its own");
            return Optional.empty();
        }
        return name;
    }

    private static List<Model.Spring> springs(JsonNode.JsonObject model, boolean torsion, List<Model.LumpedMass> masses,
                                              Problems problems) {
        String example = torsion
                ? "{\"name\": \"coupling\", \"from\": \"motor\", \"to\": \"impeller\", \"stiffness\": \"45 kN·m/rad\"}"
                : "{\"name\": \"isolators\", \"from\": \"ground\", \"to\": \"frame\", \"stiffness\": \"1.2 MN/m\"}";
        List<Model.Spring> springs = new ArrayList<>();
        Optional<JsonNode.JsonArray> array = list(model, "springs", example, problems);
        if (array.isEmpty()) {
            return springs;
        }
        List<String> known = new ArrayList<>(masses.stream().map(Model.LumpedMass::name).toList());
        known.add(Model.Lumped.GROUND);
        boolean allMassesRead = model.get("masses").orElse(null) instanceof JsonNode.JsonArray a
                && a.items().size() == masses.size();
        Map<String, SourceLocation> names = new HashMap<>();
        for (JsonNode item : array.get().items()) {
            Optional<JsonNode.JsonObject> object = Fields.object(item, "springs", example, problems);
            if (object.isEmpty()) {
                continue;
            }
            JsonNode.JsonObject s = object.get();
            Fields.checkKeys(s, "a spring", SPRING_KEYS, problems);
            Optional<String> name = name(s, "a spring", "\"isolators\"", names, "springs", problems);
            String where = name.map(n -> "spring \"" + n + "\"").orElse("a spring");
            Optional<String> from = end(s, "from", where, known, allMassesRead, problems);
            Optional<String> to = end(s, "to", where, known, allMassesRead, problems);
            if (from.isPresent() && to.isPresent() && from.get().equals(to.get())) {
                problems.add(s.get("to").orElseThrow().location(), where + " joins \"" + from.get() + "\" to itself;"
                        + " a spring joins two different masses, or a mass and \"ground\"");
                to = Optional.empty();
            }
            Optional<Quantity> stiffness = Fields.required(s, "stiffness", where,
                            "\"stiffness\": " + (torsion ? "\"45 kN·m/rad\"" : "\"1.2 MN/m\""), problems)
                    .flatMap(n -> Fields.positive(n, "stiffness",
                            torsion ? Dimension.TORSIONAL_STIFFNESS : Dimension.STIFFNESS, problems));
            Optional<ElementDamping> damping = s.get("damping").flatMap(n -> ElementDampingReader.spring(n,
                    torsion ? Dimension.TORSIONAL_DAMPING : Dimension.DAMPING_COEFFICIENT, where, problems));
            // A spring whose damping did not read is left out, so that it is not also called undamped.
            if (name.isPresent() && from.isPresent() && to.isPresent() && stiffness.isPresent()
                    && s.has("damping") == damping.isPresent()) {
                springs.add(new Model.Spring(name.get(), from.get(), to.get(), stiffness.get(), damping, s.location()));
            }
        }
        return springs;
    }

    private static Optional<String> end(JsonNode.JsonObject s, String key, String where, List<String> known,
                                        boolean allMassesRead, Problems problems) {
        Optional<JsonNode> node = Fields.required(s, key, where, "\"" + key + "\": \"ground\" (or a mass's name)", problems);
        Optional<String> name = node.flatMap(n -> Fields.text(n, key, "\"ground\" or a mass's name", problems));
        if (name.isPresent() && !known.contains(name.get())) {
            if (allMassesRead) {
                problems.add(node.get().location(), Geometry.unknownName("\"" + key + "\" of " + where + ": mass",
                        name.get(), known, "a spring joins two of"));
            }
            return Optional.empty();
        }
        return name;
    }

    /** Damping on the model or on every spring, never both and never neither. */
    private static void elementDamping(JsonNode.JsonObject model, List<Model.Spring> springs, boolean modelDamped,
                                       Problems problems) {
        for (Model.Spring s : springs) {
            if (modelDamped && s.damping().isPresent()) {
                problems.add(s.damping().get().values().location(), "spring \"" + s.name() + "\" carries its own damping,"
                        + " but the model has a \"damping\" too (line " + model.get("damping").orElseThrow().location().line()
                        + "); give one or the other: the model's modal damping, or damping on every spring");
            } else if (!modelDamped && s.damping().isEmpty()) {
                problems.add(s.location(), "spring \"" + s.name() + "\" has no damping and the model has none; add"
                        + " \"damping\": {\"coefficient\": …} or {\"lossFactor\": 0.1} to the spring, or a model-level"
                        + " \"damping\": {\"ratio\": 0.05} (an undamped model would claim an infinite amplitude at resonance)");
            }
        }
    }

    /**
     * Every part of the network (masses joined by springs) must be tied to ground, unless the spec
     * says {@code "free": true}: a free part has a zero frequency, rarely what the designer meant.
     */
    private static void groundTies(JsonNode.JsonObject model, List<Model.LumpedMass> masses, List<Model.Spring> springs,
                                   boolean free, Problems problems) {
        Map<String, String> parent = new LinkedHashMap<>();
        masses.forEach(m -> parent.put(m.name(), m.name()));
        parent.put(Model.Lumped.GROUND, Model.Lumped.GROUND);
        for (Model.Spring s : springs) {
            parent.put(root(parent, s.from()), root(parent, s.to()));
        }
        String ground = root(parent, Model.Lumped.GROUND);
        Map<String, List<Model.LumpedMass>> parts = new LinkedHashMap<>();
        for (Model.LumpedMass m : masses) {
            String r = root(parent, m.name());
            if (!r.equals(ground)) {
                parts.computeIfAbsent(r, k -> new ArrayList<>()).add(m);
            }
        }
        if (free) {
            return;
        }
        for (List<Model.LumpedMass> part : parts.values()) {
            List<String> names = part.stream().map(m -> "\"" + m.name() + "\"").toList();
            problems.add(part.get(0).location(), (names.size() == 1 ? "mass " : "the part of masses ")
                    + Geometry.names(names) + " is not tied to ground by any spring"
                    + " path, so it would move freely (a zero frequency); add a spring from \"ground\", or write"
                    + " \"free\": true in the model if the line really floats");
        }
    }

    private static String root(Map<String, String> parent, String name) {
        String r = name;
        while (!parent.get(r).equals(r)) {
            r = parent.get(r);
        }
        return r;
    }
}
