package org.resonancegate.check;

import java.util.ArrayList;
import java.util.List;
import org.resonancegate.criteria.Numbers;
import org.resonancegate.report.InputValue;
import org.resonancegate.spec.AxisValues;
import org.resonancegate.spec.Damping;
import org.resonancegate.spec.ElementDamping;
import org.resonancegate.spec.Excitation;
import org.resonancegate.spec.ExcitationFrequency;
import org.resonancegate.spec.Model;
import org.resonancegate.spec.Operation;
import org.resonancegate.spec.Point;
import org.resonancegate.spec.Quantity;
import org.resonancegate.spec.SourceLocation;
import org.resonancegate.spec.Spec;
import org.resonancegate.spec.Stiffness;
import org.resonancegate.spec.UnbalanceAmount;

/**
 * The inputs a reviewer wants beside a verdict, as the user wrote them: the text of each value is
 * kept by the reader, so "1.45 MN/m" stays "1.45 MN/m". Values the reader keeps only in SI (a
 * mount's stiffness per axis, element damping) are worded in SI.
 */
final class SpecInputs {

    private final List<InputValue> out = new ArrayList<>();

    private SpecInputs() {
    }

    static List<InputValue> of(Spec spec) {
        SpecInputs in = new SpecInputs();
        in.model(spec.model());
        in.operation(spec.operation());
        for (Excitation e : spec.excitations()) {
            in.add("excitation", e.name(), excitation(e), e.location());
        }
        spec.tolerances().stiffness().ifPresent(t -> in.add("tolerances", "stiffness", "± " + t.text(), t.location()));
        spec.tolerances().mass().ifPresent(t -> in.add("tolerances", "mass", "± " + t.text(), t.location()));
        return List.copyOf(in.out);
    }

    private void add(String group, String label, String text, SourceLocation location) {
        out.add(new InputValue(group, label, text, location));
    }

    private void model(Model model) {
        if (model instanceof Model.Single s) {
            add("model", "kind", "single mass on one spring", s.location());
            add("model", "mass", s.mass().text(), s.mass().location());
            Stiffness k = s.stiffness();
            String label = k instanceof Stiffness.FromStaticDeflection ? "static deflection"
                    : k instanceof Stiffness.FromNaturalFrequency ? "natural frequency" : "stiffness";
            add("model", label, k.written().text(), k.written().location());
            damping(s.damping());
        } else if (model instanceof Model.Lumped l) {
            boolean torsion = l.motion() == Model.Motion.TORSION;
            add("model", "kind", "lumped " + l.motion().key() + (l.free() ? ", free" : ""), l.location());
            for (Model.LumpedMass m : l.masses()) {
                add("model", (torsion ? "inertia '" : "mass '") + m.name() + "'", m.mass().text(), m.mass().location());
            }
            for (Model.Spring s : l.springs()) {
                String damped = s.damping().map(d -> ", " + elementDamping(d, torsion, false)).orElse("");
                add("model", "spring '" + s.name() + "' (" + s.from() + " to " + s.to() + ")",
                        s.stiffness().text() + damped, s.stiffness().location());
            }
            l.damping().ifPresent(this::damping);
        } else if (model instanceof Model.RigidBody r) {
            add("model", "kind", "rigid body on mounts", r.location());
            add("model", "mass", r.mass().text(), r.mass().location());
            add("model", "centre of gravity", point(r.centreOfGravity()), r.centreOfGravity().location());
            add("model", "moments of inertia", "xx " + r.inertia().xx().text() + ", yy " + r.inertia().yy().text()
                    + ", zz " + r.inertia().zz().text(), r.inertia().location());
            for (Model.Mount m : r.mounts()) {
                String damped = m.damping().map(d -> "; " + elementDamping(d, false, true)).orElse("");
                add("model", "mount '" + m.name() + "'", "at " + point(m.position()) + "; stiffness "
                        + axes(m.stiffness(), "N/m") + damped, m.location());
            }
            r.damping().ifPresent(this::damping);
        }
    }

    private void damping(Damping d) {
        if (d instanceof Damping.Ratio r) {
            add("model", "damping ratio", r.value().text(), d.location());
        } else if (d instanceof Damping.LossFactor f) {
            add("model", "loss factor", f.value().text(), d.location());
        } else if (d instanceof Damping.QualityFactor q) {
            add("model", "Q", q.value().text(), d.location());
        } else if (d instanceof Damping.LogDecrement l) {
            add("model", "log decrement", l.value().text(), d.location());
        } else if (d instanceof Damping.Coefficient c) {
            add("model", "damping coefficient", c.value().text(), d.location());
        }
    }

    private static String elementDamping(ElementDamping d, boolean torsion, boolean perAxis) {
        String unit = torsion ? "N·m·s/rad" : "N·s/m";
        if (d instanceof ElementDamping.Viscous v) {
            return "dashpot " + (perAxis ? axes(v.values(), unit) : Numbers.sig(v.values().x(), 4) + " " + unit);
        }
        AxisValues h = d.values();
        return "loss factor " + (perAxis ? axes(h, "") : Numbers.sig(h.x(), 4));
    }

    private static String axes(AxisValues v, String unit) {
        String suffix = unit.isEmpty() ? "" : " " + unit;
        if (v.x() == v.y() && v.y() == v.z()) {
            return Numbers.sig(v.x(), 4) + suffix;
        }
        return "x " + Numbers.sig(v.x(), 4) + ", y " + Numbers.sig(v.y(), 4) + ", z " + Numbers.sig(v.z(), 4) + suffix;
    }

    private static String point(Point p) {
        return "(" + p.x().text() + ", " + p.y().text() + ", " + p.z().text() + ")";
    }

    private void operation(Operation o) {
        String text = o.fixedSpeed() || o.minSpeed().si() == o.maxSpeed().si()
                ? o.minSpeed().text() + ", fixed"
                : o.minSpeed().text() + " to " + o.maxSpeed().text();
        add("operation", "running speed", text, o.location());
    }

    private static String excitation(Excitation e) {
        StringBuilder b = new StringBuilder();
        if (e instanceof Excitation.Unbalance u) {
            b.append("unbalance, ").append(frequency(u.frequency())).append(", ");
            if (u.amount() instanceof UnbalanceAmount.Direct d) {
                b.append(d.unbalance().text());
            } else if (u.amount() instanceof UnbalanceAmount.FromBalanceGrade g) {
                b.append(g.gradeText()).append(" on a ").append(g.rotorMass().text()).append(" rotor");
            }
        } else if (e instanceof Excitation.Force f) {
            b.append("force, ").append(frequency(f.frequency())).append(", ").append(f.amplitude().text());
        } else if (e instanceof Excitation.BaseMotion m) {
            b.append("base motion, ").append(frequency(m.frequency())).append(", ")
                    .append(m.measure().name().toLowerCase(java.util.Locale.ROOT)).append(' ')
                    .append(m.amplitude().text());
        } else if (e instanceof Excitation.OrderOnly o) {
            b.append("frequency only, ").append(frequency(o.frequency()));
        }
        if (e.phase() != 0) {
            b.append(", phase ").append(Numbers.sig(Math.toDegrees(e.phase()), 4)).append('°');
        }
        return b.toString();
    }

    private static String frequency(ExcitationFrequency f) {
        if (f instanceof ExcitationFrequency.Order o) {
            return "order " + Numbers.sig(o.order(), 6);
        }
        Quantity q = ((ExcitationFrequency.Fixed) f).frequency();
        return "at " + q.text();
    }
}
