package org.resonancegate.dynamics;

import org.resonancegate.spec.Damping;
import org.resonancegate.spec.Model;
import org.resonancegate.spec.Stiffness;

/** Builds the {@link LinearSystem} a spec's model stands for, at one tolerance case. */
public final class SystemBuilder {

    private SystemBuilder() {
    }

    public static LinearSystem build(Model model, ModelScale scale) {
        // Model is sealed; further kinds join here as further branches.
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
