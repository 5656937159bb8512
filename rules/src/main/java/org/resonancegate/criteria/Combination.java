package org.resonancegate.criteria;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.complex.Complex;

/**
 * How the contributions of several excitations to one response component add up. Excitations at
 * the same frequency (within a relative 1e-9) add as phasors, so their phases matter; at distinct
 * frequencies the peaks add arithmetically (an upper bound reached when the phases line up) and
 * the rms values as a root sum of squares (exact for distinct frequencies).
 */
public final class Combination {

    /** One excitation's complex amplitude of a response component at angular frequency {@code omega}. */
    public record Contribution(double omega, Complex amplitude) {
    }

    /** A set of same-frequency contributions added as phasors. */
    public record Group(double omega, Complex sum) {
    }

    private Combination() {
    }

    /** Groups contributions by frequency in listing order; each joins the first group it matches. */
    public static List<Group> groups(List<Contribution> contributions) {
        List<Double> omegas = new ArrayList<>();
        List<Complex> sums = new ArrayList<>();
        for (Contribution c : contributions) {
            int found = -1;
            for (int g = 0; g < omegas.size(); g++) {
                if (Ties.same(omegas.get(g), c.omega())) {
                    found = g;
                    break;
                }
            }
            if (found < 0) {
                omegas.add(c.omega());
                sums.add(c.amplitude());
            } else {
                sums.set(found, sums.get(found).add(c.amplitude()));
            }
        }
        List<Group> out = new ArrayList<>();
        for (int g = 0; g < omegas.size(); g++) {
            out.add(new Group(omegas.get(g), sums.get(g)));
        }
        return out;
    }

    /** Peak of the combined signal: Σ over frequencies of |Σ same-frequency phasors|. */
    public static double peak(List<Contribution> contributions) {
        double total = 0;
        for (Group g : groups(contributions)) {
            total += g.sum().abs();
        }
        return total;
    }

    /** Rms of the combined signal: √(Σ over frequencies of (|phasor sum|/√2)²). */
    public static double rms(List<Contribution> contributions) {
        double squares = 0;
        for (Group g : groups(contributions)) {
            double a = g.sum().abs();
            squares += a * a / 2;
        }
        return Math.sqrt(squares);
    }

    /** The frequency carrying the largest share (first of equals); NaN when there is none. */
    public static double dominantOmega(List<Contribution> contributions) {
        double best = -1;
        double omega = Double.NaN;
        for (Group g : groups(contributions)) {
            double a = g.sum().abs();
            if (a > best && !Ties.same(a, best)) {
                best = a;
                omega = g.omega();
            }
        }
        return omega;
    }
}
