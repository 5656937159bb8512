package org.resonancegate.dynamics;

import java.util.Optional;
import org.apache.commons.math3.complex.Complex;
import org.resonancegate.spec.Excitation;
import org.resonancegate.spec.ExcitationFrequency;
import org.resonancegate.spec.Operation;
import org.resonancegate.spec.UnbalanceAmount;

/** Turns spec excitations into loads at a running speed. */
public final class Drives {

    private Drives() {
    }

    /** The excitation's angular frequency (rad/s) at running speed {@code speed} (rad/s). */
    public static double omega(ExcitationFrequency frequency, double speed) {
        if (frequency instanceof ExcitationFrequency.Order o) {
            return o.order() * speed;
        }
        return ((ExcitationFrequency.Fixed) frequency).frequency().si();
    }

    /**
     * The load an excitation puts on the system at running speed {@code speed} (rad/s); empty for
     * an order-only excitation, which carries no force.
     */
    public static Optional<Drive> at(Excitation excitation, double speed, Operation operation) {
        double omega = omega(excitation.frequency(), speed);
        boolean follows = excitation.frequency() instanceof ExcitationFrequency.Order;
        Complex phase = Complex.I.multiply(excitation.phase()).exp();
        if (excitation instanceof Excitation.Unbalance u) {
            double unbalance = unbalance(u, operation);
            return Optional.of(new Drive(u, omega, new Load.Force(phase.multiply(unbalance * omega * omega), u.placement()), true));
        } else if (excitation instanceof Excitation.Force f) {
            return Optional.of(new Drive(f, omega, new Load.Force(phase.multiply(f.amplitude().si()), f.placement()), follows));
        } else if (excitation instanceof Excitation.BaseMotion b) {
            return Optional.of(new Drive(b, omega, new Load.GroundMotion(groundDisplacement(b, omega), b.direction()), follows));
        }
        return Optional.empty(); // Excitation.OrderOnly
    }

    /**
     * The ground displacement phasor. The stated quantity carries the phase; integrating a
     * harmonic divides by iω: Y = V/(iω), Y = A/(iω)² = −A/ω². The magnitudes are V/ω and A/ω².
     */
    static Complex groundDisplacement(Excitation.BaseMotion b, double omega) {
        Complex stated = Complex.I.multiply(b.phase()).exp().multiply(b.amplitude().si());
        switch (b.measure()) {
            case DISPLACEMENT:
                return stated;
            case VELOCITY:
                return stated.divide(new Complex(0, omega));
            case ACCELERATION:
                return stated.divide(-omega * omega);
            default:
                throw new IllegalStateException("unknown motion measure " + b.measure());
        }
    }

    /**
     * U in kg·m. From a balance grade, ISO 21940-11: U = rotorMass·G/Ω_max with G in m/s and
     * Ω_max = order × the top of the speed range in rad/s; it stays fixed over the speed range.
     * The rotor mass is the rotor's, not a model mass, so tolerance cases never scale it.
     */
    public static double unbalance(Excitation.Unbalance u, Operation operation) {
        if (u.amount() instanceof UnbalanceAmount.Direct d) {
            return d.unbalance().si();
        }
        UnbalanceAmount.FromBalanceGrade g = (UnbalanceAmount.FromBalanceGrade) u.amount();
        double omegaMax = u.frequency().order() * operation.maxSpeed().si();
        return permissibleUnbalance(g.gradeMmPerS(), g.rotorMass().si(), omegaMax);
    }

    /** ISO 21940-11: U_per = M·G/Ω (kg·m), G given in mm/s, Ω in rad/s. */
    public static double permissibleUnbalance(double gradeMmPerS, double rotorMass, double omegaMax) {
        return rotorMass * (gradeMmPerS / 1000) / omegaMax;
    }
}
