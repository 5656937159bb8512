package org.resonancegate.spec;

import java.util.List;
import java.util.Optional;

/** The mechanical model of a spec. */
public sealed interface Model permits Model.Single, Model.Lumped, Model.RigidBody {

    SourceLocation location();

    /**
     * One mass on one resultant vertical spring.
     *
     * @param mass      the suspended mass
     * @param stiffness the spring, in one of its three written forms
     * @param damping   the damping, in one of its five written forms
     */
    record Single(Quantity mass, Stiffness stiffness, Damping damping, SourceLocation location)
            implements Model {
    }

    /**
     * Masses (or inertias) along one line joined by springs; {@value #GROUND} is the fixed
     * reference. Exactly one of model-level {@code damping} (a modal ratio form, never a
     * coefficient) or damping on every spring.
     *
     * @param free whether a part not tied to ground is allowed (its zero-frequency mode is kept)
     */
    record Lumped(Motion motion, List<LumpedMass> masses, List<Spring> springs, Optional<Damping> damping,
                  boolean free, SourceLocation location) implements Model {

        public static final String GROUND = "ground";

        public Lumped {
            masses = List.copyOf(masses);
            springs = List.copyOf(springs);
        }
    }

    /**
     * A rigid machine on discrete mounts, six degrees of freedom: translations of the centre of
     * gravity and small rotations about x, y, z. Exactly one of model-level {@code damping} or
     * damping on every mount.
     */
    record RigidBody(Quantity mass, Point centreOfGravity, Inertia inertia, List<Mount> mounts,
                     Optional<Damping> damping, SourceLocation location) implements Model {

        public RigidBody {
            mounts = List.copyOf(mounts);
        }
    }

    /** What moves along a lumped line: translation (kg, N/m) or torsion (kg·m², N·m/rad). */
    enum Motion {
        TRANSLATION("translation"), TORSION("torsion");

        private final String key;

        Motion(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }
    }

    /** A named mass of a lumped line; {@code mass} is an inertia (kg·m²) in torsion. */
    record LumpedMass(String name, Quantity mass, SourceLocation location) {
    }

    /** A spring between two masses, or a mass and {@value Lumped#GROUND}. */
    record Spring(String name, String from, String to, Quantity stiffness, Optional<ElementDamping> damping,
                  SourceLocation location) {
    }

    /**
     * Moments of inertia about axes through the centre of gravity, parallel to the spec's axes,
     * and the products P_xy = ∫xy dm etc. (the tensor's off-diagonal terms are their negatives;
     * zero when not written). All in kg·m².
     */
    record Inertia(Quantity xx, Quantity yy, Quantity zz, double xy, double xz, double yz,
                   SourceLocation location) {
    }

    /** A mount: three axial stiffnesses (N/m) acting at its position. */
    record Mount(String name, Point position, AxisValues stiffness, Optional<ElementDamping> damping,
                 SourceLocation location) {
    }
}
