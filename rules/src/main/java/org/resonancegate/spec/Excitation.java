package org.resonancegate.spec;

/**
 * A source of excitation. Every kind has a name and a phase (rad; the excitation is
 * A·cos(ωt + φ)). Amplitudes are peak values in SI.
 */
public sealed interface Excitation {

    String name();

    /** Where it acts: along the line ({@code single}), on a mass ({@code lumped}) or at a point ({@code rigid-body}). */
    Placement placement();

    double phase();

    ExcitationFrequency frequency();

    SourceLocation location();

    /** A rotating unbalance: force U·ω², ω the rotor's angular speed. */
    record Unbalance(String name, double phase, ExcitationFrequency.Order frequency, UnbalanceAmount amount,
                     Placement placement, SourceLocation location) implements Excitation {

        /** An unbalance on a single mass, acting along its line. */
        public Unbalance(String name, double phase, ExcitationFrequency.Order frequency, UnbalanceAmount amount,
                         SourceLocation location) {
            this(name, phase, frequency, amount, Placement.LINE, location);
        }
    }

    /** A force of fixed direction and constant amplitude (N). */
    record Force(String name, double phase, ExcitationFrequency frequency, Quantity amplitude,
                 Placement placement, SourceLocation location) implements Excitation {

        /** A force on a single mass, acting along its line. */
        public Force(String name, double phase, ExcitationFrequency frequency, Quantity amplitude,
                     SourceLocation location) {
            this(name, phase, frequency, amplitude, Placement.LINE, location);
        }
    }

    /** The ground moves; {@code measure} says whether amplitude is a displacement, velocity or acceleration. */
    record BaseMotion(String name, double phase, ExcitationFrequency frequency, MotionMeasure measure,
                      Quantity amplitude, Direction direction, SourceLocation location) implements Excitation {

        /** Base motion under a single mass or a lumped line: vertical. */
        public BaseMotion(String name, double phase, ExcitationFrequency frequency, MotionMeasure measure,
                          Quantity amplitude, SourceLocation location) {
            this(name, phase, frequency, measure, amplitude, Direction.up(location), location);
        }

        /** The ground moves under every spring or mount; the response is absolute. */
        @Override
        public Placement placement() {
            return Placement.LINE;
        }
    }

    /** No force: a frequency only the separation rule looks at (blade pass, gear mesh). */
    record OrderOnly(String name, double phase, ExcitationFrequency.Order frequency, SourceLocation location)
            implements Excitation {

        /** Carries no force, so it acts nowhere. */
        @Override
        public Placement placement() {
            return Placement.LINE;
        }
    }

    /** What a base-motion amplitude measures. */
    enum MotionMeasure {
        DISPLACEMENT, VELOCITY, ACCELERATION
    }
}
