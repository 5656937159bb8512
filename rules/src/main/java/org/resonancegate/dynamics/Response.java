package org.resonancegate.dynamics;

import java.util.Optional;

/**
 * The steady-state complex response of a linear system to one {@link Load} at one angular
 * frequency (each quantity is Re(A·e^{iωt})).
 *
 * <p>A modal model hands over its modal amplitudes and each quantity is formed when first read
 * (so a response is read by one thread, like the context that holds it):
 * a criterion that refines its own peak reads one quantity only (the motion of a point, the
 * mount forces or the ground force), and forming the others would cost most of the time.
 */
public final class Response {

    /** Forms the quantities of a response from what the model kept; each is asked at most once. */
    interface Parts {
        Phasors displacements();

        Phasors elementForces();

        Phasors groundForces();

        /**
         * The motion along each of {@code gathers} into {@code re}, {@code im}, when the parts can
         * give it without forming every degree of freedom; {@code false} when they cannot.
         */
        default boolean along(double[][] gathers, double[] re, double[] im) {
            return false;
        }

        /**
         * The dynamic force of each of element rows {@code rows} into {@code re}, {@code im},
         * when the parts can give them without forming every row; {@code false} when they cannot.
         */
        default boolean forces(int[] rows, double[] re, double[] im) {
            return false;
        }

        /**
         * The parts of this response plus {@code other}'s, combined before any quantity is
         * formed; {@code null} when they cannot be.
         */
        default Parts plus(Parts other) {
            return null;
        }
    }

    private Parts parts;
    private Phasors displacements;
    private Phasors elementForces;
    private Phasors groundForces;

    /**
     * @param displacements absolute amplitudes of the degrees of freedom (single mass, chain: each
     *                      mass along the line; rigid body: x, y, z of the centre of gravity and
     *                      rotations about x, y, z); a {@link Probe} turns them into the motion of a point
     * @param elementForces dynamic force (elastic plus damping) in each element row: one per spring,
     *                      three (x, y, z) per mount, in {@link LinearSystem#elementRows()} order
     * @param groundForces  the total force into the ground: one component along a line, x, y, z for a body
     */
    public Response(Phasors displacements, Phasors elementForces, Phasors groundForces) {
        this.displacements = displacements;
        this.elementForces = elementForces;
        this.groundForces = groundForces;
    }

    Response(Parts parts) {
        this.parts = parts;
    }

    /**
     * The response to this response's load and {@code other}'s together, when the model can add
     * them in modal space: both from one modal model at one angular frequency, to the bit. Then
     * the mount forces or point motions of several drives at one frequency are formed once
     * instead of once per drive (the sum is exact; only the rounding of the last bit can differ
     * from adding the formed quantities). Empty otherwise.
     */
    public Optional<Response> plusModal(Response other) {
        Parts combined = parts != null && other.parts != null ? parts.plus(other.parts) : null;
        return combined == null ? Optional.empty() : Optional.of(new Response(combined));
    }

    /**
     * The complex motion g·q along each row g of {@code gathers} (rows over the degrees of
     * freedom, as a {@link Probe} has), into {@code re} and {@code im}. A modal model keeps each
     * row's modal coefficients g·φ_r, so a motion is a sum over the modes and the degrees of
     * freedom are not formed (the same sum in another order: only the last bit can differ);
     * any other response reads its displacements.
     */
    public void along(double[][] gathers, double[] re, double[] im) {
        if (displacements == null && parts != null && parts.along(gathers, re, im)) {
            return;
        }
        Phasors q = displacements();
        for (int j = 0; j < gathers.length; j++) {
            double[] g = gathers[j];
            double r = 0;
            double i = 0;
            for (int k = 0; k < g.length; k++) {
                r += g[k] * q.re[k];
                i += g[k] * q.im[k];
            }
            re[j] = r;
            im[j] = i;
        }
    }

    /**
     * The dynamic force in each of element rows {@code rows} (indices into
     * {@link #elementForces()}), into {@code re} and {@code im}: the same numbers, but a modal
     * model forms only those rows and keeps no vector of them (a sweep reads each response once).
     */
    public void elementForces(int[] rows, double[] re, double[] im) {
        if (elementForces == null && parts != null && parts.forces(rows, re, im)) {
            return;
        }
        Phasors f = elementForces();
        for (int j = 0; j < rows.length; j++) {
            re[j] = f.re[rows[j]];
            im[j] = f.im[rows[j]];
        }
    }

    /** Absolute amplitudes of the degrees of freedom. */
    public Phasors displacements() {
        if (displacements == null) {
            displacements = parts.displacements();
        }
        return displacements;
    }

    /** Dynamic force in each element row, in {@link LinearSystem#elementRows()} order. */
    public Phasors elementForces() {
        if (elementForces == null) {
            elementForces = parts.elementForces();
        }
        return elementForces;
    }

    /** The total force into the ground. */
    public Phasors groundForces() {
        if (groundForces == null) {
            groundForces = parts.groundForces();
        }
        return groundForces;
    }
}
