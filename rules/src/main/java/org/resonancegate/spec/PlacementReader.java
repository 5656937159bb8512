package org.resonancegate.spec;

import java.util.List;
import java.util.Optional;

/**
 * Where an excitation acts ({@code at}, {@code axis}, {@code direction}), by model: nowhere to
 * say for {@code single}; a mass name for {@code lumped}; a point with a shaft axis (rotating) or a
 * direction (fixed) for {@code rigid-body}. A key that does not fit the model is a diagnostic that
 * says what the model takes instead.
 */
final class PlacementReader {

    private PlacementReader() {
    }

    /**
     * The placement of a force-carrying excitation ({@code unbalance}, {@code force}); for
     * {@code base-motion} and {@code order}, {@link Placement#LINE} once {@code at} and {@code axis}
     * are known to be absent (the direction of base motion is read by {@link #baseDirection}).
     */
    static Optional<Placement> excitation(JsonNode.JsonObject e, String kind, String where, ModelShape shape,
                                          Problems problems) {
        int before = problems.count();
        Optional<JsonNode.Member> at = e.member("at");
        Optional<JsonNode.Member> axis = e.member("axis");
        Optional<JsonNode.Member> direction = e.member("direction");
        switch (shape.kind()) {
            case UNKNOWN -> {
                // The model has its own diagnostic; whatever is written here cannot be judged.
                return Optional.of(Placement.LINE);
            }
            case SINGLE -> {
                for (Optional<JsonNode.Member> m : List.of(at, axis, direction)) {
                    m.ifPresent(x -> problems.add(x.keyLocation(), "\"" + x.key() + "\" in " + where + ": a single model"
                            + " needs none (the excitation acts on its one mass, along the spring); remove it"));
                }
                return problems.count() == before ? Optional.of(Placement.LINE) : Optional.empty();
            }
            case LUMPED -> {
                return lumped(e, kind, where, shape, at, axis, direction, problems);
            }
            case RIGID_BODY -> {
                return rigid(e, kind, where, at, axis, direction, problems);
            }
            default -> throw new IllegalStateException(shape.kind().toString());
        }
    }

    private static Optional<Placement> lumped(JsonNode.JsonObject e, String kind, String where, ModelShape shape,
                                              Optional<JsonNode.Member> at, Optional<JsonNode.Member> axis,
                                              Optional<JsonNode.Member> direction, Problems problems) {
        int before = problems.count();
        if (shape.torsion() && (kind.equals("unbalance") || kind.equals("base-motion"))) {
            problems.add(e.get("kind").orElseThrow().location(), where + ": \"" + kind + "\" does not apply to a torsion"
                    + " line (it acts along a translation); drive an inertia with a \"force\" excitation, whose"
                    + " \"amplitude\" is then a torque such as \"120 N·m\"");
            return Optional.empty();
        }
        axis.ifPresent(x -> problems.add(x.keyLocation(), "\"axis\" in " + where + ": a lumped model acts along its"
                + " line, so it needs no axis; remove it"));
        if (kind.equals("base-motion") || kind.equals("order")) {
            String why = kind.equals("order") ? "an \"order\" excitation carries no force and acts nowhere"
                    : "base motion moves the ground under every spring tied to it";
            at.ifPresent(x -> problems.add(x.keyLocation(), "\"at\" in " + where + ": " + why + "; remove it"));
            if (kind.equals("order")) {
                direction.ifPresent(x -> problems.add(x.keyLocation(), "\"direction\" in " + where + ": " + why
                        + "; remove it"));
            }
            return problems.count() == before ? Optional.of(Placement.LINE) : Optional.empty();
        }
        direction.ifPresent(x -> problems.add(x.keyLocation(), "\"direction\" in " + where + ": a lumped model acts"
                + " along its line; name the mass with \"at\" and remove \"direction\""));
        Optional<Placement> placement = Optional.empty();
        if (at.isPresent()) {
            placement = mass(at.get().value(), where, shape, problems).map(n -> new Placement.AtMass(n,
                    at.get().value().location()));
        } else if (shape.onlyMass().isPresent()) {
            placement = Optional.of(new Placement.AtMass(shape.onlyMass().get(), e.location()));
        } else if (shape.severalMasses()) {
            problems.add(e.location(), where + " needs \"at\": the mass it acts on, such as \"at\": \""
                    + shape.masses().get(0) + "\"; the model has several masses (" + Geometry.names(shape.masses())
                    + ")");
        }
        return problems.count() == before ? placement : Optional.empty();
    }

