package org.resonancegate.spec;

/**
 * A source of excitation. Every kind has a name and a phase (rad; the excitation is
 * A·cos(ωt + φ)). Amplitudes are peak values in SI.
 */
public sealed interface Excitation {

    String name();

    double phase();

    ExcitationFrequency frequency();

    SourceLocation location();

    /** A rotating unbalance: force U·ω², ω the rotor's angular speed. */
    record Unbalance(String name, double phase, ExcitationFrequency.Order frequency, UnbalanceAmount amount,
                     SourceLocation location) implements Excitation {
    }

    /** A force of fixed direction and constant amplitude (N). */
    record Force(String name, double phase, ExcitationFrequency frequency, Quantity amplitude,
                 SourceLocation location) implements Excitation {
    }

    /** The ground moves; {@code measure} says whether amplitude is a displacement, velocity or acceleration. */
    record BaseMotion(String name, double phase, ExcitationFrequency frequency, MotionMeasure measure,
                      Quantity amplitude, SourceLocation location) implements Excitation {
    }

    /** No force: a frequency only the separation rule looks at (blade pass, gear mesh). */
    record OrderOnly(String name, double phase, ExcitationFrequency.Order frequency, SourceLocation location)
            implements Excitation {
    }

    /** What a base-motion amplitude measures. */
    enum MotionMeasure {
        DISPLACEMENT, VELOCITY, ACCELERATION
    }
}
