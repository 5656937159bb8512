package org.resonancegate.spec;

import java.util.Optional;

/**
 * A vibration criterion. {@code id} is stable (reports, waivers and baselines refer to it);
 * {@code location} points at the criterion in the file that defines it (a spec or a profile).
 */
public sealed interface Criterion {

    String id();

    Severity severity();

    SourceLocation location();

    Rule rule();

    /** β = f/f_n stays outside (1 − margin, 1 + margin) for every mode and excitation frequency. */
    record Separation(String id, Severity severity, Dimensionless margin, SourceLocation location)
            implements Criterion {
        @Override
        public Rule rule() {
            return Rule.SEPARATION;
        }
    }

    /** Transmissibility at or below a limit, stated as a maximum T or a minimum efficiency 1 − T. */
    record Isolation(String id, Severity severity, IsolationLimit limit, Optional<ResponsePoint> at,
                     SourceLocation location) implements Criterion {

        public Isolation(String id, Severity severity, IsolationLimit limit, SourceLocation location) {
            this(id, severity, limit, Optional.empty(), location);
        }

        @Override
        public Rule rule() {
            return Rule.ISOLATION;
        }
    }

    /** Response displacement at or below {@code max} (m), as peak or peak-to-peak. */
    record Displacement(String id, Severity severity, Quantity max, DisplacementMeasure measure,
                        Optional<ResponsePoint> at, SourceLocation location) implements Criterion {

        public Displacement(String id, Severity severity, Quantity max, DisplacementMeasure measure,
                            SourceLocation location) {
            this(id, severity, max, measure, Optional.empty(), location);
        }

        @Override
        public Rule rule() {
            return Rule.DISPLACEMENT;
        }
    }

    /** Response velocity at or below {@code max} (m/s), as rms or peak. */
    record Velocity(String id, Severity severity, Quantity max, VelocityMeasure measure,
                    Optional<ResponsePoint> at, SourceLocation location) implements Criterion {

        public Velocity(String id, Severity severity, Quantity max, VelocityMeasure measure,
                        SourceLocation location) {
            this(id, severity, max, measure, Optional.empty(), location);
        }

        @Override
        public Rule rule() {
            return Rule.VELOCITY;
        }
    }

    /** Dynamic force through the spring at or below {@code max} (N). */
    record TransmittedForce(String id, Severity severity, Quantity max, Optional<Axis> axis,
                            SourceLocation location) implements Criterion {

        public TransmittedForce(String id, Severity severity, Quantity max, SourceLocation location) {
            this(id, severity, max, Optional.empty(), location);
        }

        @Override
        public Rule rule() {
            return Rule.TRANSMITTED_FORCE;
        }
    }

    /** Deflection under gravity within [min, max] (m); at least one bound is present. */
    record StaticDeflection(String id, Severity severity, Optional<Quantity> min, Optional<Quantity> max,
                            SourceLocation location) implements Criterion {
        @Override
        public Rule rule() {
            return Rule.STATIC_DEFLECTION;
        }
    }

    /** The two ways to state an isolation requirement. */
    sealed interface IsolationLimit {
        Dimensionless value();

        record MaxTransmissibility(Dimensionless value) implements IsolationLimit {
        }

        record MinEfficiency(Dimensionless value) implements IsolationLimit {
        }
    }

    enum DisplacementMeasure {
        PEAK("peak"), PEAK_TO_PEAK("peak-to-peak");

        private final String key;

        DisplacementMeasure(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }
    }

    enum VelocityMeasure {
        RMS("rms"), PEAK("peak");

        private final String key;

        VelocityMeasure(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }
    }
}
