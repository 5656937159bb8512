package org.resonancegate.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.resonancegate.report.Interference;
import org.resonancegate.report.ResponseCurve;

/**
 * The plots read back through their own axis labels: wherever a shape is drawn, the tick labels
 * must say the value it stands for. An order-k line carries frequency k·n/60 at speed n, and meets
 * a mode of frequency f at n = 60·f/k (common practice, no source: the definition of an order).
 */
class PlotGeometryTest {

    private static final Interference DIAGRAM = new Interference("nominal",
            List.of(new Interference.ModeLine(1, 10)), OptionalDouble.of(0.2), Optional.of("SEP"),
            List.of(new Interference.ExcitationLine("twice running speed", OptionalDouble.of(2), OptionalDouble.empty()),
                    new Interference.ExcitationLine("blade pass", OptionalDouble.of(6), OptionalDouble.empty())),
            200, 400);

    @Test
    void anOrderLineCarriesKTimesTheSpeedOver60() {
        Svg svg = InterferencePlot.draw(DIAGRAM, "c");
        Svg.Poly line = svg.polys().stream().filter(p -> p.cls().contains("x0")).findFirst().orElseThrow();
        double[][] pts = points(line);
        for (double rpm : new double[] {100, 300, 500}) {
            double x = tickX(svg, rpm);
            double y = pts[0][1] + (pts[1][1] - pts[0][1]) * (x - pts[0][0]) / (pts[1][0] - pts[0][0]);
            assertEquals(yOf(svg, 2 * rpm / 60), y, 0.15, "order 2 at " + rpm + " rpm");
        }
    }

    @Test
    void theCrossingInsideTheRangeIsMarkedAt60fOverK() {
        Svg svg = InterferencePlot.draw(DIAGRAM, "c");
        List<Svg.Dot> hits = svg.dots().stream().filter(d -> d.cls().equals("hit")).toList();
        assertEquals(1, hits.size(), "order 2 meets 10 Hz at 300 rpm, inside 200 to 400 rpm");
        assertEquals(tickX(svg, 300), Double.parseDouble(hits.get(0).cx()), 0.15);
        assertEquals(yOf(svg, 10), Double.parseDouble(hits.get(0).cy()), 0.15);
        // order 6 meets it at 100 rpm, below the range and with its ±20 % band (80 to 120 rpm) clear of it
        List<Svg.Dot> others = svg.dots().stream().filter(d -> d.cls().equals("cross")).toList();
        assertEquals(1, others.size());
        assertEquals(tickX(svg, 100), Double.parseDouble(others.get(0).cx()), 0.15);
        // the band is 8 Hz to 12 Hz
        Svg.Rect band = svg.rects().stream().filter(r -> r.cls().equals("band")).findFirst().orElseThrow();
        assertEquals(yOf(svg, 12), Double.parseDouble(band.y()), 0.15);
        assertEquals(yOf(svg, 8), Double.parseDouble(band.y()) + Double.parseDouble(band.h()), 0.2);
    }

    /**
     * The order meets the mode's centre line below the range, yet its band reaches into the range:
     * the filled marker must sit where the order line is inside both. Closed form (common practice,
     * no source: the definition of an order and of a ±margin band): order k is f = k·n/60, the band
     * is f_mode·(1 ± margin), so the order is in the band for 60·f_mode·(1 ± margin)/k; with
     * f_mode = 10 Hz, margin 0.2, k = 1 that is 480 to 720 rpm, overlapping 650 to 1000 rpm over
     * 650 to 720 rpm; the point of it nearest the crossing at 600 rpm is 650 rpm.
     */
    @Test
    void aBandReachingIntoTheRangeIsMarkedInsideBothNotAtTheCentreLine() {
        double fMode = 10;
        double margin = 0.2;
        double k = 1;
        double nMin = 650;
        double nMax = 1000;
        Interference d = new Interference("nominal", List.of(new Interference.ModeLine(1, fMode)),
                OptionalDouble.of(margin), Optional.of("SEP"), List.of(new Interference.ExcitationLine("running speed",
                OptionalDouble.of(k), OptionalDouble.empty())), nMin, nMax);
        Svg svg = InterferencePlot.draw(d, "c");
        List<Svg.Dot> hits = svg.dots().stream().filter(x -> x.cls().equals("hit")).toList();
        assertEquals(1, hits.size());
        double rpm = rpmOf(svg, Double.parseDouble(hits.get(0).cx()));
        double hz = hzOf(svg, Double.parseDouble(hits.get(0).cy()));
        double tol = 0.5; // pixels are written with one decimal: 0.05 px is about 0.13 rpm here
        assertTrue(rpm >= nMin - tol && rpm <= nMax + tol, "marker at " + rpm + " rpm, outside the range");
        assertTrue(hz >= fMode * (1 - margin) - 0.01 && hz <= fMode * (1 + margin) + 0.01,
                "marker at " + hz + " Hz, outside the band");
        assertEquals(k * rpm / 60, hz, 0.01, "the marker sits on the order line");
        double lo = Math.max(60 * fMode * (1 - margin) / k, nMin);
        double hi = Math.min(60 * fMode * (1 + margin) / k, nMax);
        assertEquals(Math.min(Math.max(60 * fMode / k, lo), hi), rpm, tol);
        // the crossing of the centre line, below the range, stays as a hollow marker at 600 rpm and 10 Hz
        List<Svg.Dot> hollow = svg.dots().stream().filter(x -> x.cls().equals("cross")).toList();
        assertEquals(1, hollow.size());
        assertEquals(60 * fMode / k, rpmOf(svg, Double.parseDouble(hollow.get(0).cx())), tol);
        assertEquals(fMode, hzOf(svg, Double.parseDouble(hollow.get(0).cy())), 0.01);
    }

