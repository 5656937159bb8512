package org.resonancegate.report.html;

import java.util.ArrayList;
import java.util.List;

/** Maps a data range onto a pixel range, linearly or by decades, and chooses readable ticks. */
sealed interface Scale {

    /** Pixel position of data value {@code v}. */
    double at(double v);

    /** Tick values inside the range. */
    List<Double> ticks();

    double lo();

    double hi();

    /** Linear; {@code p0} is the pixel of {@code lo} (may be larger than {@code p1}, as a y axis is). */
    record Linear(double lo, double hi, double p0, double p1) implements Scale {
        @Override
        public double at(double v) {
            return p0 + (v - lo) / (hi - lo) * (p1 - p0);
        }

        @Override
        public List<Double> ticks() {
            double step = niceStep((hi - lo) / 6);
            List<Double> out = new ArrayList<>();
            for (long i = (long) Math.ceil(lo / step - 1e-9); i * step <= hi * (1 + 1e-9); i++) {
                out.add(i * step);
            }
            return out;
        }
    }

    /** Logarithmic, for amplitudes that span decades around a resonance. */
    record Log(double lo, double hi, double p0, double p1) implements Scale {
        @Override
        public double at(double v) {
            double c = Math.max(v, lo * 1e-3); // zero and below sit under the bottom edge, clipped
            return p0 + (Math.log10(c) - Math.log10(lo)) / (Math.log10(hi) - Math.log10(lo)) * (p1 - p0);
        }

        @Override
        public List<Double> ticks() {
            double decades = Math.log10(hi / lo);
            double[] mantissas = decades <= 1.5 ? new double[] {1, 2, 5} : decades <= 3 ? new double[] {1, 3}
                    : new double[] {1};
            List<Double> out = new ArrayList<>();
            for (int e = (int) Math.floor(Math.log10(lo)); e <= (int) Math.ceil(Math.log10(hi)); e++) {
                for (double m : mantissas) {
                    double v = m * Math.pow(10, e);
                    if (v >= lo * (1 - 1e-9) && v <= hi * (1 + 1e-9)) {
                        out.add(Double.parseDouble(String.format(java.util.Locale.ROOT, "%.6g", v)));
                    }
                }
            }
            return out;
        }
    }

    /** 1, 2 or 5 times a power of ten, at least {@code rough}. */
    static double niceStep(double rough) {
        if (!(rough > 0)) {
            return 1;
        }
        double p = Math.pow(10, Math.floor(Math.log10(rough)));
        double f = rough / p;
        return (f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10) * p;
    }
}
