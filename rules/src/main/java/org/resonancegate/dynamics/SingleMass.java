package org.resonancegate.dynamics;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.apache.commons.math3.complex.Complex;
import org.resonancegate.spec.Direction;
import org.resonancegate.spec.ResponsePoint;

/**
 * One mass on one spring with a viscous dashpot in parallel, solved in closed form.
 * Receptance: x = F/(k − mω² + iωc); under ground motion y the absolute motion is
 * x = (k + iωc)·y/(k − mω² + iωc); the spring-and-dashpot force is (k + iωc)·(x − y).
 *
 * @param mass      m in kg
 * @param stiffness k in N/m
 * @param dashpot   c in N·s/m
 */
public record SingleMass(double mass, double stiffness, double dashpot) implements LinearSystem {

    private static final List<Probe> THE_MASS = List.of(new Probe("", new double[] {1}));
    private static final List<ElementRow> THE_SPRING = List.of(new ElementRow(0, Optional.empty(), ""));

    public SingleMass {
        if (!(mass > 0) || !(stiffness > 0) || !(dashpot >= 0)
                || Double.isInfinite(mass) || Double.isInfinite(stiffness) || Double.isInfinite(dashpot)) {
            throw new IllegalArgumentException("a single mass needs finite m > 0, k > 0 and c ≥ 0; got m = "
                    + mass + " kg, k = " + stiffness + " N/m, c = " + dashpot + " N·s/m");
        }
    }

    /** ω_n = √(k/m). */
    public double naturalAngularFrequency() {
        return Math.sqrt(stiffness / mass);
    }

    /** ζ = c/(2√(k·m)). */
    public double dampingRatio() {
        return dashpot / (2 * Math.sqrt(stiffness * mass));
    }

    @Override
    public List<Mode> modes() {
        return List.of(new Mode(1, naturalAngularFrequency(), OptionalDouble.of(dampingRatio())));
    }

    /** δ = m·gn/k. */
    @Override
    public List<Double> staticDeflections() {
        return List.of(mass * StandardGravity.GN / stiffness);
    }

    @Override
    public List<String> elementLabels() {
        return List.of("");
    }

    @Override
    public List<ElementRow> elementRows() {
        return THE_SPRING;
    }

    @Override
    public List<Probe> probes(Optional<ResponsePoint> at) {
        return THE_MASS;
    }

    @Override
    public List<Probe> probesAlong(Optional<ResponsePoint> at, Direction direction) {
        return THE_MASS;
    }

    @Override
    public Response respond(Load load, double omega) {
        Complex springAndDashpot = new Complex(stiffness, omega * dashpot);
        Complex dynamicStiffness = new Complex(stiffness - mass * omega * omega, omega * dashpot);
        // Java 17 has no pattern switch; Load is sealed with exactly these two kinds.
        Complex x;
        Complex relative;
        if (load instanceof Load.Force f) {
            x = f.amplitude().divide(dynamicStiffness);
            relative = x;
        } else {
            Complex y = ((Load.GroundMotion) load).amplitude();
            x = springAndDashpot.multiply(y).divide(dynamicStiffness);
            relative = x.subtract(y);
        }
        Complex springForce = springAndDashpot.multiply(relative);
        return new Response(Phasors.of(x), Phasors.of(springForce), Phasors.of(springForce));
    }
}
