package org.resonancegate.units;

/**
 * One accepted unit spelling: its symbol as a user writes it, the dimension it measures and the
 * factor that turns a value in it into SI ({@code si = value × factor}).
 */
public record Unit(String symbol, Dimension dimension, double factor) {
}