    /** A mass name that the model defines; checked only when every mass name could be read. */
    static Optional<String> mass(JsonNode node, String where, ModelShape shape, Problems problems) {
        if (node instanceof JsonNode.JsonObject) {
            problems.add(node.location(), "\"at\" in " + where + " names a mass of the lumped model, such as \"at\": \""
                    + shape.masses().stream().findFirst().orElse("pump") + "\"; a point {\"x\", \"y\", \"z\"} is for a"
                    + " rigid body");
            return Optional.empty();
        }
        Optional<String> name = Fields.text(node, "at", "the name of a mass, such as \"pump\"", problems);
        if (name.isPresent() && shape.namesKnown() && !shape.masses().contains(name.get())) {
            String message = Geometry.unknownName("\"at\" in " + where + ": mass", name.get(), shape.masses(),
                    "the masses are");
            if (name.get().equals(Model.Lumped.GROUND)) {
                message = "\"at\" in " + where + " names \"ground\", which does not move; name a mass: "
                        + Geometry.names(shape.masses());
            }
            problems.add(node.location(), message);
            return Optional.empty();
        }
        return name;
    }

    private static Optional<Placement> rigid(JsonNode.JsonObject e, String kind, String where,
                                             Optional<JsonNode.Member> at, Optional<JsonNode.Member> axis,
                                             Optional<JsonNode.Member> direction, Problems problems) {
        int before = problems.count();
        if (kind.equals("base-motion") || kind.equals("order")) {
            String why = kind.equals("order") ? "an \"order\" excitation carries no force and acts nowhere"
                    : "base motion moves the ground under every mount";
            at.ifPresent(x -> problems.add(x.keyLocation(), "\"at\" in " + where + ": " + why + "; remove it"));
            axis.ifPresent(x -> problems.add(x.keyLocation(), "\"axis\" in " + where + ": " + why + "; remove it"));
            if (kind.equals("order")) {
                direction.ifPresent(x -> problems.add(x.keyLocation(), "\"direction\" in " + where + ": " + why
                        + "; remove it"));
            }
            return problems.count() == before ? Optional.of(Placement.LINE) : Optional.empty();
        }
        boolean rotating = kind.equals("unbalance");
        Optional<Point> point = Optional.empty();
        if (at.isPresent()) {
            if (at.get().value() instanceof JsonNode.JsonString) {
                problems.add(at.get().value().location(), "\"at\" in " + where + " is a point on the rigid body, such as"
                        + " \"at\": " + Geometry.POINT_EXAMPLE + "; a mass name is for a lumped model");
            } else {
                point = Geometry.point(at.get().value(), "at", problems);
            }
        } else {
            problems.add(e.location(), where + " needs \"at\": the point where the force acts, such as \"at\": "
                    + Geometry.POINT_EXAMPLE);
        }
        Optional<ShaftAxis> shaft = Optional.empty();
        Optional<Direction> fixed = Optional.empty();
        if (rotating) {
            direction.ifPresent(x -> problems.add(x.keyLocation(), "\"direction\" in " + where + ": an unbalance"
                    + " rotates about its shaft, so it takes \"axis\" (\"x\" … \"-z\"), not a fixed direction; remove it"));
            if (axis.isPresent()) {
                shaft = Geometry.shaftAxis(axis.get().value(), problems);
            } else {
                problems.add(e.location(), where + " needs \"axis\" beside \"at\": the shaft axis the unbalance turns"
                        + " about, one of \"x\", \"y\", \"z\", \"-x\", \"-y\", \"-z\"");
            }
        } else {
            axis.ifPresent(x -> problems.add(x.keyLocation(), "\"axis\" in " + where + ": a force has a fixed"
                    + " \"direction\" {\"x\", \"y\", \"z\"}; a rotating force is an \"unbalance\" excitation; remove"
                    + " \"axis\""));
            if (direction.isPresent()) {
                fixed = Geometry.direction(direction.get().value(), "direction", problems);
            } else {
                problems.add(e.location(), where + " needs \"direction\" beside \"at\": the line the force acts"
                        + " along, such as \"direction\": " + Geometry.DIRECTION_EXAMPLE);
            }
        }
        if (problems.count() != before || point.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new Placement.AtPoint(point.get(), shaft, fixed));
    }

    /**
     * The direction base motion moves the ground along: a rigid body may give {@code direction}
     * (default z); a single or lumped line is vertical and takes none.
     */
    static Optional<Direction> baseDirection(JsonNode.JsonObject e, String where, ModelShape shape, Problems problems) {
        Optional<JsonNode.Member> direction = e.member("direction");
        if (direction.isEmpty()) {
            return Optional.of(Direction.up(e.location()));
        }
        return switch (shape.kind()) {
            case RIGID_BODY -> Geometry.direction(direction.get().value(), "direction", problems);
            case UNKNOWN -> Optional.of(Direction.up(e.location()));
            case SINGLE -> {
                problems.add(direction.get().keyLocation(), "\"direction\" in " + where + ": a single model needs none"
                        + " (the excitation acts on its one mass, along the spring); remove it");
                yield Optional.empty();
            }
            case LUMPED -> {
                problems.add(direction.get().keyLocation(), "\"direction\" in " + where + ": a lumped line is vertical"
                        + " and the ground moves along it; remove \"direction\"");
                yield Optional.empty();
            }
        };
    }
}
