package org.resonancegate.report.html;

import java.util.Optional;
import org.resonancegate.report.CheckResult;
import org.resonancegate.report.ResponseCurve;

/**
 * One amplitude criterion's value against running speed on a logarithmic scale (a resonance
 * peak and the isolated region differ by decades), with its limit, the operating range, the
 * stretch of curve above the limit inside the range drawn in the warning colour, and the
 * governing value marked.
 */
final class ResponsePlot {

    static final int H = 300;

    private ResponsePlot() {
    }

    /** The unit a curve is shown in: as the user wrote its limit. */
    static Units units(ResponseCurve c) {
        return c.unit().equals("1") ? Units.PLAIN : new Units(c.displayUnit(), c.displayFactor());
    }

    static Svg draw(ResponseCurve c, Optional<CheckResult> check, double minRpm, double maxRpm, String clipId) {
        Units u = units(c);
        int n = c.points().size();
        double[] speeds = new double[n];
        double[] values = new double[n];
        double top = c.limit() > 0 ? c.limit() : 0;
        double bottom = Double.POSITIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            speeds[i] = c.points().get(i).speedRpm();
            values[i] = c.points().get(i).value() / u.factor();
            top = Math.max(top, c.points().get(i).value());
            if (c.points().get(i).value() > 0) {
                bottom = Math.min(bottom, c.points().get(i).value());
            }
        }
        double limit = c.limit() / u.factor();
        double hi = (top > 0 ? top : 1) / u.factor() * 1.6;
        double lo = Double.isFinite(bottom) ? bottom / u.factor() / 1.3 : hi / 1e3;
        lo = Math.max(lo, hi * 1e-4); // below that a standstill tail would flatten everything else
        if (limit > 0) {
            lo = Math.min(lo, limit / 3);
        }
        double xmax = n > 0 ? speeds[n - 1] : 1;
        double x0 = Frames.LEFT;
        double x1 = Frames.W - Frames.RIGHT;
        double y0 = H - Frames.BOTTOM;
        double y1 = Frames.TOP;
        Scale xs = new Scale.Linear(0, xmax, x0, x1);
        Scale ys = new Scale.Log(lo, hi, y0, y1);
        Svg.Builder b = new Svg.Builder(Frames.W, H).clip(clipId, x0, y1, x1 - x0, y0 - y1);
        String unit = u.unit().isEmpty() || u.unit().equals("1") ? "" : " (" + u.unit() + ")";
        Frames.axes(b, xs, ys, "running speed (rpm)", c.quantity() + unit);
        double[] op = {minRpm, maxRpm};
        Frames.operatingRange(b, xs, ys, op[0], op[1]);
        double[] px = new double[n];
        double[] py = new double[n];
        for (int i = 0; i < n; i++) {
            px[i] = xs.at(speeds[i]);
            py[i] = ys.at(values[i]);
        }
        b.poly(px, py, "curve", clipId);
        if (limit > 0) {
            double yl = ys.at(limit);
            // the part of the curve above the limit inside the operating range, drawn again in the warning colour
            String over = clipId + "o";
            b.clip(over, xs.at(op[0]) - 1, y1, Math.max(xs.at(op[1]) - xs.at(op[0]), 0) + 2, yl - y1);
            b.poly(px, py, "curve over", over);
            b.line(x0, yl, x1, yl, "limit");
            b.text(x1 + 6, yl + 4, "start", "lbl limit-lbl", 0, "limit " + u.format(c.limit()));
        }
        if (check.isPresent() && check.get().speedRpm().isPresent()) {
            CheckResult r = check.get();
            double s = r.speedRpm().getAsDouble();
            // an isolation check may state efficiency 1 − T; the marker sits on the drawn T
            double v = r.rule().equals("isolation") ? nearest(c, s) : r.value();
            b.dot(xs.at(s), ys.at(v / u.factor()), 5, "worst " + r.status().key(),
                    "governing value " + u.format(v) + " at " + Units.number(s) + " rpm");
        }
        return b.build(c.quantity() + " against running speed, criterion " + c.criterion());
    }

    /** The curve's value at the sample nearest speed {@code rpm} (the resonance speeds are samples). */
    private static double nearest(ResponseCurve c, double rpm) {
        double best = Double.NaN;
        double distance = Double.POSITIVE_INFINITY;
        for (ResponseCurve.Point p : c.points()) {
            if (Math.abs(p.speedRpm() - rpm) < distance) {
                distance = Math.abs(p.speedRpm() - rpm);
                best = p.value();
            }
        }
        return best;
    }
}
