package org.resonancegate.dynamics;

import org.resonancegate.spec.Damping;

/** Turns the written forms of damping into an equivalent viscous damping ratio ζ. */
public final class DampingRatios {

    private DampingRatios() {
    }

    /** ζ = η/2 (loss factor η). */
    public static double fromLossFactor(double eta) {
        return eta / 2;
    }

    /** ζ = 1/(2Q). */
    public static double fromQualityFactor(double q) {
        return 1 / (2 * q);
    }

    /** ζ = δ/√(4π² + δ²) (logarithmic decrement δ; exact inverse of δ = 2πζ/√(1 − ζ²)). */
    public static double fromLogDecrement(double delta) {
        return delta / Math.sqrt(4 * Math.PI * Math.PI + delta * delta);
    }

    /** ζ = c/(2√(k·m)). */
    public static double fromCoefficient(double c, double k, double m) {
        return c / (2 * Math.sqrt(k * m));
    }

    /** c = 2ζ√(k·m): the dashpot that gives ratio ζ on this mass and spring. */
    public static double coefficientFor(double zeta, double k, double m) {
        return 2 * zeta * Math.sqrt(k * m);
    }

    /**
     * The damping ratio a written form stands for, for a ratio-type form (ratio, loss factor,
     * Q, log decrement). A {@link Damping.Coefficient} is a dashpot, not a ratio: it has no ratio
     * of its own until k and m are known, so it is refused here.
     */
    public static double ratioOf(Damping damping) {
        if (damping instanceof Damping.Ratio r) {
            return r.value().value();
        } else if (damping instanceof Damping.LossFactor l) {
            return fromLossFactor(l.value().value());
        } else if (damping instanceof Damping.QualityFactor q) {
            return fromQualityFactor(q.value().value());
        } else if (damping instanceof Damping.LogDecrement d) {
            return fromLogDecrement(d.value().value());
        }
        throw new IllegalArgumentException("a damping coefficient is a dashpot, not a ratio");
    }
}
