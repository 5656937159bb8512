package org.resonancegate.spec;

import java.util.Optional;

/** Where a criterion looks at the response ({@code "at"}). */
public sealed interface ResponsePoint {

    /** {@code lumped}: a mass by name. */
    record Mass(String name, SourceLocation location) implements ResponsePoint {
    }

    /** {@code rigid-body}: a point on the body; without an axis every axis is judged and the largest counts. */
    record OnBody(Point point, Optional<Axis> axis) implements ResponsePoint {
    }
}
