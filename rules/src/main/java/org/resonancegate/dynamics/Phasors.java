package org.resonancegate.dynamics;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.complex.Complex;

/**
 * A vector of complex amplitudes kept as two primitive arrays: a sweep evaluates thousands of
 * responses, and one object per complex number would cost more than the arithmetic.
 */
public final class Phasors {

    final double[] re;
    final double[] im;

    Phasors(int size) {
        re = new double[size];
        im = new double[size];
    }

    /** One complex amplitude. */
    public static Phasors of(Complex value) {
        Phasors p = new Phasors(1);
        p.re[0] = value.getReal();
        p.im[0] = value.getImaginary();
        return p;
    }

    public int size() {
        return re.length;
    }

    public Complex get(int i) {
        return new Complex(re[i], im[i]);
    }

    public double re(int i) {
        return re[i];
    }

    public double im(int i) {
        return im[i];
    }

    /** |component i|. */
    public double abs(int i) {
        return Math.sqrt(re[i] * re[i] + im[i] * im[i]); // hypot is several times slower; amplitudes here never overflow
    }

    /** Σ g_j·v_j for a real row {@code g}. */
    public Complex dot(double[] g) {
        double r = 0;
        double m = 0;
        for (int j = 0; j < g.length; j++) {
            r += g[j] * re[j];
            m += g[j] * im[j];
        }
        return new Complex(r, m);
    }

    /**
     * The peak over a cycle of the real vector Re(v·e^{iωt}), v = a + ib: the major semi-axis of
     * the ellipse it traces, √((|a|² + |b|²)/2 + √(((|a|² − |b|²)/2)² + (a·b)²)). For one
     * component it is |v|.
     */
    public double peakOverCycle() {
        double aa = 0;
        double bb = 0;
        double ab = 0;
        for (int j = 0; j < re.length; j++) {
            aa += re[j] * re[j];
            bb += im[j] * im[j];
            ab += re[j] * im[j];
        }
        double half = (aa - bb) / 2;
        return Math.sqrt((aa + bb) / 2 + Math.sqrt(half * half + ab * ab));
    }

    public List<Complex> asList() {
        List<Complex> out = new ArrayList<>(re.length);
        for (int i = 0; i < re.length; i++) {
            out.add(get(i));
        }
        return out;
    }

    /** Every component finite. */
    public boolean finite() {
        for (int i = 0; i < re.length; i++) {
            if (!Double.isFinite(re[i]) || !Double.isFinite(im[i])) {
                return false;
            }
        }
        return true;
    }
}
