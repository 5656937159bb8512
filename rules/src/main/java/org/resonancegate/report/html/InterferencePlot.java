package org.resonancegate.report.html;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.resonancegate.criteria.ResponseCurves;
import org.resonancegate.report.Interference;

/**
 * The interference diagram: natural frequencies as level lines with their separation bands,
 * each order of running speed as a line through the origin (f = k·n/60), the operating range
 * shaded, and a marker where an order meets a mode (n = 60·f/k), hollow; where the order runs
 * inside the band within the operating range (what the separation rule forbids) that stretch is
 * thickened and a filled marker sits on it, at the speed nearest the crossing.
 *
 * <p>With a baseline, the modes that moved are drawn again, dashed, at their frequency at the
 * baseline, so a reviewer sees where a mode came from on its way into (or out of) a band.
 */
final class InterferencePlot {

    static final int H = 330;

    /**
     * The baseline's frequencies of the modes that moved since, and the revision they are from.
     * These are nominal frequencies (the comparison keeps nominal modes), while the solid lines
     * are those of the case the diagram is drawn for; the legend says so.
     */
    record Baseline(String ref, List<Interference.ModeLine> modes) {
        Baseline {
            modes = List.copyOf(modes);
        }
    }

    private InterferencePlot() {
    }

    static String excitationClass(int i) {
        return "x" + (i % 5);
    }

    static List<Page.Legend> legend(Interference d, Optional<Baseline> was) {
        List<Page.Legend> out = new ArrayList<>();
        double reach = frequencyReach(d, d.margin().orElse(0), was);
        for (int i = 0; i < d.excitations().size(); i++) {
            Interference.ExcitationLine e = d.excitations().get(i);
            String what = e.order().isPresent() ? order(e.order().getAsDouble()) + " running speed"
                    : "fixed " + Units.number(e.frequencyHz().getAsDouble()) + " Hz"
                    + (e.frequencyHz().getAsDouble() > reach ? " (above the plotted frequencies)" : "");
            out.add(new Page.Legend(excitationClass(i), what + ": " + e.name()));
        }
        was.filter(w -> !w.modes().isEmpty()).ifPresent(w -> out.add(new Page.Legend("was", "at " + w.ref()
                + ": the nominal frequency of each mode that moved since"
                + (d.basis().equals("nominal") ? "" : " (the solid lines are the " + d.basis() + " case)"))));
        return out;
    }

    static String order(double k) {
        return Units.number(k) + "×";
    }

    static Svg draw(Interference d, String clipId) {
        return draw(d, clipId, Optional.empty());
    }

    static Svg draw(Interference d, String clipId, Optional<Baseline> was) {
        double xmax = d.maxSpeedRpm() > 0 ? ResponseCurves.REACH * d.maxSpeedRpm() : 100;
        double margin = d.margin().orElse(0);
        double fmax = frequencyReach(d, margin, was);
        double x0 = Frames.LEFT;
        double x1 = Frames.W - Frames.RIGHT;
        double y0 = H - Frames.BOTTOM;
        double y1 = Frames.TOP;
        Scale xs = new Scale.Linear(0, xmax, x0, x1);
        Scale ys = new Scale.Linear(0, fmax, y0, y1);
        Svg.Builder b = new Svg.Builder(Frames.W, H).clip(clipId, x0, y1, x1 - x0, y0 - y1);
        Frames.axes(b, xs, ys, "running speed (rpm)", "frequency (Hz)");
        Frames.operatingRange(b, xs, ys, d.minSpeedRpm(), d.maxSpeedRpm());
        double labelY = Double.POSITIVE_INFINITY;
        for (Interference.ModeLine m : d.modes()) {
            double f = m.frequencyHz();
            if (margin > 0) {
                double top = Math.min(ys.at(f * (1 + margin)), y0);
                b.rect(x0, Math.max(top, y1), x1 - x0, Math.min(ys.at(f * (1 - margin)), y0) - Math.max(top, y1), "band");
            }
            if (f <= fmax) {
                b.line(x0, ys.at(f), x1, ys.at(f), "mode");
                // modes listed lowest first: each label keeps clear of the one below it
                labelY = Math.min(ys.at(f) + 4, labelY - 12);
                b.text(x1 + 6, labelY, "start", "lbl mode-lbl", 0,
                        "mode " + m.index() + " · " + Units.number(f) + " Hz");
            }
        }
        if (was.isPresent()) {
            List<Interference.ModeLine> old = new ArrayList<>(was.get().modes());
            old.sort(java.util.Comparator.comparingDouble(Interference.ModeLine::frequencyHz));
            double wasLabelY = Double.POSITIVE_INFINITY;
            for (Interference.ModeLine m : old) {
                double f = m.frequencyHz();
                if (f > 0 && f <= fmax) {
                    b.line(x0, ys.at(f), x1, ys.at(f), "was");
                    // lowest first, each label kept clear of the one below; the legend names the revision
                    wasLabelY = Math.min(ys.at(f) - 3, wasLabelY - 11);
                    b.text(x0 + 4, wasLabelY, "start", "lbl was-lbl", 0,
                            "mode " + m.index() + " was " + Units.number(f) + " Hz");
                }
            }
        }
        for (int i = 0; i < d.excitations().size(); i++) {
            Interference.ExcitationLine e = d.excitations().get(i);
            String cls = excitationClass(i);
            if (e.frequencyHz().isPresent()) {
                double f = e.frequencyHz().getAsDouble();
                b.poly(new double[] {x0, x1}, new double[] {ys.at(f), ys.at(f)}, "exc fixed " + cls, clipId);
                continue;
            }
            double k = e.order().getAsDouble();
            if (!(k > 0)) {
                continue;
            }
            b.poly(new double[] {xs.at(0), xs.at(xmax)}, new double[] {ys.at(0), ys.at(k * xmax / 60)}, "exc " + cls,
                    clipId);
            // the label sits where the line leaves the plot: the right edge, or the top
            double leaveX = Math.min(xmax, 60 * fmax / k);
            b.text(xs.at(leaveX) - 4, ys.at(k * leaveX / 60) + (leaveX < xmax ? 14 : -5), "end", "lbl " + cls, 0,
                    order(k));
        }
        crossings(b, d, xs, ys, xmax, fmax, margin, clipId);
        return b.build("interference diagram: natural frequencies against running speed and its orders");
    }

