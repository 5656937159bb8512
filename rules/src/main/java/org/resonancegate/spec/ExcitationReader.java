package org.resonancegate.spec;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.resonancegate.units.Dimension;
import org.resonancegate.units.Suggestions;

/** Reads the {@code excitations} list of a spec; where each acts depends on the model ({@link ModelShape}). */
final class ExcitationReader {

    static final List<String> KINDS = List.of("unbalance", "force", "base-motion", "order");
    private static final List<String> COMMON = List.of("name", "kind", "phase");
    private static final Map<String, List<String>> KEYS = Map.of(
            "unbalance", List.of("order", "unbalance", "balanceGrade", "rotorMass"),
            "force", List.of("order", "frequency", "amplitude"),
            "base-motion", List.of("order", "frequency", "displacement", "velocity", "acceleration"),
            "order", List.of("order"));
    /** Keys that place an excitation in a lumped or rigid-body model; a single model has one place only. */
    private static final List<String> PLACEMENT = List.of("at", "axis", "direction");
    private static final Pattern GRADE = Pattern.compile("G\\s*(\\d+(?:\\.\\d+)?)");
    private static final String EXAMPLE =
            "{\"name\": \"impeller\", \"kind\": \"unbalance\", \"balanceGrade\": \"G 6.3\", \"rotorMass\": \"180 kg\"}";

    private ExcitationReader() {
    }

    static Optional<List<Excitation>> read(JsonNode node, ModelShape shape, Problems problems) {
        Optional<JsonNode.JsonArray> array = Fields.array(node, "excitations", "[" + EXAMPLE + "]", problems);
        if (array.isEmpty()) {
            return Optional.empty();
        }
        if (array.get().items().isEmpty()) {
            problems.add(node.location(), "\"excitations\" is empty; list at least one source, such as " + EXAMPLE);
            return Optional.empty();
        }
        int before = problems.count();
        List<Excitation> excitations = new ArrayList<>();
        Map<String, SourceLocation> names = new HashMap<>();
        for (JsonNode item : array.get().items()) {
            Optional<Excitation> e = readOne(item, shape, problems);
            e.ifPresent(excitations::add);
            e.ifPresent(x -> {
                SourceLocation first = names.putIfAbsent(x.name(), x.location());
                if (first != null) {
                    problems.add(x.location(), "two excitations are named \"" + x.name() + "\" (the other at line "
                            + first.line() + "); reports tell them apart by name, give each its own");
                }
            });
        }
        return problems.count() == before ? Optional.of(excitations) : Optional.empty();
    }

    private static Optional<Excitation> readOne(JsonNode node, ModelShape shape, Problems problems) {
        Optional<JsonNode.JsonObject> object = Fields.object(node, "excitations", EXAMPLE, problems);
        if (object.isEmpty()) {
            return Optional.empty();
        }
        JsonNode.JsonObject e = object.get();
        int before = problems.count();
        Optional<String> name = Fields.required(e, "name", "an excitation", "\"name\": \"impeller\"", problems)
                .flatMap(n -> Fields.text(n, "name", "\"impeller\"", problems));
        Optional<String> kind = Fields.required(e, "kind", "an excitation", "\"kind\": \"unbalance\"", problems)
                .flatMap(n -> Fields.text(n, "kind", "\"unbalance\"", problems));
        String where = name.map(n -> "excitation \"" + n + "\"").orElse("an excitation");
        if (kind.isPresent() && !KINDS.contains(kind.get())) {
            StringBuilder message = new StringBuilder("unknown excitation kind \"" + kind.get() + "\"");
            Suggestions.closest(kind.get(), KINDS).ifPresent(s -> message.append(" (did you mean \"").append(s).append("\"?)"));
            message.append("; accepted: ").append(String.join(", ", KINDS));
            problems.add(e.get("kind").orElseThrow().location(), message.toString());
            kind = Optional.empty();
        }
        if (kind.isEmpty()) {
            return Optional.empty();
        }
        Optional<Placement> placement = PlacementReader.excitation(e, kind.get(), where, shape, problems);
        List<String> accepted = new ArrayList<>(COMMON);
        accepted.addAll(KEYS.get(kind.get()));
        JsonNode.JsonObject withoutPlacement = new JsonNode.JsonObject(
                e.members().stream().filter(m -> !PLACEMENT.contains(m.key())).toList(), e.location());
        Fields.checkKeys(withoutPlacement, where + " (kind \"" + kind.get() + "\")", accepted, problems);
        double phase = e.get("phase").flatMap(p -> Fields.quantity(p, "phase", Dimension.ANGLE, problems))
                .map(Quantity::si).orElse(0.0);
        Optional<Excitation> result = switch (kind.get()) {
            case "unbalance" -> unbalance(e, name, phase, where, problems)
                    .flatMap(u -> placement.map(p -> new Excitation.Unbalance(u.name(), u.phase(), u.frequency(),
                            u.amount(), p, u.location())))
                    .map(x -> (Excitation) x);
            case "force" -> force(e, name, phase, where, shape, problems)
                    .flatMap(f -> placement.map(p -> new Excitation.Force(f.name(), f.phase(), f.frequency(),
                            f.amplitude(), p, f.location())))
                    .map(x -> (Excitation) x);
            case "base-motion" -> baseMotion(e, name, phase, where, problems)
                    .flatMap(b -> placement.flatMap(p -> PlacementReader.baseDirection(e, where, shape, problems))
                            .map(d -> new Excitation.BaseMotion(b.name(), b.phase(), b.frequency(), b.measure(),
                                    b.amplitude(), d, b.location())))
                    .map(x -> (Excitation) x);
            case "order" -> Fields.required(e, "order", where, "\"order\": 2", problems)
                    .flatMap(n -> order(n, problems))
                    .filter(o -> placement.isPresent())
                    .flatMap(o -> name.map(n -> new Excitation.OrderOnly(n, phase, o, e.location())));
            default -> throw new IllegalStateException(kind.get());
        };
        return problems.count() == before ? result : Optional.empty();
    }

