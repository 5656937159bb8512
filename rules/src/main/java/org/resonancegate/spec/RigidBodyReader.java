package org.resonancegate.spec;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.resonancegate.units.Dimension;

/** Reads and validates a {@code rigid-body} model: a rigid machine on discrete mounts, six degrees of freedom. */
final class RigidBodyReader {

    static final List<String> KEYS = List.of("kind", "mass", "centreOfGravity", "inertia", "productsOfInertia",
            "mounts", "damping");
    static final List<String> MOUNT_KEYS = List.of("name", "position", "stiffness", "damping");
    private static final String MOUNT_EXAMPLE = "{\"name\": \"A1\", \"position\": {\"x\": \"-0.9 m\", \"y\": \"-0.5 m\","
            + " \"z\": \"0 m\"}, \"stiffness\": {\"x\": \"0.4 MN/m\", \"y\": \"0.4 MN/m\", \"z\": \"1.1 MN/m\"}}";

    private RigidBodyReader() {
    }

    static Optional<Model.RigidBody> read(JsonNode.JsonObject model, Problems problems) {
        int before = problems.count();
        Fields.checkKeys(model, "a rigid-body model", KEYS, problems);
        Optional<Quantity> mass = Fields.required(model, "mass", "a rigid-body model", "\"mass\": \"2300 kg\"", problems)
                .flatMap(n -> Fields.positive(n, "mass", Dimension.MASS, problems));
        Optional<Point> cg = Fields.required(model, "centreOfGravity", "a rigid-body model",
                        "\"centreOfGravity\": " + Geometry.POINT_EXAMPLE, problems)
                .flatMap(n -> Geometry.point(n, "centreOfGravity", problems));
        Optional<Model.Inertia> inertia = inertia(model, problems);
        Optional<Damping> damping = model.get("damping").flatMap(n -> LumpedReader.modalDamping(n, "a rigid-body model",
                "on each mount, such as \"damping\": {\"coefficient\": \"3 kN·s/m\"}", problems));
        List<Model.Mount> mounts = mounts(model, problems);
        boolean modelDamped = model.has("damping");
        for (Model.Mount m : mounts) {
                if (modelDamped && m.damping().isPresent()) {
                    problems.add(m.damping().get().values().location(), "mount \"" + m.name() + "\" carries its own"
                            + " damping, but the model has a \"damping\" too (line "
                            + model.get("damping").orElseThrow().location().line() + "); give one or the other: the"
                            + " model's modal damping, or damping on every mount");
                } else if (!modelDamped && m.damping().isEmpty()) {
                    problems.add(m.location(), "mount \"" + m.name() + "\" has no damping and the model has none; add"
                            + " \"damping\": {\"lossFactor\": 0.1} (or a \"coefficient\") to the mount, or a model-level"
                            + " \"damping\": {\"ratio\": 0.05} (an undamped model would claim an infinite amplitude at"
                            + " resonance)");
                }
        }
        if (inertia.isPresent()) {
            RigidBodyChecks.inertia(inertia.get(), problems);
        }
        if (problems.count() == before && cg.isPresent()) {
            RigidBodyChecks.reach(cg.get(), mounts, problems);
        }
        if (problems.count() == before && cg.isPresent()) {
            RigidBodyChecks.layout(cg.get(), mounts, model.get("mounts").orElseThrow().location(), problems);
        }
        if (problems.count() != before || mass.isEmpty() || cg.isEmpty() || inertia.isEmpty()
                || (modelDamped && damping.isEmpty())) {
            return Optional.empty();
        }
        return Optional.of(new Model.RigidBody(mass.get(), cg.get(), inertia.get(), mounts, damping, model.location()));
    }

    private static Optional<Model.Inertia> inertia(JsonNode.JsonObject model, Problems problems) {
        String example = "{\"xx\": \"310 kg·m²\", \"yy\": \"520 kg·m²\", \"zz\": \"640 kg·m²\"}";
        Optional<JsonNode.JsonObject> moments = Fields.required(model, "inertia", "a rigid-body model",
                        "\"inertia\": " + example + " (moments about axes through the centre of gravity)", problems)
                .flatMap(n -> Fields.object(n, "inertia", example, problems));
        Optional<Quantity> xx = Optional.empty();
        Optional<Quantity> yy = Optional.empty();
        Optional<Quantity> zz = Optional.empty();
        if (moments.isPresent()) {
            JsonNode.JsonObject m = moments.get();
            Fields.checkKeys(m, "\"inertia\"", List.of("xx", "yy", "zz"), problems);
            xx = moment(m, "xx", problems);
            yy = moment(m, "yy", problems);
            zz = moment(m, "zz", problems);
        }
        double[] products = {0, 0, 0};
        boolean productsOk = true;
        Optional<JsonNode> productsNode = model.get("productsOfInertia");
        if (productsNode.isPresent()) {
            Optional<JsonNode.JsonObject> p = Fields.object(productsNode.get(), "productsOfInertia",
                    "{\"xy\": \"0 kg·m²\", \"xz\": \"12 kg·m²\", \"yz\": \"0 kg·m²\"}", problems);
            productsOk = p.isPresent();
            if (p.isPresent()) {
                List<String> keys = List.of("xy", "xz", "yz");
                Fields.checkKeys(p.get(), "\"productsOfInertia\"", keys, problems);
                for (int i = 0; i < 3; i++) {
                    // A product left out is zero, as the whole object is when it is left out.
                    Optional<JsonNode> n = p.get().get(keys.get(i));
                    if (n.isPresent()) {
                        Optional<Quantity> q = Fields.quantity(n.get(), keys.get(i), Dimension.INERTIA, problems);
                        productsOk &= q.isPresent();
                        products[i] = q.map(Quantity::si).orElse(0.0);
                    }
                }
            }
        }
        if (xx.isEmpty() || yy.isEmpty() || zz.isEmpty() || !productsOk) {
            return Optional.empty();
        }
        return Optional.of(new Model.Inertia(xx.get(), yy.get(), zz.get(), products[0], products[1], products[2],
                moments.get().location()));
    }

