package org.resonancegate.criteria;

/**
 * The textbook single-degree-of-freedom formulas of check-values.md §1, written out here in
 * plain real arithmetic so tests compare the engine against something it does not share.
 */
final class Sdof {

    private Sdof() {
    }

    /** 1.1: D(β, ζ) = 1/√[(1 − β²)² + (2ζβ)²]. */
    static double magnification(double beta, double zeta) {
        return 1 / Math.sqrt(Math.pow(1 - beta * beta, 2) + Math.pow(2 * zeta * beta, 2));
    }

    /** 1.4: T(β, ζ) = √[(1 + (2ζβ)²) / ((1 − β²)² + (2ζβ)²)]. */
    static double transmissibility(double beta, double zeta) {
        return Math.sqrt(1 + Math.pow(2 * zeta * beta, 2)) * magnification(beta, zeta);
    }

    /** 1.3 and 1.8: the common peak height 1/(2ζ√(1 − ζ²)). */
    static double peakHeight(double zeta) {
        return 1 / (2 * zeta * Math.sqrt(1 - zeta * zeta));
    }
}
