package org.resonancegate.dynamics;

/**
 * One degree of freedom's share of a mode's kinetic energy, f_j = |φ_j·(Mφ)_j| normalised to sum 1.
 *
 * @param motion   "x", "y", "z", "rx", "ry", "rz" for a rigid body, the mass name for a chain
 * @param reading  the same for a reader ("rocking about y")
 */
public record MotionShare(String motion, String reading, double fraction) {
}
