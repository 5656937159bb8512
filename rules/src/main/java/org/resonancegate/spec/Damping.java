package org.resonancegate.spec;

/**
 * The five written forms of model-level damping. Every form but {@link Coefficient} is a modal
 * damping ratio in disguise; a coefficient is a dashpot whose ratio depends on k and m.
 */
public sealed interface Damping {

    SourceLocation location();

    /** {@code {"ratio": ζ}}. */
    record Ratio(Dimensionless value, SourceLocation location) implements Damping {
    }

    /** {@code {"lossFactor": η}}: ζ = η/2. */
    record LossFactor(Dimensionless value, SourceLocation location) implements Damping {
    }

    /** {@code {"q": Q}}: ζ = 1/(2Q). */
    record QualityFactor(Dimensionless value, SourceLocation location) implements Damping {
    }

    /** {@code {"logDecrement": δ}}: ζ = δ/√(4π² + δ²). */
    record LogDecrement(Dimensionless value, SourceLocation location) implements Damping {
    }

    /** {@code {"coefficient": "c N·s/m"}}: a viscous dashpot, ζ = c/(2√(k·m)). */
    record Coefficient(Quantity value, SourceLocation location) implements Damping {
    }
}
