package org.resonancegate.units;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * Every unit a spec may use, by dimension, with its exact factor to SI.
 *
 * <p>Hand-written on purpose: the trade's spellings ({@code rpm}, {@code cpm}, {@code gn} for
 * standard gravity, {@code lbf/in}, {@code g·mm} for unbalance) are not understood by
 * general-purpose unit-library parsers, and a short explicit table is easy to check against the
 * definitions it cites. Constants are exact by definition:
 * 1 in = 0.0254 m and 1 lb = 0.45359237 kg (international yard and pound, 1959);
 * 1 lbf = 1 lb × gn = 4.4482216152605 N; 1 oz = 1/16 lb = 0.028349523125 kg;
 * gn = 9.80665 m/s² (standard gravity, 3rd CGPM 1901); 1 rpm = 2π/60 rad/s; 1 Hz = 2π rad/s
 * as an angular frequency (the engine works in rad/s).
 */
public final class UnitTable {

    // compiled once, before the tables below use them: every quantity in every spec is normalised
    private static final Pattern SPACES = Pattern.compile("\\s+");
    private static final Pattern BARE_SQUARE = Pattern.compile("(?<=[A-Za-z])2(?![0-9])");

    /** Standard gravity, m/s² (3rd CGPM 1901; ISO 80000-3). */
    public static final double STANDARD_GRAVITY = 9.80665;
    /** The international inch, m. */
    public static final double INCH = 0.0254;
    /** The international avoirdupois pound, kg. */
    public static final double POUND = 0.45359237;
    /** The pound-force, N: one pound under standard gravity. */
    public static final double POUND_FORCE = 4.4482216152605;
    /** The avoirdupois ounce, kg: 1/16 pound. */
    public static final double OUNCE = 0.028349523125;

    private static final double TWO_PI = 2 * Math.PI;
    private static final double RPM = TWO_PI / 60;

    private static final Map<Dimension, List<Unit>> BY_DIMENSION = new EnumMap<>(Dimension.class);
    /** Normalised spelling → every unit with that spelling ({@code rad/s} serves three dimensions). */
    private static final Map<String, List<Unit>> BY_SPELLING = new LinkedHashMap<>();
    /** Other spellings worth naming in messages ("um", "r/min"), not mere variants of "·" or "²". */
    private static final Map<Unit, List<String>> SHOWN_ALIASES = new LinkedHashMap<>();

    static {
        add(Dimension.MASS, "kg", 1);
        add(Dimension.MASS, "t", 1000);
        add(Dimension.MASS, "g", 1e-3);
        add(Dimension.MASS, "lb", POUND);

        add(Dimension.LENGTH, "m", 1);
        add(Dimension.LENGTH, "mm", 1e-3);
        add(Dimension.LENGTH, "µm", 1e-6, "um");
        add(Dimension.LENGTH, "in", INCH);
        add(Dimension.LENGTH, "mil", INCH / 1000);

        add(Dimension.STIFFNESS, "N/m", 1);
        add(Dimension.STIFFNESS, "kN/m", 1e3);
        add(Dimension.STIFFNESS, "MN/m", 1e6);
        add(Dimension.STIFFNESS, "N/mm", 1e3);
        add(Dimension.STIFFNESS, "kN/mm", 1e6);
        add(Dimension.STIFFNESS, "lbf/in", POUND_FORCE / INCH);

        add(Dimension.FORCE, "N", 1);
        add(Dimension.FORCE, "kN", 1e3);
        add(Dimension.FORCE, "lbf", POUND_FORCE);

        add(Dimension.FREQUENCY, "Hz", TWO_PI);
        add(Dimension.FREQUENCY, "cpm", RPM);
        add(Dimension.FREQUENCY, "rad/s", 1);

        add(Dimension.SPEED, "rpm", RPM, "r/min");

        add(Dimension.VELOCITY, "m/s", 1);
        add(Dimension.VELOCITY, "mm/s", 1e-3);
        add(Dimension.VELOCITY, "in/s", INCH);

        add(Dimension.ACCELERATION, "m/s²", 1, "m/s^2");
        add(Dimension.ACCELERATION, "gn", STANDARD_GRAVITY);

        add(Dimension.INERTIA, "kg·m²", 1, "kg*m^2", "kg m2");

        add(Dimension.DAMPING_COEFFICIENT, "N·s/m", 1, "N*s/m", "N s/m");
        add(Dimension.DAMPING_COEFFICIENT, "kN·s/m", 1e3, "kN*s/m", "kN s/m");

        add(Dimension.UNBALANCE, "g·mm", 1e-6, "g*mm", "g mm");
        add(Dimension.UNBALANCE, "kg·m", 1, "kg*m", "kg m");
        add(Dimension.UNBALANCE, "oz·in", OUNCE * INCH, "oz*in", "oz in");

        add(Dimension.RATE, "rpm/s", RPM);

        add(Dimension.TORSIONAL_STIFFNESS, "N·m/rad", 1, "N*m/rad", "N m/rad");
        add(Dimension.TORSIONAL_STIFFNESS, "kN·m/rad", 1e3, "kN*m/rad", "kN m/rad");

        add(Dimension.TORQUE, "N·m", 1, "N*m", "N m");
        add(Dimension.TORQUE, "kN·m", 1e3, "kN*m", "kN m");

        add(Dimension.TORSIONAL_DAMPING, "N·m·s/rad", 1, "N*m*s/rad", "N m s/rad");

        add(Dimension.ANGLE, "rad", 1);
        add(Dimension.ANGLE, "mrad", 1e-3);
        add(Dimension.ANGLE, "deg", Math.PI / 180);

        add(Dimension.ANGULAR_VELOCITY, "rad/s", 1);
    }

