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
        if (excitation instanceof Excitation.OrderOnly) {
            return Optional.empty();
        }
        return Optional.of(prepare(excitation, operation).at(speed));
    }

    /**
     * An excitation made ready to give its load at many speeds: the phase factor e^{iφ}, the
     * unbalance and any fixed amplitude are worked out once (a sweep asks at hundreds of speeds,
     * and the complex exponential costs more than the rest). The loads are the same numbers
     * {@link #at} gives.
     *
     * @throws IllegalArgumentException for an order-only excitation, which carries no load
     */
    public static Prepared prepare(Excitation excitation, Operation operation) {
        return new Prepared(excitation, operation);
    }

    /** One excitation's loads, ready for any running speed. */
    public static final class Prepared {

        private final Excitation source;
        private final boolean follows;
        private final Complex phase;
        private final double unbalance;
        private final Load fixedLoad;
        private final Complex statedMotion;

        private Prepared(Excitation excitation, Operation operation) {
            if (excitation instanceof Excitation.OrderOnly) {
                throw new IllegalArgumentException("order-only excitation '" + excitation.name() + "' carries no load");
            }
            source = excitation;
            follows = excitation.frequency() instanceof ExcitationFrequency.Order;
            phase = Complex.I.multiply(excitation.phase()).exp();
            unbalance = excitation instanceof Excitation.Unbalance u ? unbalance(u, operation) : 0;
            fixedLoad = excitation instanceof Excitation.Force f
                    ? new Load.Force(phase.multiply(f.amplitude().si()), f.placement()) : null;
            statedMotion = excitation instanceof Excitation.BaseMotion b ? stated(b) : null;
        }

        public Excitation source() {
            return source;
        }

        /** The load at running speed {@code speed} (rad/s). */
        public Drive at(double speed) {
            double omega = omega(source.frequency(), speed);
            if (source instanceof Excitation.Unbalance u) {
                return new Drive(u, omega, new Load.Force(phase.multiply(unbalance * omega * omega), u.placement()), true);
            } else if (fixedLoad != null) {
                return new Drive(source, omega, fixedLoad, follows);
            }
            Excitation.BaseMotion b = (Excitation.BaseMotion) source;
            return new Drive(b, omega, new Load.GroundMotion(integrated(b, statedMotion, omega), b.direction()), follows);
        }
    }

    /**
     * The ground displacement phasor. The stated quantity carries the phase; integrating a
     * harmonic divides by iω: Y = V/(iω), Y = A/(iω)² = −A/ω². The magnitudes are V/ω and A/ω².
     */
    static Complex groundDisplacement(Excitation.BaseMotion b, double omega) {
        return integrated(b, stated(b), omega);
    }

    /** The stated ground quantity as a phasor (its phase included). */
    private static Complex stated(Excitation.BaseMotion b) {
        return Complex.I.multiply(b.phase()).exp().multiply(b.amplitude().si());
    }

    /** The ground displacement from the stated phasor: as is, or divided by iω or (iω)². */
    private static Complex integrated(Excitation.BaseMotion b, Complex stated, double omega) {
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