    private static Optional<Quantity> moment(JsonNode.JsonObject m, String key, Problems problems) {
        return Fields.required(m, key, "\"inertia\"", "\"" + key + "\": \"310 kg·m²\"", problems)
                .flatMap(n -> Fields.positive(n, key, Dimension.INERTIA, problems));
    }

    private static List<Model.Mount> mounts(JsonNode.JsonObject model, Problems problems) {
        List<Model.Mount> mounts = new ArrayList<>();
        Optional<JsonNode.JsonArray> array = Fields.required(model, "mounts", "a rigid-body model",
                        "\"mounts\": [" + MOUNT_EXAMPLE + ", ...]", problems)
                .flatMap(n -> Fields.array(n, "mounts", "[" + MOUNT_EXAMPLE + "]", problems));
        if (array.isEmpty()) {
            return mounts;
        }
        if (array.get().items().isEmpty()) {
            problems.add(array.get().location(), "\"mounts\" is empty; list the mounts, such as " + MOUNT_EXAMPLE);
            return mounts;
        }
        if (array.get().items().size() > LumpedReader.LIMIT) {
            problems.add(array.get().location(), "\"mounts\" lists " + array.get().items().size() + " entries; this"
                    + " version reads at most " + LumpedReader.LIMIT + " masses, springs or mounts per spec");
            return mounts;
        }
        Map<String, SourceLocation> names = new HashMap<>();
        for (JsonNode item : array.get().items()) {
            Optional<JsonNode.JsonObject> object = Fields.object(item, "mounts", MOUNT_EXAMPLE, problems);
            if (object.isEmpty()) {
                continue;
            }
            JsonNode.JsonObject m = object.get();
            Fields.checkKeys(m, "a mount", MOUNT_KEYS, problems);
            Optional<JsonNode> nameNode = Fields.required(m, "name", "a mount", "\"name\": \"A1\"", problems);
            Optional<String> name = nameNode.flatMap(n -> Fields.text(n, "name", "\"A1\"", problems));
            if (name.isPresent()) {
                SourceLocation first = names.putIfAbsent(name.get(), nameNode.get().location());
                if (first != null) {
                    problems.add(nameNode.get().location(), "two mounts are named \"" + name.get() + "\" (the other at"
                            + " line " + first.line() + "); reports name the mount that governs, give each its own");
                    name = Optional.empty();
                }
            }
            String where = name.map(n -> "mount \"" + n + "\"").orElse("a mount");
            Optional<Point> position = Fields.required(m, "position", where, "\"position\": " + Geometry.POINT_EXAMPLE,
                    problems).flatMap(n -> Geometry.point(n, "position", problems));
            Optional<AxisValues> stiffness = Fields.required(m, "stiffness", where,
                            "\"stiffness\": {\"x\": \"0.4 MN/m\", \"y\": \"0.4 MN/m\", \"z\": \"1.1 MN/m\"}", problems)
                    .flatMap(n -> stiffness(n, where, problems));
            Optional<ElementDamping> damping = stiffness.isEmpty() ? Optional.empty()
                    : m.get("damping").flatMap(n -> ElementDampingReader.mount(n, stiffness.get(), where, problems));
            // A mount whose damping did not read is left out, so that it is not also called undamped.
            if (name.isPresent() && position.isPresent() && stiffness.isPresent() && m.has("damping") == damping.isPresent()) {
                mounts.add(new Model.Mount(name.get(), position.get(), stiffness.get(), damping, m.location()));
            }
        }
        return mounts;
    }

    /** Three axial stiffnesses; an axis may be zero (a mount that only carries load vertically), not all three. */
    private static Optional<AxisValues> stiffness(JsonNode node, String where, Problems problems) {
        Optional<JsonNode.JsonObject> object = Fields.object(node, "stiffness",
                "{\"x\": \"0.4 MN/m\", \"y\": \"0.4 MN/m\", \"z\": \"1.1 MN/m\"} (a mount is stiff along three axes)",
                problems);
        if (object.isEmpty()) {
            return Optional.empty();
        }
        JsonNode.JsonObject s = object.get();
        Fields.checkKeys(s, () -> "the stiffness of " + where, Geometry.XYZ, problems);
        double[] k = new double[3];
        boolean ok = true;
        for (int i = 0; i < 3; i++) {
            String axis = Geometry.XYZ.get(i);
            Optional<Quantity> q = Fields.required(s, axis, () -> "the stiffness of " + where,
                            () -> "\"" + axis + "\": \"0.4 MN/m\" (all three axes are needed; \"0 N/m\" where the mount gives none)",
                            problems)
                    .flatMap(n -> Fields.nonNegative(n, axis, Dimension.STIFFNESS, problems));
            ok &= q.isPresent();
            k[i] = q.map(Quantity::si).orElse(0.0);
        }
        if (!ok) {
            return Optional.empty();
        }
        if (k[0] == 0 && k[1] == 0 && k[2] == 0) {
            problems.add(s.location(), where + " has zero stiffness along all three axes, so it carries nothing;"
                    + " give its stiffness or remove it");
            return Optional.empty();
        }
        return Optional.of(new AxisValues(k[0], k[1], k[2], s.location()));
    }
}