    private UnitTable() {
    }

    private static void add(Dimension dimension, String symbol, double factor, String... aliases) {
        Unit unit = new Unit(symbol, dimension, factor);
        BY_DIMENSION.computeIfAbsent(dimension, d -> new ArrayList<>()).add(unit);
        BY_SPELLING.computeIfAbsent(normalise(symbol), s -> new ArrayList<>()).add(unit);
        for (String alias : aliases) {
            if (!normalise(alias).equals(normalise(symbol))) {
                SHOWN_ALIASES.computeIfAbsent(unit, u -> new ArrayList<>()).add(alias);
            }
            List<Unit> units = BY_SPELLING.computeIfAbsent(normalise(alias), s -> new ArrayList<>());
            if (!units.contains(unit)) {
                units.add(unit);
            }
        }
    }

    /**
     * One spelling for the many ways a product of units is typed: {@code *}, {@code ⋅} and spaces
     * become {@code ·}; {@code ^2} or a trailing 2 after a letter becomes {@code ²}; the Greek mu
     * becomes the micro sign.
     */
    static String normalise(String unit) {
        String s = unit.strip()
                .replace('\u03BC', '\u00B5')
                .replace('\u22C5', '\u00B7')
                .replace('*', '\u00B7');
        s = SPACES.matcher(s).replaceAll("\u00B7").replace("^2", "²");
        return BARE_SQUARE.matcher(s).replaceAll("²");
    }

    /** The unit of that dimension with that spelling, if there is one. */
    public static Optional<Unit> find(String spelling, Dimension dimension) {
        // most values are written in a table spelling, which normalises to itself: skip the regexes then
        List<Unit> units = BY_SPELLING.get(spelling);
        if (units == null) {
            units = BY_SPELLING.getOrDefault(normalise(spelling), List.of());
        }
        for (Unit u : units) {
            if (u.dimension() == dimension) {
                return Optional.of(u);
            }
        }
        return Optional.empty();
    }

    /** Every unit, of any dimension, with that spelling. */
    public static List<Unit> findAny(String spelling) {
        return List.copyOf(BY_SPELLING.getOrDefault(normalise(spelling), List.of()));
    }

    /** The units accepted for a dimension, in the table's order (the first is the usual one). */
    public static List<Unit> units(Dimension dimension) {
        return List.copyOf(BY_DIMENSION.get(dimension));
    }

    /** The symbols accepted for a dimension, for messages: {@code "kg, t, g, lb"}. */
    public static String acceptedSymbols(Dimension dimension) {
        List<String> symbols = new ArrayList<>();
        for (Unit u : BY_DIMENSION.get(dimension)) {
            List<String> also = SHOWN_ALIASES.getOrDefault(u, List.of());
            symbols.add(also.isEmpty() ? u.symbol() : u.symbol() + " (or " + String.join(", ", also) + ")");
        }
        return String.join(", ", symbols);
    }

    /** What a dimension is called in a message. */
    public static String describe(Dimension dimension) {
        return switch (dimension) {
            case MASS -> "mass";
            case LENGTH -> "length";
            case STIFFNESS -> "stiffness";
            case FORCE -> "force";
            case FREQUENCY -> "frequency";
            case SPEED -> "speed";
            case VELOCITY -> "velocity";
            case ACCELERATION -> "acceleration";
            case INERTIA -> "moment of inertia";
            case DAMPING_COEFFICIENT -> "damping coefficient";
            case UNBALANCE -> "unbalance";
            case RATE -> "rate of speed change";
            case TORSIONAL_STIFFNESS -> "torsional stiffness";
            case TORQUE -> "torque";
            case TORSIONAL_DAMPING -> "torsional damping";
            case ANGLE -> "angle";
            case ANGULAR_VELOCITY -> "angular velocity";
        };
    }

    /** The dimension's usual unit, for examples in messages. */
    public static String usualSymbol(Dimension dimension) {
        // Phases and angles are written in degrees far more often than in radians; an example
        // in rad would turn a user's "90" into a wrong phase.
        if (dimension == Dimension.ANGLE) {
            return "deg";
        }
        return BY_DIMENSION.get(dimension).get(0).symbol();
    }
}
