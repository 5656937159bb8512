package org.resonancegate.dynamics;

import java.util.List;
import java.util.Optional;
import org.resonancegate.spec.Direction;
import org.resonancegate.spec.ResponsePoint;

/**
 * A linear vibrating system ready to be judged: its modes, its static deflections under gravity,
 * and its complex steady-state response to a harmonic load. The criteria see only this.
 */
public sealed interface LinearSystem permits SingleMass, LumpedLine, RigidBody6 {

    /** Undamped natural modes in ascending frequency. */
    List<Mode> modes();

    /**
     * Deflection under gravity of each spring or mount (m, positive in compression), in listing
     * order; empty where gravity does not apply (torsion).
     */
    List<Double> staticDeflections();

    /** How a message names each spring or mount (empty strings when there is only one). */
    List<String> elementLabels();

    /** The force-carrying rows of {@link Response#elementForces()}, in order. */
    List<ElementRow> elementRows();

    /** The steady-state response to {@code load} at angular frequency {@code omega} (rad/s). */
    Response respond(Load load, double omega);

    /**
     * The points and axes a response criterion looks at: the named point (all three axes unless one
     * is named), or by default the mass (every mass of a chain) or the centre of gravity.
     */
    List<Probe> probes(Optional<ResponsePoint> at);

    /** Like {@link #probes}, but each point along one direction (base-motion transmissibility). */
    List<Probe> probesAlong(Optional<ResponsePoint> at, Direction direction);

    /** Whether the coordinates are angles (torsion): rad, rad/s and N·m instead of m, m/s and N. */
    default boolean rotational() {
        return false;
    }

    /** Degrees of freedom. */
    default int degreesOfFreedom() {
        return modes().size();
    }
}
