package org.resonancegate.crosscheck;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/**
 * Brute-force worst values of every criterion over the tolerance cases and a dense speed grid
 * (20,001 evenly spaced speeds plus 1,001 speeds around every mode's resonance speed for every
 * order), combining excitations as spec-format.md says: at one frequency as phasors, at distinct
 * frequencies peaks arithmetically and rms as a root sum of squares (check-values.md 3.9: for one
 * sinusoid rms = peak/√2, velocity = ω·displacement).
 */
final class WorstCase {

    static final int GRID = 20_001;
    static final int LOCAL = 1_001;

    enum Kind { UNBALANCE, FORCE, BASE, ORDER }

    /**
     * One excitation. {@code order} is NaN for a fixed {@code frequencyHz}. The load shape
     * (re, im) over the degrees of freedom is per unit force, with a peak of one over a cycle;
     * {@code amount} is the unbalance U (kg·m, force U·ω²) or the force amplitude (N).
     */
    record Load(Kind kind, double order, double frequencyHz, double amount, double[] re, double[] im, Base base) {
        Load(Kind kind, double order, double frequencyHz, double amount, double[] re, double[] im) {
            this(kind, order, frequencyHz, amount, re, im, null);
        }

        double omega(double shaft) {
            return Double.isNaN(order) ? 2 * Math.PI * frequencyHz : order * shaft;
        }

        /** The force amplitude, or for base motion the ground's displacement amplitude (amount/ω^measure). */
        double force(double w) {
            return switch (kind) {
                case UNBALANCE -> amount * w * w;
                case BASE -> amount / Math.pow(w, base.measure());
                default -> amount;
            };
        }
    }

    /**
     * Base motion: {@code measure} 0, 1, 2 for a displacement, velocity or acceleration amplitude
     * (|Y| = A/ω^measure, check-values 3.9); {@code ground} the motion's component along every
     * element row; isolation is |isoDir·u(isoPoint)|/Y (spec-format.md, "isolation").
     */
    record Base(int measure, double phaseRad, double[] ground, int isoPoint, double[] isoDir) {
    }

    enum ProbeKind { DISPLACEMENT, VELOCITY, FORCE }

    /**
     * A response criterion: at point {@code point} (ignored for force), along {@code axis} (a row
     * of the point or element; −1: every row, the largest counts); {@code alternative} means
     * peak-to-peak for displacement and peak (not rms) for velocity.
     */
    record Probe(String id, ProbeKind kind, int point, int axis, boolean alternative) {
    }

    /** Worst values: smallest separation, largest transmissibility, largest probe values, every static deflection. */
    record Worst(double separation, double isolation, Map<String, Double> probes, List<double[]> deflections) {
    }

    private WorstCase() {
    }

    static Worst evaluate(List<IndependentSystem> cases, List<Load> loads, double nMin, double nMax,
                          List<Probe> probes) {
        List<Load> driving = loads.stream().filter(l -> l.kind() != Kind.ORDER).toList();
        Map<String, Integer> groupKeys = new LinkedHashMap<>();
        int[] groupOf = new int[driving.size()];
        for (int l = 0; l < driving.size(); l++) {
            Load load = driving.get(l);
            String key = Double.isNaN(load.order()) ? "f" + load.frequencyHz() : "o" + load.order();
            groupOf[l] = groupKeys.computeIfAbsent(key, k -> groupKeys.size());
        }
        int groups = groupKeys.size();
        double separation = Double.MAX_VALUE;
        double isolation = 0;
        Map<String, Double> worst = new HashMap<>();
        probes.forEach(p -> worst.put(p.id(), 0.0));
        List<double[]> deflections = new ArrayList<>();
        for (IndependentSystem sys : cases) {
            if (sys.gravityLoad != null) {
                deflections.add(Arrays.stream(sys.staticDeflections()).map(Math::abs).toArray());
            }
            for (int r = 0; r < sys.n; r++) {
                double fn = sys.frequencyHz(r);
                if (fn == 0) {
                    continue; // a free line's zero-frequency mode is left out of separation (spec-format.md)
                }
                for (Load load : loads) {
                    double lo = (Double.isNaN(load.order()) ? load.frequencyHz() : load.order() * nMin / 60) / fn;
                    double hi = (Double.isNaN(load.order()) ? load.frequencyHz() : load.order() * nMax / 60) / fn;
                    double d = lo <= 1 && hi >= 1 ? 0 : Math.min(Math.abs(lo - 1), Math.abs(hi - 1));
                    separation = Math.min(separation, d);
                }
            }
            int nPt = sys.pointRows.length;
            int nEl = sys.rows.length;
            double[][] gpRe = new double[groups][nPt];
            double[][] gpIm = new double[groups][nPt];
            double[][] geRe = new double[groups][nEl];
            double[][] geIm = new double[groups][nEl];
            double[] gw = new double[groups];
            double[] ptRe = new double[nPt];
            double[] ptIm = new double[nPt];
            double[] elRe = new double[nEl];
            double[] elIm = new double[nEl];
            double[] gRe = new double[sys.groundDims];
            double[] gIm = new double[sys.groundDims];
            for (double rpm : speeds(sys, driving, nMin, nMax)) {
                double shaft = 2 * Math.PI * rpm / 60;
                for (int g = 0; g < groups; g++) {
                    Arrays.fill(gpRe[g], 0);
                    Arrays.fill(gpIm[g], 0);
                    Arrays.fill(geRe[g], 0);
                    Arrays.fill(geIm[g], 0);
                }
                for (int l = 0; l < driving.size(); l++) {
                    Load load = driving.get(l);
                    double w = load.omega(shaft);
                    double f = load.force(w);
                    if (load.kind() == Kind.BASE) {
                        Base b = load.base();
                        // The stated quantity is A·cos(ωt + φ) (spec-format.md, Excitations); integrating a
                        // harmonic divides by iω, so Y = A·e^{iφ}/(iω)^measure: magnitude A/ω^measure,
                        // phase φ − measure·π/2.
                        double ph = b.phaseRad() - b.measure() * Math.PI / 2;
                        sys.respondBase(w, f * Math.cos(ph), f * Math.sin(ph), b.ground(), ptRe, ptIm, elRe, elIm);
                        double uRe = 0;
                        double uIm = 0;
                        for (int c = 0; c < b.isoDir().length; c++) {
                            uRe += b.isoDir()[c] * ptRe[sys.pointStart[b.isoPoint()] + c];
                            uIm += b.isoDir()[c] * ptIm[sys.pointStart[b.isoPoint()] + c];
                        }
                        isolation = Math.max(isolation, Math.hypot(uRe, uIm) / f);
                    } else {
                        sys.respond(w, f, load.re(), load.im(), ptRe, ptIm, elRe, elIm);
                        Arrays.fill(gRe, 0);
                        Arrays.fill(gIm, 0);
                        for (int j = 0; j < nEl; j++) {
                            if (sys.rowGround[j] >= 0) {
                                gRe[sys.rowGround[j]] += elRe[j];
                                gIm[sys.rowGround[j]] += elIm[j];
                            }
                        }
                        isolation = Math.max(isolation, ellipsePeak(gRe, gIm) / f);
                    }
                    int g = groupOf[l];
                    gw[g] = w;
                    for (int j = 0; j < nPt; j++) {
                        gpRe[g][j] += ptRe[j];
                        gpIm[g][j] += ptIm[j];
                    }
                    for (int j = 0; j < nEl; j++) {
                        geRe[g][j] += elRe[j];
                        geIm[g][j] += elIm[j];
                    }
                }
                for (Probe p : probes) {
                    double v = probe(sys, p, groups, gw, gpRe, gpIm, geRe, geIm);
                    if (v > worst.get(p.id())) {
                        worst.put(p.id(), v);
                    }
                }
            }
        }
        return new Worst(separation, isolation, worst, deflections);
    }

