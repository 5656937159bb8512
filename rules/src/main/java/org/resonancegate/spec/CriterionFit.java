package org.resonancegate.spec;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.resonancegate.units.Dimension;

/**
 * Checks the criteria in force (the spec's own and its profiles') against the spec's model, once
 * that is known: whether {@code at} names a point the model has, whether the limits have the
 * model's units (lengths on a translation line, angles in torsion), whether the rule applies at
 * all. Fills in {@code at} where it can mean one mass only. An empty {@code at} that remains
 * means, for isolation, the centre of gravity of a rigid body, or on a lumped line without base
 * motion the whole line (force transmissibility needs no point).
 */
final class CriterionFit {

    private CriterionFit() {
    }

    /**
     * @param baseMotion whether the spec lists a base-motion excitation
     */
    static List<Criterion> fit(List<Criterion> criteria, ModelShape shape, boolean baseMotion,
                               String specFile, Problems problems) {
        List<Criterion> out = new ArrayList<>();
        for (Criterion c : criteria) {
            Problems own = new Problems();
            out.add(one(c, shape, baseMotion, own));
            boolean fromProfile = !c.location().file().equals(specFile);
            for (Diagnostic d : own.all()) {
                // The profile serves other specs too: say which spec it does not fit, and how to mend that one.
                problems.add(d.location(), fromProfile ? d.message() + " (this criterion comes from a profile and does"
                        + " not fit the model of " + specFile + "; define a criterion \"" + c.id() + "\" in that spec"
                        + " to replace it there)" : d.message());
            }
        }
        return out;
    }

    private static Criterion one(Criterion c, ModelShape shape, boolean baseMotion,
                                 Problems problems) {
        String where = "criterion \"" + c.id() + "\"";
        boolean torsion = shape.torsion();
        if (c instanceof Criterion.StaticDeflection s && torsion) {
            problems.add(s.location(), where + ": \"static-deflection\" does not apply to a torsion line"
                    + " (gravity does not twist it); remove the criterion");
        }
        if (c instanceof Criterion.TransmittedForce f) {
            units(f.max(), where, shape, Dimension.FORCE, Dimension.TORQUE, problems);
            if (f.axis().isPresent() && shape.kind() != ModelShape.Kind.RIGID_BODY
                    && shape.kind() != ModelShape.Kind.UNKNOWN) {
                problems.add(f.location(), "\"axis\" in " + where + ": only a rigid body's mounts have axes; "
                        + (shape.kind() == ModelShape.Kind.SINGLE ? "a single model" : "a lumped line")
                        + " has one force per spring; remove it");
            }
        }
        if (c instanceof Criterion.Isolation i) {
            return new Criterion.Isolation(i.id(), i.severity(), i.limit(),
                    at(i.at(), where, shape, true, baseMotion, i.location(), problems), i.location());
        }
        if (c instanceof Criterion.Displacement d) {
            units(d.max(), where, shape, Dimension.LENGTH, Dimension.ANGLE, problems);
            return new Criterion.Displacement(d.id(), d.severity(), d.max(), d.measure(),
                    at(d.at(), where, shape, false, baseMotion, d.location(), problems), d.location());
        }
        if (c instanceof Criterion.Velocity v) {
            units(v.max(), where, shape, Dimension.VELOCITY, Dimension.ANGULAR_VELOCITY, problems);
            return new Criterion.Velocity(v.id(), v.severity(), v.max(), v.measure(),
                    at(v.at(), where, shape, false, baseMotion, v.location(), problems), v.location());
        }
        return c;
    }

