package org.resonancegate.report;

import org.resonancegate.spec.SourceLocation;

/**
 * One input that matters to a reader, as the user wrote it where the text is kept.
 *
 * @param group    what it belongs to: "model", "operation", "excitation", "tolerances"
 * @param label    what it is ("mass 'pump'", "stiffness", "speed range", an excitation's name)
 * @param text     the value in words and units ("1150 kg", "740 rpm to 1480 rpm")
 * @param location where it is written
 */
public record InputValue(String group, String label, String text, SourceLocation location) {
}
