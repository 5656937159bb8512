package org.resonancegate.dynamics;

/**
 * The steady-state complex response of a linear system to one {@link Load} at one angular
 * frequency (each quantity is Re(A·e^{iωt})).
 *
 * @param displacements absolute amplitudes of the degrees of freedom (single mass, chain: each mass
 *                      along the line; rigid body: x, y, z of the centre of gravity and rotations
 *                      about x, y, z); a {@link Probe} turns them into the motion of a point
 * @param elementForces dynamic force (elastic plus damping) in each element row: one per spring,
 *                      three (x, y, z) per mount, in {@link LinearSystem#elementRows()} order
 * @param groundForces  the total force into the ground: one component along a line, x, y, z for a body
 */
public record Response(Phasors displacements, Phasors elementForces, Phasors groundForces) {
}