    /**
     * The top of the frequency axis: the modes with their bands and some room above, so that a
     * high order (a gear mesh far above every mode) does not squash the modes into the axis; the
     * order lines are clipped at the top. Excitations reaching up to twice that are shown whole.
     */
    private static double frequencyReach(Interference d, double margin, Optional<Baseline> was) {
        double modes = 0;
        for (Interference.ModeLine m : d.modes()) {
            modes = Math.max(modes, m.frequencyHz() * (1 + margin));
        }
        for (Interference.ModeLine m : was.map(Baseline::modes).orElse(List.of())) {
            modes = Math.max(modes, m.frequencyHz());
        }
        double excitations = 0;
        for (Interference.ExcitationLine e : d.excitations()) {
            excitations = Math.max(excitations, e.order().isPresent()
                    ? e.order().getAsDouble() * d.maxSpeedRpm() / 60 : e.frequencyHz().getAsDouble());
        }
        double top = modes > 0 ? Math.max(modes * 1.3, excitations <= 2 * modes * 1.3 ? excitations * 1.08 : 0)
                : excitations * 1.08;
        return top > 0 ? top : 10;
    }

    private static void crossings(Svg.Builder b, Interference d, Scale xs, Scale ys, double xmax, double fmax,
                                  double margin, String clipId) {
        for (Interference.ExcitationLine e : d.excitations()) {
            if (e.frequencyHz().isPresent()) {
                fixedInBand(b, d, e.frequencyHz().getAsDouble(), xs, ys, margin, clipId);
                continue;
            }
            if (!(e.order().getAsDouble() > 0)) {
                continue;
            }
            double k = e.order().getAsDouble();
            for (Interference.ModeLine m : d.modes()) {
                double f = m.frequencyHz();
                double n = 60 * f / k;
                if (!(n <= xmax) || f > fmax) {
                    continue;
                }
                // the speeds over which this order is inside the mode's band
                double lo = 60 * f * (1 - margin) / k;
                double hi = 60 * f * (1 + margin) / k;
                boolean hit = lo <= d.maxSpeedRpm() && hi >= d.minSpeedRpm();
                String where = order(k) + " meets mode " + m.index() + " (" + Units.number(f) + " Hz) at "
                        + Units.number(n) + " rpm";
                if (hit) {
                    double a = Math.max(lo, d.minSpeedRpm());
                    double z = Math.min(hi, d.maxSpeedRpm());
                    b.poly(new double[] {xs.at(a), xs.at(z)}, new double[] {ys.at(k * a / 60), ys.at(k * z / 60)},
                            "hitseg", clipId);
                    // the centre-line crossing may lie outside the range while the band's edge reaches into
                    // it: the filled marker goes on the order line at the speed of the overlap nearest the
                    // crossing, so it sits inside both the band and the range; the crossing itself stays hollow
                    double at = Math.min(Math.max(n, a), z);
                    if (at != n) {
                        b.dot(xs.at(n), ys.at(f), 4, "cross", where + ", outside the operating range");
                    }
                    b.dot(xs.at(at), ys.at(k * at / 60), 7, "hit", order(k) + " inside the band of mode " + m.index()
                            + " (" + Units.number(f) + " Hz"
                            + (margin > 0 ? " ± " + Units.percent(margin) : "") + ") at " + Units.number(at)
                            + " rpm, within the operating range" + (at != n ? "; it meets the mode itself at "
                            + Units.number(n) + " rpm" : ""));
                } else {
                    b.dot(xs.at(n), ys.at(f), 4, "cross", where + ", outside the operating range");
                }
            }
        }
    }

    /**
     * A fixed frequency does not move with speed: inside a mode's band it stays there over the
     * whole operating range, so the range's stretch of its line is marked, with a marker at the
     * bottom speed.
     */
    private static void fixedInBand(Svg.Builder b, Interference d, double f, Scale xs, Scale ys, double margin,
                                    String clipId) {
        for (Interference.ModeLine m : d.modes()) {
            if (Math.abs(f / m.frequencyHz() - 1) < margin) {
                b.poly(new double[] {xs.at(d.minSpeedRpm()), xs.at(d.maxSpeedRpm())}, new double[] {ys.at(f), ys.at(f)},
                        "hitseg", clipId);
                b.dot(xs.at(d.minSpeedRpm()), ys.at(f), 7, "hit", "fixed " + Units.number(f) + " Hz lies inside the "
                        + Units.percent(margin) + " band of mode " + m.index() + " (" + Units.number(m.frequencyHz())
                        + " Hz) over the whole operating range");
            }
        }
    }
}
