package org.resonancegate.dynamics;

import org.apache.commons.math3.complex.Complex;

/**
 * The motion of one point along one axis as a linear function of the degrees of freedom,
 * u = g·q (rigid body: a row of u(p) = x_c + θ × (p − cg); chain: picks one mass).
 *
 * @param label how a message names it; empty when the model has only this one point to look at
 */
public record Probe(String label, double[] gather) {

    public Complex of(Response r) {
        return r.displacements().dot(gather);
    }
}
