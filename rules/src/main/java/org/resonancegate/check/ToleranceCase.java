package org.resonancegate.check;

import java.util.ArrayList;
import java.util.List;
import org.resonancegate.dynamics.ModelScale;
import org.resonancegate.spec.Dimensionless;
import org.resonancegate.spec.Tolerances;
import org.resonancegate.units.Decimal;

/**
 * One model case within the tolerances: the nominal model or a corner of the box. The order of
 * {@link #all} is the tie order of the contract: nominal, (k−, m−), (k−, m+), (k+, m−), (k+, m+).
 */
public record ToleranceCase(String name, ModelScale scale) {

    public static final ToleranceCase NOMINAL = new ToleranceCase("nominal", ModelScale.NOMINAL);

    public static List<ToleranceCase> all(Tolerances tolerances) {
        List<ToleranceCase> cases = new ArrayList<>();
        cases.add(NOMINAL);
        if (tolerances.isEmpty()) {
            return cases;
        }
        double tk = tolerances.stiffness().map(Dimensionless::value).orElse(0.0);
        double tm = tolerances.mass().map(Dimensionless::value).orElse(0.0);
        for (int ks : new int[] {-1, +1}) {
            for (int ms : new int[] {-1, +1}) {
                cases.add(new ToleranceCase(name(tolerances, ks * tk, ms * tm),
                        new ModelScale(1 + ks * tk, 1 + ms * tm)));
            }
        }
        return cases;
    }

    /** "stiffness -15 %, mass +5 %"; a quantity without a tolerance is left out of the name. */
    private static String name(Tolerances t, double dk, double dm) {
        List<String> parts = new ArrayList<>();
        if (t.stiffness().isPresent()) {
            parts.add("stiffness " + signedPercent(dk));
        }
        if (t.mass().isPresent()) {
            parts.add("mass " + signedPercent(dm));
        }
        return String.join(", ", parts);
    }

    private static String signedPercent(double fraction) {
        String text = Decimal.text(Math.abs(fraction * 100), 4, java.math.RoundingMode.HALF_UP);
        return (fraction < 0 ? "-" : "+") + text + " %";
    }
}