    /** A limit in translation units, or in torsion units on a torsion line. */
    private static void units(Quantity max, String where, ModelShape shape, Dimension translation, Dimension torsion,
                              Problems problems) {
        if (shape.kind() == ModelShape.Kind.UNKNOWN
                || (shape.kind() == ModelShape.Kind.LUMPED && shape.motion().isEmpty())) {
            return;
        }
        Dimension wanted = shape.torsion() ? torsion : translation;
        if (max.dimension() != wanted) {
            problems.add(max.location(), "\"max\" of " + where + " is " + (shape.torsion()
                    ? "a translation value (\"" + max.text() + "\"), but the model is a torsion line: write "
                    + (torsion == Dimension.ANGLE ? "an angle, such as \"2 mrad\""
                    : torsion == Dimension.TORQUE ? "a torque, such as \"400 N·m\"" : "an angular velocity, such as \"0.5 rad/s\"")
                    : "a torsion value (\"" + max.text() + "\"), but the model moves in translation: write "
                    + (translation == Dimension.LENGTH ? "a length, such as \"0.2 mm\""
                    : translation == Dimension.FORCE ? "a force, such as \"2 kN\"" : "a velocity, such as \"4.5 mm/s\"")));
        }
    }

    /**
     * The point a criterion looks at. {@code isolation} needs one only for base motion (the force
     * transmissibility is the whole force into the ground); there, and for displacement and
     * velocity, a model with several masses or a rigid body must say which.
     */
    private static Optional<ResponsePoint> at(Optional<ResponsePoint> written, String where, ModelShape shape,
                                              boolean isolation, boolean baseMotion,
                                              SourceLocation criterion, Problems problems) {
        switch (shape.kind()) {
            case UNKNOWN -> {
                return written;
            }
            case SINGLE -> {
                written.ifPresent(p -> problems.add(location(p), "\"at\" in " + where + ": a single model needs none"
                        + " (it has one mass and one spring); remove it"));
                return Optional.empty();
            }
            case LUMPED -> {
                if (written.isPresent()) {
                    if (written.get() instanceof ResponsePoint.Mass m) {
                        if (shape.namesKnown() && !shape.masses().contains(m.name())) {
                            problems.add(m.location(), Geometry.unknownName("\"at\" in " + where + ": mass", m.name(),
                                    shape.masses(), "the masses are"));
                        }
                    } else {
                        problems.add(location(written.get()), "\"at\" in " + where + " names a mass of the lumped"
                                + " model, such as \"at\": \"" + shape.masses().stream().findFirst().orElse("pump")
                                + "\"; a point {\"x\", \"y\", \"z\"} is for a rigid body");
                    }
                    return written;
                }
                if (shape.onlyMass().isPresent()) {
                    return Optional.of(new ResponsePoint.Mass(shape.onlyMass().get(), criterion));
                }
                if (shape.severalMasses() && (!isolation || baseMotion)) {
                    problems.add(criterion, where + " needs \"at\": the mass whose " + (isolation
                            ? "motion is compared with the base motion" : "response is judged") + ", such as \"at\": \""
                            + shape.masses().get(0) + "\"; the model has several masses ("
                            + Geometry.names(shape.masses()) + ")");
                }
                return Optional.empty();
            }
            case RIGID_BODY -> {
                if (written.isPresent()) {
                    if (written.get() instanceof ResponsePoint.Mass m) {
                        problems.add(m.location(), "\"at\" in " + where + " is a point on the rigid body, such as"
                                + " \"at\": " + Geometry.POINT_EXAMPLE + "; a mass name is for a lumped model");
                    }
                    return written;
                }
                if (!isolation) {
                    problems.add(criterion, where + " needs \"at\": the point on the rigid body whose response is"
                            + " judged, such as \"at\": " + Geometry.POINT_EXAMPLE + " (and \"axis\": \"z\" for one"
                            + " axis; without it the largest axis counts)");
                    return Optional.empty();
                }
                // Isolation without "at" looks at the centre of gravity (spec-format.md, criteria); left
                // empty, so that findings can call it by that name.
                return Optional.empty();
            }
            default -> throw new IllegalStateException(shape.kind().toString());
        }
    }

    private static SourceLocation location(ResponsePoint p) {
        return p instanceof ResponsePoint.Mass m ? m.location() : ((ResponsePoint.OnBody) p).point().location();
    }
}
