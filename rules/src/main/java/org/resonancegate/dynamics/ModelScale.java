package org.resonancegate.dynamics;

/**
 * Factors applied to a model for a tolerance case: every stiffness by {@code stiffness}, every
 * mass and inertia by {@code mass}. Damping ratios are kept; dashpot coefficients are not scaled.
 */
public record ModelScale(double stiffness, double mass) {

    public static final ModelScale NOMINAL = new ModelScale(1, 1);
}