    /** An order n > 0: the excitation runs at n times the running speed. */
    static Optional<ExcitationFrequency.Order> order(JsonNode node, Problems problems) {
        Optional<Double> n = Fields.number(node, "order", "1 or 2", problems);
        if (n.isPresent() && !(n.get() > 0)) {
            problems.add(node.location(), "\"order\" must be greater than zero (a multiple of the running speed,"
                    + " such as 1 or 2); found " + ((JsonNode.JsonNumber) node).text());
            return Optional.empty();
        }
        return n.map(v -> new ExcitationFrequency.Order(v, node.location()));
    }

    private static Optional<Excitation.Unbalance> unbalance(JsonNode.JsonObject e, Optional<String> name, double phase,
                                                  String where, Problems problems) {
        Optional<ExcitationFrequency.Order> order = e.get("order").isPresent()
                ? order(e.get("order").get(), problems)
                : Optional.of(new ExcitationFrequency.Order(1, e.location()));
        Optional<UnbalanceAmount> amount;
        List<JsonNode.Member> direct = Fields.present(e, List.of("unbalance"));
        List<JsonNode.Member> graded = Fields.present(e, List.of("balanceGrade", "rotorMass"));
        if (!direct.isEmpty() && !graded.isEmpty()) {
            problems.add(graded.get(0).keyLocation(), where + ": give either \"unbalance\" or \"balanceGrade\" with"
                    + " \"rotorMass\", not both; \"" + graded.get(0).key() + "\" conflicts with \"unbalance\" at line "
                    + direct.get(0).keyLocation().line());
            amount = Optional.empty();
        } else if (!direct.isEmpty()) {
            amount = Fields.positive(direct.get(0).value(), "unbalance", Dimension.UNBALANCE, problems)
                    .map(UnbalanceAmount.Direct::new);
        } else if (!graded.isEmpty()) {
            Optional<JsonNode> gradeNode = Fields.required(e, "balanceGrade", where + " (with \"rotorMass\")",
                    "\"balanceGrade\": \"G 6.3\"", problems);
            Optional<Quantity> rotorMass = Fields.required(e, "rotorMass", where + " (with \"balanceGrade\")",
                    "\"rotorMass\": \"180 kg\"", problems)
                    .flatMap(n -> Fields.positive(n, "rotorMass", Dimension.MASS, problems));
            Optional<Double> grade = gradeNode.flatMap(n -> grade(n, problems));
            amount = grade.isPresent() && rotorMass.isPresent()
                    ? Optional.of(new UnbalanceAmount.FromBalanceGrade(grade.get(),
                    ((JsonNode.JsonString) gradeNode.get()).value(), gradeNode.get().location(), rotorMass.get()))
                    : Optional.empty();
        } else {
            problems.add(e.location(), where + " needs \"unbalance\" (such as \"120 g·mm\") or \"balanceGrade\""
                    + " with \"rotorMass\" (such as \"G 6.3\" and \"180 kg\"); found neither");
            amount = Optional.empty();
        }
        if (name.isEmpty() || order.isEmpty() || amount.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new Excitation.Unbalance(name.get(), phase, order.get(), amount.get(), e.location()));
    }

