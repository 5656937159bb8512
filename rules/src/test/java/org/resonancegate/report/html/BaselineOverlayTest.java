package org.resonancegate.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.resonancegate.report.BaselineReportsTestAccess;
import org.resonancegate.report.Results;

/**
 * The baseline's mode on the interference diagram, read back through the frequency axis as
 * {@link PlotGeometryTest} does. P-1 of the comparison went from 40 MN/m to 20 MN/m on 1000 kg:
 * f = √(k/m)/2π (S. S. Rao, Mechanical Vibrations, chapter 2; from memory) gives 31.83 Hz at the
 * baseline and 22.51 Hz now.
 */
class BaselineOverlayTest {

    @TempDir
    Path dir;

    @Test
    void theModeAtTheBaselineIsDrawnDashedAtItsOldFrequency() throws Exception {
        Results r = BaselineReportsTestAccess.judged(dir);
        Page page = Pages.of(r);
        Page.SpecView p1 = page.specs().stream().filter(s -> s.id().equals("P-1")).findFirst().orElseThrow();
        Svg svg = p1.interference().orElseThrow().svg();
        List<Svg.Line> was = svg.lines().stream().filter(l -> l.cls().equals("was")).toList();
        assertEquals(1, was.size(), "one mode moved");
        double old = Math.sqrt(40e6 / 1000) / (2 * Math.PI);
        double now = Math.sqrt(20e6 / 1000) / (2 * Math.PI);
        assertEquals(yOf(svg, old), Double.parseDouble(was.get(0).y1()), 0.15);
        Svg.Line mode = svg.lines().stream().filter(l -> l.cls().equals("mode")).findFirst().orElseThrow();
        assertEquals(yOf(svg, now), Double.parseDouble(mode.y1()), 0.15);
        assertTrue(svg.texts().stream().anyMatch(t -> t.text().equals("mode 1 was 31.83 Hz")));
        assertTrue(p1.legend().stream().anyMatch(l -> l.cls().equals("was") && l.text().startsWith("at HEAD: ")));
        // without a baseline there is nothing to overlay
        Svg plain = Pages.of(new Results(r.specs())).specs().get(0).interference().orElseThrow().svg();
        assertTrue(plain.lines().stream().noneMatch(l -> l.cls().equals("was")));
    }

    /** The y of frequency {@code hz}, from the frequency-axis ticks labelled 0 and 30 (both modes lie below 40 Hz). */
    private static double yOf(Svg svg, double hz) {
        double y0 = PlotGeometryTest.tickY(svg, "0");
        return y0 + (PlotGeometryTest.tickY(svg, "30") - y0) * hz / 30;
    }
}
