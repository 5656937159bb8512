package org.resonancegate.report.html;

/** What both plots share: the frame, grid, ticks, axis titles and the shaded operating range. */
final class Frames {

    /** View-box width of every plot, and the margins around the plotting area (room for ticks, titles, mode labels). */
    static final int W = 680;
    static final double LEFT = 62;
    static final double RIGHT = 150;
    static final double TOP = 14;
    static final double BOTTOM = 46;

    private Frames() {
    }

    static void axes(Svg.Builder b, Scale xs, Scale ys, String xTitle, String yTitle) {
        double x0 = xs.at(xs.lo());
        double x1 = xs.at(xs.hi());
        double y0 = ys.at(ys.lo());
        double y1 = ys.at(ys.hi());
        b.rect(x0, y1, x1 - x0, y0 - y1, "plot");
        for (double t : xs.ticks()) {
            double x = xs.at(t);
            b.line(x, y1, x, y0, "grid");
            b.text(x, y0 + 16, "middle", "tick", 0, Units.number(t));
        }
        for (double t : ys.ticks()) {
            double y = ys.at(t);
            b.line(x0, y, x1, y, "grid");
            b.text(x0 - 6, y + 4, "end", "tick", 0, Units.number(t));
        }
        b.line(x0, y0, x1, y0, "axis");
        b.line(x0, y0, x0, y1, "axis");
        b.text((x0 + x1) / 2, y0 + 36, "middle", "title", 0, xTitle);
        b.text(16, (y0 + y1) / 2, "middle", "title", -90, yTitle);
    }

    /** The operating range shaded (a line at a fixed speed), labelled at the top. */
    static void operatingRange(Svg.Builder b, Scale xs, Scale ys, double minRpm, double maxRpm) {
        double y0 = ys.at(ys.lo());
        double y1 = ys.at(ys.hi());
        double a = xs.at(minRpm);
        double z = xs.at(maxRpm);
        if (z - a < 2) {
            b.line(a, y1, a, y0, "opline");
        } else {
            b.rect(a, y1, z - a, y0 - y1, "op");
        }
        b.text((a + z) / 2, y0 - 6, "middle", "lbl op-lbl", 0, z - a < 2 ? "operating speed" : "operating range");
    }
}