    @Test
    void aFixedFrequencyInsideABandIsMarkedAcrossTheRange() {
        Interference d = new Interference("nominal", List.of(new Interference.ModeLine(1, 10)), OptionalDouble.of(0.2),
                Optional.of("SEP"), List.of(new Interference.ExcitationLine("mains hum", OptionalDouble.empty(),
                OptionalDouble.of(11))), 200, 400);
        Svg svg = InterferencePlot.draw(d, "c");
        // 11 Hz is 10 % from 10 Hz, inside the 20 % band, at every speed
        List<Svg.Dot> hits = svg.dots().stream().filter(x -> x.cls().equals("hit")).toList();
        assertEquals(1, hits.size());
        assertEquals(tickX(svg, 200), Double.parseDouble(hits.get(0).cx()), 0.15);
        assertEquals(yOf(svg, 11), Double.parseDouble(hits.get(0).cy()), 0.15);
    }

    @Test
    void theResponseLimitLineSitsAtItsLabelledValue() {
        ResponseCurve curve = new ResponseCurve("VEL", "nominal", "velocity rms", "m/s", 0.0045, "mm/s", 0.001,
                List.of(new ResponseCurve.Point(100, 0.0002), new ResponseCurve.Point(500, 0.02),
                        new ResponseCurve.Point(1000, 0.001)));
        Svg svg = ResponsePlot.draw(curve, Optional.empty(), 400, 800, "r");
        Svg.Line limit = svg.lines().stream().filter(l -> l.cls().equals("limit")).findFirst().orElseThrow();
        // a log axis: 4.5 lies log10(4.5) of the way from the tick "1" to the tick "10"
        double y1 = tickY(svg, "1");
        double y10 = tickY(svg, "10");
        assertEquals(y1 + (y10 - y1) * Math.log10(4.5), Double.parseDouble(limit.y1()), 0.15);
        assertTrue(svg.texts().stream().anyMatch(t -> t.text().equals("limit 4.5 mm/s")));
        assertTrue(svg.texts().stream().anyMatch(t -> t.text().equals("velocity rms (mm/s)")));
    }

    private static double[][] points(Svg.Poly p) {
        String[] pairs = p.points().split(" ");
        double[][] out = new double[pairs.length][];
        for (int i = 0; i < pairs.length; i++) {
            String[] xy = pairs[i].split(",");
            out[i] = new double[] {Double.parseDouble(xy[0]), Double.parseDouble(xy[1])};
        }
        return out;
    }

    /** The speed at pixel x, from the speed-axis ticks labelled 500 and 1000. */
    private static double rpmOf(Svg svg, double x) {
        double x500 = tickX(svg, 500);
        return 500 + (x - x500) * 500 / (tickX(svg, 1000) - x500);
    }

    /** The frequency at pixel y, from the frequency-axis ticks labelled 0 and 10. */
    private static double hzOf(Svg svg, double y) {
        double y0 = tickY(svg, "0");
        return (y - y0) * 10 / (tickY(svg, "10") - y0);
    }

    /** The x of the speed-axis tick labelled {@code rpm}. */
    private static double tickX(Svg svg, double rpm) {
        return svg.texts().stream().filter(t -> t.cls().equals("tick") && t.anchor().equals("middle")
                && Double.parseDouble(t.text()) == rpm).map(t -> Double.parseDouble(t.x())).findFirst().orElseThrow();
    }

    /** The y of frequency {@code hz}, from the frequency-axis ticks labelled 0 and 10. */
    static double yOf(Svg svg, double hz) {
        double y0 = tickY(svg, "0");
        double y10 = tickY(svg, "10");
        return y0 + (y10 - y0) * hz / 10;
    }

    static double tickY(Svg svg, String label) {
        // a y tick's label sits 4 px below its grid line (baseline centring)
        return svg.texts().stream().filter(t -> t.cls().equals("tick") && t.anchor().equals("end")
                && t.text().equals(label)).map(t -> Double.parseDouble(t.y()) - 4).findFirst().orElseThrow();
    }
}
