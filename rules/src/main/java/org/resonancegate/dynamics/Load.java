package org.resonancegate.dynamics;

import org.apache.commons.math3.complex.Complex;
import org.resonancegate.spec.Direction;
import org.resonancegate.spec.Placement;
import org.resonancegate.spec.SourceLocation;

/**
 * A harmonic input at one angular frequency: a complex amplitude (the input is Re(A·e^{iωt}))
 * times a unit spatial pattern given by where it acts.
 */
public sealed interface Load {

    /** The complex amplitude of the input: a force in N (N·m in torsion) or a ground displacement in m. */
    Complex amplitude();

    /**
     * A force: along the line ({@link Placement.Line}, single mass), on a mass of a chain
     * ({@link Placement.AtMass}), or at a point of a rigid body ({@link Placement.AtPoint}) with a
     * fixed direction or rotating about a shaft axis (pattern e1 − i·sign·e2, so that
     * Re(F·e^{iωt}) = |A|·(cos ωt·e1 + sign·sin ωt·e2) for a real A).
     */
    record Force(Complex amplitude, Placement placement) implements Load {

        public Force(Complex amplitude) {
            this(amplitude, Placement.LINE);
        }
    }

    /** The ground moves along {@code direction} under every grounded spring or mount. */
    record GroundMotion(Complex amplitude, Direction direction) implements Load {

        private static final Direction UP = Direction.up(new SourceLocation("", 0, 0));

        public GroundMotion(Complex amplitude) {
            this(amplitude, UP);
        }
    }
}
