package org.resonancegate.dynamics;

import java.util.Optional;
import java.util.OptionalDouble;
import org.resonancegate.spec.Damping;
import org.resonancegate.spec.Model;
import org.resonancegate.spec.Stiffness;

/**
 * Builds the {@link LinearSystem} a spec's model stands for, at one tolerance case: every
 * stiffness × s_k, every mass and inertia × s_m; damping ratios and loss factors are kept,
 * dashpot coefficients are not scaled.
 */
public final class SystemBuilder {

    private SystemBuilder() {
    }

    public static LinearSystem build(Model model, ModelScale scale) {
        return build(model, scale, Optional.empty());
    }

    /**
     * As {@link #build(Model, ModelScale)}, reusing the modes of {@code sameModel} when it is
     * this very model built at another tolerance scale: a tolerance case scales every stiffness
     * by one factor and every mass by another, which leaves the mode shapes and scales the
     * eigenvalues exactly, so one eigen solution serves every case (a different model, or none,
     * and the eigenproblem is solved).
     */
    public static LinearSystem build(Model model, ModelScale scale, Optional<LinearSystem> sameModel) {
        if (model instanceof Model.Lumped lumped) {
            return new LumpedLine(lumped, scale, modalRatio(lumped.damping()),
                    sameModel.filter(LumpedLine.class::isInstance).map(LumpedLine.class::cast));
        } else if (model instanceof Model.RigidBody body) {
            return new RigidBody6(body, scale, modalRatio(body.damping()),
                    sameModel.filter(RigidBody6.class::isInstance).map(RigidBody6.class::cast));
        }
        Model.Single single = (Model.Single) model;
        double nominalMass = single.mass().si();
        // The spring is resolved at the nominal mass and then scaled like any stiffness: a
        // stiffness stated as a static deflection or a frequency is a property of the isolator,
        // so it does not follow the mass tolerance.
        double k = nominalStiffness(single.stiffness(), nominalMass) * scale.stiffness();
        double m = nominalMass * scale.mass();
        double c;
        if (single.damping() instanceof Damping.Coefficient coefficient) {
            c = coefficient.value().si(); // a dashpot keeps its coefficient in every case
        } else {
            c = DampingRatios.coefficientFor(DampingRatios.ratioOf(single.damping()), k, m);
        }
        return new SingleMass(m, k, c);
    }

    /** A model-level damping as a modal ratio; empty when the elements carry the damping. */
    private static OptionalDouble modalRatio(Optional<Damping> damping) {
        return damping.isPresent() ? OptionalDouble.of(DampingRatios.ratioOf(damping.get())) : OptionalDouble.empty();
    }

    /** k from its three written forms: direct; δ → k = m·gn/δ; f → k = m·(2πf)². */
    public static double nominalStiffness(Stiffness stiffness, double mass) {
        double written = stiffness.written().si();
        if (stiffness instanceof Stiffness.Direct) {
            return written;
        } else if (stiffness instanceof Stiffness.FromStaticDeflection) {
            return mass * StandardGravity.GN / written;
        }
        // FromNaturalFrequency: the quantity's SI value is an angular frequency in rad/s.
        return mass * written * written;
    }
}
