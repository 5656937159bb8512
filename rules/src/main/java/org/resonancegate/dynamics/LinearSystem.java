package org.resonancegate.dynamics;

import java.util.List;

/**
 * A linear vibrating system ready to be judged: its modes, its static deflections under gravity,
 * and its complex steady-state response to a harmonic load. The criteria see only this, so a
 * lumped chain or a six-degree-of-freedom rigid body (generalised eigen solve, complex linear
 * solve) joins as another permitted implementation without touching them.
 */
public sealed interface LinearSystem permits SingleMass {

    /** Undamped natural modes in ascending frequency. */
    List<Mode> modes();

    /** Deflection under gravity of each spring or mount (m, positive in compression). */
    List<Double> staticDeflections();

    /** The steady-state response to {@code load} at angular frequency {@code omega} (rad/s). */
    Response respond(Load load, double omega);
}
