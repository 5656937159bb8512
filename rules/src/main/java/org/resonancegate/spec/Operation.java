package org.resonancegate.spec;

/**
 * The running speed range, in rad/s of shaft speed as {@link Quantity#si()} (1 rpm = 2π/60 rad/s).
 * A fixed-speed machine has {@code min == max} and {@code fixedSpeed} true.
 */
public record Operation(Quantity minSpeed, Quantity maxSpeed, boolean fixedSpeed, SourceLocation location) {
}
