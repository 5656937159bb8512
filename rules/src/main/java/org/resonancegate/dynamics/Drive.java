package org.resonancegate.dynamics;

import org.resonancegate.spec.Excitation;

/**
 * One excitation turned into a harmonic load at one running speed.
 *
 * @param source         the excitation it comes from
 * @param omega          its angular frequency (rad/s)
 * @param load           the complex load
 * @param speedDependent whether its frequency follows the running speed (an order) or stays put
 */
public record Drive(Excitation source, double omega, Load load, boolean speedDependent) {

    /** The frequency in Hz. */
    public double frequencyHz() {
        return omega / (2 * Math.PI);
    }
}
