package org.resonancegate.spec;

/** How an excitation's frequency follows the running speed. */
public sealed interface ExcitationFrequency {

    /** {@code "order": n}: n × running speed / 60 Hz. */
    record Order(double order, SourceLocation location) implements ExcitationFrequency {
    }

    /** {@code "frequency": "50 Hz"}: a fixed frequency (SI value in rad/s). */
    record Fixed(Quantity frequency) implements ExcitationFrequency {
    }
}
