package org.resonancegate.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class QuantityParserTest {

    private static double si(String text, Dimension dimension) {
        UnitParse parsed = QuantityParser.parse(text, dimension, "value");
        assertInstanceOf(UnitParse.Value.class, parsed, () -> text + " -> " + parsed);
        return ((UnitParse.Value) parsed).si();
    }

    private static String problem(String text, Dimension dimension, String key) {
        UnitParse parsed = QuantityParser.parse(text, dimension, key);
        assertInstanceOf(UnitParse.Problem.class, parsed, () -> text + " was accepted");
        return ((UnitParse.Problem) parsed).message();
    }

    private static void assertRelative(double expected, double actual) {
        assertEquals(expected, actual, Math.abs(expected) * 1e-12 + 1e-300);
    }

    /**
     * International yard and pound agreement (1959): 1 in = 25.4 mm and 1 lb = 0.45359237 kg
     * exactly; 1 mil = 0.001 in; 1 oz = 1/16 lb (avoirdupois).
     */
    @Test
    void imperialLengthAndMassFollowThe1959Definitions() {
        assertRelative(25.4e-3, si("1 in", Dimension.LENGTH));
        assertRelative(25.4e-6, si("1 mil", Dimension.LENGTH));
        assertRelative(0.45359237, si("1 lb", Dimension.MASS));
        assertRelative(0.45359237 / 16, UnitTable.OUNCE);
        // 1 oz·in = (0.45359237/16 kg)(0.0254 m)
        assertRelative(0.45359237 / 16 * 0.0254, si("1 oz·in", Dimension.UNBALANCE));
        assertRelative(2 * 0.0254, si("2 in/s", Dimension.VELOCITY));
    }

    /**
     * The pound-force is one pound under standard gravity: 0.45359237 kg × 9.80665 m/s²
     * (gn from the 3rd CGPM, 1901; ISO 80000-3) = 4.4482216152605 N.
     */
    @Test
    void poundForceIsOnePoundUnderStandardGravity() {
        assertRelative(0.45359237 * 9.80665, si("1 lbf", Dimension.FORCE));
        assertRelative(4.4482216152605, si("1 lbf", Dimension.FORCE));
        // lbf/in = 4.4482216152605 / 0.0254 = 175.126835... N/m
        assertRelative(0.45359237 * 9.80665 / 0.0254, si("1 lbf/in", Dimension.STIFFNESS));
        // 175.1268 N/m per lbf/in: the usual handbook conversion figure (from memory).
        assertEquals(175.1268, si("1 lbf/in", Dimension.STIFFNESS), 1e-4);
    }

    /** Standard gravity gn = 9.80665 m/s² exactly (3rd CGPM 1901; ISO 80000-3). */
    @Test
    void standardGravityIsWrittenGn() {
        assertRelative(9.80665, si("1 gn", Dimension.ACCELERATION));
        assertRelative(0.5 * 9.80665, si("0.5 gn", Dimension.ACCELERATION));
        assertRelative(2.0, si("2 m/s²", Dimension.ACCELERATION));
        assertRelative(2.0, si("2 m/s^2", Dimension.ACCELERATION));
        String message = problem("1 g", Dimension.ACCELERATION, "acceleration");
        assertTrue(message.contains("'g' is the gram"), message);
        assertTrue(message.contains("gn"), message);
    }

    /** SI prefixes (SI Brochure, 9th ed.): k = 1e3, M = 1e6, m = 1e-3, µ = 1e-6; 1 t = 1000 kg. */
    @ParameterizedTest
    @CsvSource(delimiter = ';', value = {
            "1850 kg; MASS; 1850",
            "1.85 t; MASS; 1850",
            "500 g; MASS; 0.5",
            "6 mm; LENGTH; 0.006",
            "50 µm; LENGTH; 50e-6",
            "50 um; LENGTH; 50e-6",
            "2.4 MN/m; STIFFNESS; 2.4e6",
            "2400 kN/m; STIFFNESS; 2.4e6",
            "2400 N/mm; STIFFNESS; 2.4e6",
            "2.4 kN/mm; STIFFNESS; 2.4e6",
            "2400000 N/m; STIFFNESS; 2.4e6",
            "0.2 kN; FORCE; 200",
            "4.5 mm/s; VELOCITY; 4.5e-3",
            "310 kg·m²; INERTIA; 310",
            "310 kg*m^2; INERTIA; 310",
            "310 kg m2; INERTIA; 310",
            "3 kN·s/m; DAMPING_COEFFICIENT; 3000",
            "3000 N*s/m; DAMPING_COEFFICIENT; 3000",
            "3000 N s/m; DAMPING_COEFFICIENT; 3000",
            "120 g·mm; UNBALANCE; 120e-6",
            "120 g*mm; UNBALANCE; 120e-6",
            "120 g mm; UNBALANCE; 120e-6",
            "0.5 kg·m; UNBALANCE; 0.5",
            "15 kN·m/rad; TORSIONAL_STIFFNESS; 15000",
            "2 kN·m; TORQUE; 2000",
            "4 N·m·s/rad; TORSIONAL_DAMPING; 4",
            "5 mrad; ANGLE; 0.005",
            "3 rad/s; ANGULAR_VELOCITY; 3",
            "-2e3 N; FORCE; -2000",
    })
    void metricUnitsScaleByTheirPrefix(String text, Dimension dimension, double expected) {
        assertRelative(expected, si(text, dimension));
    }

    /** 1 Hz = 2π rad/s (angular frequency); 1 rpm = 1 r/min = 2π/60 rad/s; 1 cpm = 1/60 Hz. */
    @Test
    void rotationalUnitsBecomeRadiansPerSecond() {
        assertRelative(2 * Math.PI * 50, si("50 Hz", Dimension.FREQUENCY));
        assertRelative(2 * Math.PI * 50, si("3000 cpm", Dimension.FREQUENCY));
        assertRelative(314.0, si("314 rad/s", Dimension.FREQUENCY));
        assertRelative(1480 * 2 * Math.PI / 60, si("1480 rpm", Dimension.SPEED));
        assertRelative(1480 * 2 * Math.PI / 60, si("1480 r/min", Dimension.SPEED));
        assertRelative(100 * 2 * Math.PI / 60, si("100 rpm/s", Dimension.RATE));
        assertRelative(Math.PI / 2, si("90 deg", Dimension.ANGLE));
    }

    @Test
    void unknownUnitListsTheAcceptedOnesAndSuggestsTheNearest() {
        String message = problem("1850 kgs", Dimension.MASS, "mass");
        assertTrue(message.contains("unknown unit 'kgs'"), message);
        assertTrue(message.contains("kg, t, g, lb"), message);
        assertTrue(message.contains("did you mean 'kg'"), message);
        String hz = problem("50 hz", Dimension.FREQUENCY, "frequency");
        assertTrue(hz.contains("did you mean 'Hz'"), hz);
    }

    @Test
    void wrongDimensionNamesTheKeyTheUnitsDimensionAndTheAcceptedUnits() {
        String message = problem("5 N/m", Dimension.MASS, "mass");
        assertTrue(message.contains("\"mass\""), message);
        assertTrue(message.contains("is a stiffness"), message);
        assertTrue(message.contains("expects a mass"), message);
        assertTrue(message.contains("kg, t, g, lb"), message);
    }

    @Test
    void missingUnitShowsAnExampleWithTheNumberWritten() {
        String message = problem("1850", Dimension.MASS, "mass");
        assertTrue(message.contains("\"1850 kg\""), message);
    }

    @Test
    void nonNumbersAndOverflowAreRefused() {
        assertTrue(problem("heavy kg", Dimension.MASS, "mass").contains("does not start with a number"));
        assertTrue(problem("NaN kg", Dimension.MASS, "mass").contains("not a finite number"));
        assertTrue(problem("Infinity kg", Dimension.MASS, "mass").contains("not a finite number"));
        assertTrue(problem("1e400 kg", Dimension.MASS, "mass").contains("too large"));
    }

    @Test
    void noBreakSpacesBetweenNumberAndUnitAreAccepted() {
        assertRelative(1850, si("1850\u00A0kg", Dimension.MASS));
        assertRelative(1850, si("1850\u202Fkg", Dimension.MASS));
    }

    /** The format writes number, space, unit (spec-format.md, "Quantities"). */
    @Test
    void numberAndUnitRunTogetherAreRefusedWithTheFix() {
        String message = problem("1850kg", Dimension.MASS, "mass");
        assertTrue(message.contains("needs a space"), message);
        assertTrue(message.contains("\"1850 kg\""), message);
    }

    @Test
    void noSuggestionForAnUnrelatedShortUnit() {
        String message = problem("3 x", Dimension.MASS, "mass");
        assertTrue(!message.contains("did you mean"), message);
    }

    @Test
    void decimalCommaIsExplained() {
        String message = problem("2,4 MN/m", Dimension.STIFFNESS, "stiffness");
        assertTrue(message.contains("decimal comma"), message);
        assertTrue(message.contains("\"2.4 MN/m\""), message);
    }

    @Test
    void everyDimensionHasUnitsAndAName() {
        for (Dimension d : Dimension.values()) {
            assertTrue(!UnitTable.units(d).isEmpty(), d::name);
            assertTrue(!UnitTable.describe(d).isBlank(), d::name);
            // The usual unit of every dimension reads back to a finite SI value.
            assertTrue(Double.isFinite(si("1 " + UnitTable.usualSymbol(d), d)), d::name);
        }
    }

    /**
     * SI prefixes are exact decimal factors (SI Brochure, 9th ed., table 7): a value written in a
     * sub-multiple must come out as the double nearest the decimal number, as the user wrote it,
     * so reports do not show 0.0045000000000000005 for "4.5 mm/s".
     */
    @Test
    void decimalSubMultiplesGiveTheNearestDouble() {
        assertEquals(0.0045, si("4.5 mm/s", Dimension.VELOCITY));
        assertEquals(0.019, si("19 mm", Dimension.LENGTH));
        assertEquals(2.5e-5, si("25 µm", Dimension.LENGTH));
        assertEquals(0.0071, si("7.1 mm/s", Dimension.VELOCITY));
    }
}
