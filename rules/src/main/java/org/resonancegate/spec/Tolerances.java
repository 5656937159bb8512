package org.resonancegate.spec;

import java.util.Optional;

/** Symmetric relative tolerances; rules hold at the worst case within them. */
public record Tolerances(Optional<Dimensionless> stiffness, Optional<Dimensionless> mass) {

    public static Tolerances none() {
        return new Tolerances(Optional.empty(), Optional.empty());
    }

    public boolean isEmpty() {
        return stiffness.isEmpty() && mass.isEmpty();
    }
}
