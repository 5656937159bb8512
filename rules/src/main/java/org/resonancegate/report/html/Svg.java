package org.resonancegate.report.html;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * One plot as plain shapes for the SVG template: coordinates already in pixels of the view box,
 * classes for the look (the style sheet gives them colours), and text that the template escapes.
 * Drawn back to front in the order of the lists.
 *
 * @param label what the plot shows, for assistive technology and the browser test
 */
public record Svg(int width, int height, String label, List<Clip> clips, List<Rect> rects, List<Line> lines,
                  List<Poly> polys, List<Dot> dots, List<Text> texts) {

    /** A clipping rectangle a {@link Poly} can name; ids are made by the plot, never from user text. */
    public record Clip(String id, String x, String y, String w, String h) {
    }

    public record Rect(String x, String y, String w, String h, String cls) {
    }

    public record Line(String x1, String y1, String x2, String y2, String cls) {
    }

    /** A polyline: {@code points} as "x,y x,y …"; {@code clip} is a {@link Clip} id or empty. */
    public record Poly(String points, String cls, String clip) {
    }

    /** A marker with a tooltip. */
    public record Dot(String cx, String cy, String r, String cls, String title) {
    }

    /** {@code anchor}: start, middle or end; {@code rotate}: degrees about (x, y), usually 0 or -90. */
    public record Text(String x, String y, String anchor, String cls, int rotate, String text) {
    }

    /** Collects shapes in drawing order. */
    static final class Builder {
        private final int width;
        private final int height;
        private final List<Clip> clips = new ArrayList<>();
        private final List<Rect> rects = new ArrayList<>();
        private final List<Line> lines = new ArrayList<>();
        private final List<Poly> polys = new ArrayList<>();
        private final List<Dot> dots = new ArrayList<>();
        private final List<Text> texts = new ArrayList<>();

        Builder(int width, int height) {
            this.width = width;
            this.height = height;
        }

        Builder clip(String id, double x, double y, double w, double h) {
            clips.add(new Clip(id, px(x), px(y), px(Math.max(0, w)), px(Math.max(0, h))));
            return this;
        }

        Builder rect(double x, double y, double w, double h, String cls) {
            rects.add(new Rect(px(x), px(y), px(Math.max(0, w)), px(Math.max(0, h)), cls));
            return this;
        }

        Builder line(double x1, double y1, double x2, double y2, String cls) {
            lines.add(new Line(px(x1), px(y1), px(x2), px(y2), cls));
            return this;
        }

        Builder poly(double[] xs, double[] ys, String cls, String clip) {
            StringBuilder b = new StringBuilder();
            for (int i = 0; i < xs.length; i++) {
                b.append(i > 0 ? " " : "").append(px(xs[i])).append(',').append(px(ys[i]));
            }
            polys.add(new Poly(b.toString(), cls, clip));
            return this;
        }

        Builder dot(double cx, double cy, double r, String cls, String title) {
            dots.add(new Dot(px(cx), px(cy), px(r), cls, title));
            return this;
        }

        Builder text(double x, double y, String anchor, String cls, int rotate, String text) {
            texts.add(new Text(px(x), px(y), anchor, cls, rotate, text));
            return this;
        }

        Svg build(String label) {
            return new Svg(width, height, label, clips, rects, lines, polys, dots, texts);
        }
    }

    /**
     * A pixel coordinate with one decimal, the same on every locale: the text of
     * {@code String.format(Locale.ROOT, "%.1f", v)}, with -0.0 shown as 0.0. A plot has thousands of
     * coordinates and the formatter looks up its locale's symbols on every call, so a value that
     * is clearly not a tie (its tenths are not within a millionth of ending in 5) is rounded here
     * by hand; ties, where the formatter's rounding of the shortest decimal form decides, and
     * values too large for a double's tenths to be exact, still go to the formatter.
     */
    static String px(double v) {
        if (Math.abs(v) < 1e6) {
            double tenths = Math.abs(v) * 10;
            double whole = Math.floor(tenths);
            double rest = tenths - whole;
            if (Math.abs(rest - 0.5) > 1e-6) {
                long m = (long) whole + (rest > 0.5 ? 1 : 0);
                StringBuilder text = new StringBuilder(12);
                if (v < 0) {
                    text.append('-'); // the formatter keeps the sign of a small negative value: -0.0
                }
                return text.append(m / 10).append('.').append((char) ('0' + m % 10)).toString();
            }
        }
        return String.format(Locale.ROOT, "%.1f", v == 0 ? 0.0 : v);
    }
}
