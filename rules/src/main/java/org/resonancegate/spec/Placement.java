package org.resonancegate.spec;

import java.util.Optional;

/** Where an excitation acts on the model. */
public sealed interface Placement {

    /** {@code single}: along the model's one line; nothing to write. */
    record Line() implements Placement {
    }

    /** {@code lumped}: on the named mass ({@code "at": "pump"}), along the line. */
    record AtMass(String mass, SourceLocation location) implements Placement {
    }

    /**
     * {@code rigid-body}: at a point; a rotating force names its shaft {@code axis}, a fixed one its
     * {@code direction}. Base motion uses neither (its direction is on the excitation).
     */
    record AtPoint(Point point, Optional<ShaftAxis> axis, Optional<Direction> direction) implements Placement {
    }

    Placement LINE = new Line();
}
