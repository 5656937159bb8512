package org.resonancegate.criteria;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.resonancegate.dynamics.Drive;
import org.resonancegate.dynamics.Drives;
import org.resonancegate.dynamics.LinearSystem;
import org.resonancegate.dynamics.Mode;
import org.resonancegate.spec.Excitation;
import org.resonancegate.spec.ExcitationFrequency;
import org.resonancegate.spec.Operation;

/** One model case to judge: the system, its speed range and its excitations. */
public record RuleContext(LinearSystem system, Operation operation, List<Excitation> excitations) {

    public RuleContext {
        excitations = List.copyOf(excitations);
    }

    public double minSpeed() {
        return operation.minSpeed().si();
    }

    public double maxSpeed() {
        return operation.maxSpeed().si();
    }

    public boolean fixedSpeed() {
        return operation.fixedSpeed() || minSpeed() == maxSpeed();
    }

    /** The loads of every excitation that carries one, in listing order, at running speed {@code speed}. */
    public List<Drive> drivesAt(double speed) {
        List<Drive> out = new ArrayList<>();
        for (Excitation e : excitations) {
            Drives.at(e, speed, operation).ifPresent(out::add);
        }
        return out;
    }

    /** Whether any excitation puts a load on the system (order-only ones do not). */
    public boolean hasDrives() {
        return excitations.stream().anyMatch(e -> !(e instanceof Excitation.OrderOnly));
    }

    /**
     * Running speeds where a response peak can sit: for every mode and every order that carries a
     * load, the resonance speed ω_r/n and the speeds of the closed-form single-mass peaks
     * (displacement under a force β = √(1 − 2ζ²), under unbalance β = 1/√(1 − 2ζ²),
     * transmissibility β = √(√(1 + 8ζ²) − 1)/(2ζ)). They seed the sweep; refinement does the rest.
     */
    public List<Double> specialSpeeds() {
        List<Double> out = new ArrayList<>();
        for (Excitation e : excitations) {
            if (e instanceof Excitation.OrderOnly || !(e.frequency() instanceof ExcitationFrequency.Order o)) {
                continue;
            }
            if (o.order() <= 0) {
                continue;
            }
            for (Mode m : system.modes()) {
                double base = m.angularFrequency() / o.order();
                out.add(base);
                double z = m.dampingRatio().orElse(0);
                if (2 * z * z < 1) {
                    out.add(base * Math.sqrt(1 - 2 * z * z));
                    out.add(base / Math.sqrt(1 - 2 * z * z));
                }
                if (z > 0) {
                    out.add(base * Math.sqrt(Math.sqrt(1 + 8 * z * z) - 1) / (2 * z));
                }
            }
        }
        return out;
    }

    /** The mode nearest (in frequency ratio) to angular frequency {@code omega}, if any. */
    public Optional<Mode> nearestMode(double omega) {
        Mode best = null;
        double bestDistance = Double.POSITIVE_INFINITY;
        for (Mode m : system.modes()) {
            if (!(m.angularFrequency() > 0)) {
                continue;
            }
            double d = Math.abs(Math.log(omega / m.angularFrequency()));
            if (d < bestDistance) {
                bestDistance = d;
                best = m;
            }
        }
        return Optional.ofNullable(best);
    }
}