    /** {@code "G 6.3"}: the balance quality grade of ISO 21940-11, G in mm/s. */
    private static Optional<Double> grade(JsonNode node, Problems problems) {
        Optional<String> text = Fields.string(node, "balanceGrade", "\"G 6.3\"", problems);
        if (text.isEmpty()) {
            return Optional.empty();
        }
        Matcher m = GRADE.matcher(text.get().strip());
        if (!m.matches() || !(Double.parseDouble(m.group(1)) > 0)) {
            problems.add(node.location(), "\"balanceGrade\" is written \"G\" and the grade in mm/s, such as \"G 6.3\""
                    + " or \"G 2.5\" (ISO 21940-11); found \"" + text.get() + "\"");
            return Optional.empty();
        }
        return Optional.of(Double.parseDouble(m.group(1)));
    }

    private static Optional<ExcitationFrequency> frequency(JsonNode.JsonObject e, String where, Problems problems) {
        Optional<JsonNode.Member> which = Fields.exactlyOne(e, List.of("order", "frequency"), where, problems);
        if (which.isEmpty()) {
            return Optional.empty();
        }
        JsonNode value = which.get().value();
        if (which.get().key().equals("order")) {
            return order(value, problems).map(o -> o);
        }
        return Fields.positive(value, "frequency", Dimension.FREQUENCY, problems).map(ExcitationFrequency.Fixed::new);
    }

    /** A force, or in torsion a torque (N·m) on an inertia. */
    private static Optional<Excitation.Force> force(JsonNode.JsonObject e, Optional<String> name, double phase,
                                                    String where, ModelShape shape, Problems problems) {
        boolean torsion = shape.torsion();
        // A line whose motion is unreadable has its own diagnostic; either unit is taken here.
        boolean either = shape.kind() == ModelShape.Kind.LUMPED && shape.motion().isEmpty();
        Optional<ExcitationFrequency> frequency = frequency(e, where, problems);
        Optional<Quantity> amplitude = Fields.required(e, "amplitude", where,
                        torsion ? "\"amplitude\": \"120 N·m\" (a torque, in torsion)" : "\"amplitude\": \"500 N\"", problems)
                .flatMap(n -> either ? Fields.positiveEither(n, "amplitude", Dimension.FORCE, Dimension.TORQUE, problems)
                        : Fields.positive(n, "amplitude", torsion ? Dimension.TORQUE : Dimension.FORCE, problems));
        if (name.isEmpty() || frequency.isEmpty() || amplitude.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new Excitation.Force(name.get(), phase, frequency.get(), amplitude.get(), e.location()));
    }

    private static Optional<Excitation.BaseMotion> baseMotion(JsonNode.JsonObject e, Optional<String> name, double phase,
                                                   String where, Problems problems) {
        Optional<ExcitationFrequency> frequency = frequency(e, where, problems);
        Optional<JsonNode.Member> which = Fields.exactlyOne(e, List.of("displacement", "velocity", "acceleration"),
                where, problems);
        Optional<Excitation.MotionMeasure> measure = which.map(m -> switch (m.key()) {
            case "displacement" -> Excitation.MotionMeasure.DISPLACEMENT;
            case "velocity" -> Excitation.MotionMeasure.VELOCITY;
            default -> Excitation.MotionMeasure.ACCELERATION;
        });
        Optional<Quantity> amplitude = which.flatMap(m -> Fields.positive(m.value(), m.key(), switch (m.key()) {
            case "displacement" -> Dimension.LENGTH;
            case "velocity" -> Dimension.VELOCITY;
            default -> Dimension.ACCELERATION;
        }, problems));
        if (name.isEmpty() || frequency.isEmpty() || measure.isEmpty() || amplitude.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new Excitation.BaseMotion(name.get(), phase, frequency.get(), measure.get(),
                amplitude.get(), e.location()));
    }
}
