package org.resonancegate.spec;

/**
 * A dimensionless value (a ratio, a margin, a factor): written as a number ({@code 0.05}) or a
 * percentage string ({@code "20 %"}); {@code value} is always the plain fraction (0.2 for 20 %).
 */
public record Dimensionless(double value, String text, SourceLocation location) {
}