    private static double probe(IndependentSystem sys, Probe p, int groups, double[] gw, double[][] gpRe,
                                double[][] gpIm, double[][] geRe, double[][] geIm) {
        if (p.kind() == ProbeKind.FORCE) {
            double best = 0;
            for (int e = 0; e < sys.elementNames.length; e++) {
                for (int c = 0; c < sys.elementCount[e]; c++) {
                    if (p.axis() >= 0 && c != p.axis()) {
                        continue;
                    }
                    int j = sys.elementStart[e] + c;
                    double s = 0;
                    for (int g = 0; g < groups; g++) {
                        s += Math.hypot(geRe[g][j], geIm[g][j]); // forces combine like peak
                    }
                    best = Math.max(best, s);
                }
            }
            return best;
        }
        double best = 0;
        for (int c = 0; c < sys.pointCount[p.point()]; c++) {
            if (p.axis() >= 0 && c != p.axis()) {
                continue;
            }
            int j = sys.pointStart[p.point()] + c;
            double s = 0;
            for (int g = 0; g < groups; g++) {
                double amp = Math.hypot(gpRe[g][j], gpIm[g][j]);
                if (p.kind() == ProbeKind.DISPLACEMENT) {
                    s += amp;
                } else if (p.alternative()) {
                    s += gw[g] * amp;
                } else {
                    s += Math.pow(gw[g] * amp, 2) / 2;
                }
            }
            if (p.kind() == ProbeKind.VELOCITY && !p.alternative()) {
                s = Math.sqrt(s);
            }
            if (p.kind() == ProbeKind.DISPLACEMENT && p.alternative()) {
                s *= 2;
            }
            best = Math.max(best, s);
        }
        return best;
    }

    /**
     * The largest magnitude over a cycle of Re(G·e^{iωt}) = a·cos ωt − b·sin ωt: the major
     * semi-axis of the ellipse, √((a² + b²)/2 + √(((a² − b²)/2)² + (a·b)²)).
     */
    static double ellipsePeak(double[] a, double[] b) {
        double aa = IndependentSystem.dot(a, a);
        double bb = IndependentSystem.dot(b, b);
        double ab = IndependentSystem.dot(a, b);
        return Math.sqrt((aa + bb) / 2 + Math.sqrt(Math.pow((aa - bb) / 2, 2) + ab * ab));
    }

    private static double[] speeds(IndependentSystem sys, List<Load> driving, double nMin, double nMax) {
        if (nMin == nMax) {
            return new double[] {nMin};
        }
        TreeSet<Double> set = new TreeSet<>();
        for (int i = 0; i < GRID; i++) {
            set.add(nMin + (nMax - nMin) * i / (GRID - 1));
        }
        for (int r = 0; r < sys.n; r++) {
            if (sys.omega[r] == 0) {
                continue;
            }
            double z = Math.max(sys.modeZeta[r], 0.003);
            for (Load load : driving) {
                if (Double.isNaN(load.order())) {
                    continue;
                }
                double centre = 60 * sys.frequencyHz(r) / load.order();
                for (int i = 0; i < LOCAL; i++) {
                    double rpm = centre * (1 - 10 * z + 20 * z * i / (LOCAL - 1));
                    if (rpm >= nMin && rpm <= nMax) {
                        set.add(rpm);
                    }
                }
            }
        }
        return set.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
