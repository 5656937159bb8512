package org.resonancegate.dynamics;

import java.util.List;
import org.apache.commons.math3.complex.Complex;

/**
 * The steady-state complex response of a linear system to one {@link Load} at one angular
 * frequency. Each list holds one complex amplitude per component; criteria combine excitations
 * component by component and then take the largest, so a model with several points, axes or
 * springs only has to fill longer lists.
 *
 * @param displacements absolute displacement amplitudes (m) of the response points
 * @param elementForces  dynamic force (elastic plus damping) through each spring or mount (N)
 * @param groundForces   force into the ground (N), per component
 */
public record Response(List<Complex> displacements, List<Complex> elementForces, List<Complex> groundForces) {

    public Response {
        displacements = List.copyOf(displacements);
        elementForces = List.copyOf(elementForces);
        groundForces = List.copyOf(groundForces);
    }
}
