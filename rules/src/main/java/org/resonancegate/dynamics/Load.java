package org.resonancegate.dynamics;

import org.apache.commons.math3.complex.Complex;

/**
 * A harmonic input at one angular frequency, as a complex amplitude (the input is
 * Re(A·e^{iωt})). Where it acts is part of the load so that multi-degree-of-freedom systems can
 * add a point and direction without changing the criteria.
 */
public sealed interface Load {

    /** The complex amplitude of the input: a force in N or a ground displacement in m. */
    Complex amplitude();

    /** A force along the model's line (single mass: on the mass, vertical). */
    record Force(Complex amplitude) implements Load {
    }

    /** The ground moves under every spring with this displacement amplitude (m). */
    record GroundMotion(Complex amplitude) implements Load {
    }
}
