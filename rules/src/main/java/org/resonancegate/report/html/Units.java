package org.resonancegate.report.html;

import org.resonancegate.criteria.Numbers;

/**
 * How a report shows an SI value: in the unit the user wrote the limit in where the results carry
 * it, otherwise in SI with the prefix an engineer would read (mm, mm/s); a few significant digits,
 * the engine's own rounding.
 *
 * @param unit   the unit shown
 * @param factor SI per shown unit
 */
record Units(String unit, double factor) {

    static final Units PLAIN = new Units("", 1);

    /** The usual showing of an SI unit from {@code results.json}. */
    static Units forSi(String siUnit) {
        return switch (siUnit) {
            case "m" -> new Units("mm", 1e-3);
            case "m/s" -> new Units("mm/s", 1e-3);
            case "rad" -> new Units("mrad", 1e-3);
            case "1" -> PLAIN;
            default -> new Units(siUnit, 1);
        };
    }

    String format(double si) {
        if (!Double.isFinite(si)) {
            return "–";
        }
        String n = number(si / factor);
        return unit.isEmpty() || unit.equals("1") ? n : n + " " + unit;
    }

    static String number(double v) {
        return Numbers.sig(v, 4);
    }

    static String percent(double fraction) {
        return Numbers.sig(fraction * 100, 3) + " %";
    }
}
