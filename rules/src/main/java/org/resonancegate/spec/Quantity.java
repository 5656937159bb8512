package org.resonancegate.spec;

import org.resonancegate.units.Dimension;

/**
 * A dimensional value read from a spec: its value in SI, the dimension it was checked against,
 * the text as the user wrote it (for reports), and where it was written.
 */
public record Quantity(double si, Dimension dimension, String text, SourceLocation location) {
}
