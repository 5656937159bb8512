package org.resonancegate.dynamics;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.apache.commons.math3.complex.Complex;

/**
 * The shared core of the chain and the rigid body: a mass matrix, elements given as rows
 * (deformation Δ_r = g_r·q − ground motion of the row, stiffness k_r, dashpot c_r, loss factor η_r),
 * the modes, and the forced response.
 *
 * <p>With model-level damping every mode gets the same ratio ζ (classical modal damping) and the
 * response is a modal sum; the element force takes each mode's share times (1 + i·2ζ_r·ω/ω_r), the
 * viscous force a dashpot tuned to that mode would add, which reproduces the single-mass
 * transmissibility exactly. Base motion is solved in relative coordinates: the ground motion
 * carries the whole model along as a rigid translation s·Y (it deforms no element), and the
 * deformation z answers the inertia load ω²·M·s·Y through the same modal sum; the absolute
 * response is s·Y + z.
 *
 * <p>With element damping the full complex system (K + iH − ω²M + iωC)·q = F is solved.
 */
final class MatrixModel {

    /** Mode shares below this fraction are left out of a description. */
    static final double SHARE_SHOWN = 0.05;

    /**
     * One element row.
     *
     * @param gather          g_r: the row's body-side displacement is g_r·q
     * @param groundComponent which ground-force component it feeds, −1 when not tied to ground
     */
    record Row(double[] gather, double k, double c, double eta, int groundComponent) {
    }

    /** A force's unit pattern p (complex generalised force) and its modal participations φ_rᵀ·p. */
    record Pattern(double[] re, double[] im, double[] partRe, double[] partIm) {
    }

    /**
     * A ground motion's unit pattern: the rigid translation s it imposes, each row's ground
     * displacement, and the modal participation φ_rᵀ·M·s of the inertia load.
     */
    record BaseShape(double[] shift, double[] rowGround, double[] part) {
    }

    /** The undamped modes of a model and the tolerance scale it was built at. */
    record Modes(double[] omegaSq, double[][] phi, ModelScale scale) {
    }

    final int n;
    final double[][] mass;
    final double[][] stiffness;
    private final double[][] viscous;
    private final double[][] hysteretic;
    final Row[] rows;
    final int groundComponents;
    private final boolean modal;
    private final double[] omegaSq;
    private final double[] omegaN;
    private final double[] zeta;
    final double[][] phi;
    private final double[][] rowModal;
    /** Per ground-force component and mode, Σ over the grounded rows of k_r·(g_r·φ_m). */
    private final double[][] groundModal;
    final List<Mode> modes;
    /** Per set of probe rows a criterion reads, each row's modal coefficients g·φ_m. */
    private final ShapeCache<double[][], double[][]> probeModes = new ShapeCache<>();
    private final ModelScale scale;

    /**
     * @param modalRatio the model-level ratio for every mode, or empty for element damping
     * @param dofNames   motion names for mode shares ("x" …, or mass names)
     * @param dofReading the same for a reader
     * @param scale      the tolerance scale the mass and the rows were built at
     * @param sameModel  the modes of this very model at another scale, when known: then no
     *                   eigenproblem is solved (see {@link #scaledModes})
     */
    MatrixModel(double[][] mass, List<Row> rowList, int groundComponents, OptionalDouble modalRatio,
                String[] dofNames, String[] dofReading, ModelScale scale, Optional<Modes> sameModel) {
        this.scale = scale;
        this.n = mass.length;
        this.mass = mass;
        this.rows = rowList.toArray(new Row[0]);
        this.groundComponents = groundComponents;
        this.modal = modalRatio.isPresent();
        stiffness = new double[n][n];
        viscous = new double[n][n];
        hysteretic = new double[n][n];
        for (Row r : rows) {
            addOuter(stiffness, r.gather(), r.k());
            addOuter(viscous, r.gather(), r.c());
            addOuter(hysteretic, r.gather(), r.k() * r.eta());
        }
        Optional<Modes> known = sameModel.flatMap(this::scaledModes);
        if (known.isPresent()) {
            omegaSq = known.get().omegaSq();
            phi = known.get().phi();
        } else {
            GeneralizedEigen.Solution s = GeneralizedEigen.solve(mass, stiffness);
            omegaSq = s.values();
            phi = s.vectors();
        }
        omegaN = new double[n];
        zeta = new double[n];
        List<Mode> list = new ArrayList<>();
        for (int m = 0; m < n; m++) {
            omegaN[m] = Math.sqrt(omegaSq[m]);
            OptionalDouble reported;
            if (!(omegaN[m] > 0)) {
                reported = OptionalDouble.empty(); // a free motion has no damping ratio
                zeta[m] = 0;
            } else if (modal) {
                zeta[m] = modalRatio.getAsDouble();
                reported = OptionalDouble.of(zeta[m]);
            } else {
                // Diagonal modal estimate ζ_r = φᵀCφ/(2ω_r) + φᵀHφ/(2ω_r²); the response uses full C and H.
                zeta[m] = quadratic(viscous, phi[m]) / (2 * omegaN[m]) + quadratic(hysteretic, phi[m]) / (2 * omegaSq[m]);
                reported = OptionalDouble.of(zeta[m]);
            }
            list.add(new Mode(m + 1, omegaN[m], reported, n > 1 ? shares(phi[m], dofNames, dofReading) : List.of()));
        }
        modes = List.copyOf(list);
        rowModal = new double[rows.length][n];
        for (int r = 0; r < rows.length; r++) {
            for (int m = 0; m < n; m++) {
                rowModal[r][m] = dot(rows[r].gather(), phi[m]);
            }
        }
        groundModal = new double[groundComponents][n];
        for (int r = 0; r < rows.length; r++) {
            if (rows[r].groundComponent() >= 0) {
                for (int m = 0; m < n; m++) {
                    groundModal[rows[r].groundComponent()][m] += rows[r].k() * rowModal[r][m];
                }
            }
        }
    }

    /** This model's undamped modes, for the same model at another tolerance scale. */
    Modes modesForScaling() {
        return new Modes(omegaSq, phi, scale);
    }

    /**
     * The modes of this model from those of the same model at another scale, exactly: every
     * stiffness × κ and every mass × μ (relative to that scale) turn K·φ = λ·M·φ into
     * κK·φ = (κ/μ)λ·μM·φ, so the shapes stay, λ scales by κ/μ, and mass normalisation
     * (φᵀ·μM·φ = 1) divides each shape by √μ; the sign convention (largest component positive)
     * is kept. Damping does not enter the undamped modes; the modal ratios are worked out below
     * from this model's own damping, as for a fresh solution. Empty when a factor is not a
     * positive finite number (then the eigenproblem is solved).
     */
    private Optional<Modes> scaledModes(Modes other) {
        double kappa = scale.stiffness() / other.scale().stiffness();
        double mu = scale.mass() / other.scale().mass();
        if (!(kappa > 0 && mu > 0 && Double.isFinite(kappa) && Double.isFinite(mu))
                || other.omegaSq().length != n) {
            return Optional.empty();
        }
        double ratio = kappa / mu;
        double shape = 1 / Math.sqrt(mu);
        double[] values = new double[n];
        double[][] vectors = new double[n][n];
        for (int r = 0; r < n; r++) {
            values[r] = other.omegaSq()[r] * ratio;
            for (int j = 0; j < n; j++) {
                vectors[r][j] = other.phi()[r][j] * shape;
            }
        }
        return Optional.of(new Modes(values, vectors, scale));
    }

    /** Each row's modal coefficients g·φ_m. */
    private double[][] modalCoefficients(double[][] gathers) {
        double[][] out = new double[gathers.length][n];
        for (int j = 0; j < gathers.length; j++) {
            for (int m = 0; m < n; m++) {
                out[j][m] = dot(gathers[j], phi[m]);
            }
        }
        return out;
    }

    Pattern pattern(double[] re, double[] im) {
        double[] pr = new double[n];
        double[] pi = new double[n];
        for (int m = 0; m < n; m++) {
            pr[m] = dot(phi[m], re);
            pi[m] = dot(phi[m], im);
        }
        return new Pattern(re, im, pr, pi);
    }

    BaseShape baseShape(double[] shift, double[] rowGround) {
        double[] ms = multiply(mass, shift);
        double[] part = new double[n];
        for (int m = 0; m < n; m++) {
            part[m] = dot(phi[m], ms);
        }
        return new BaseShape(shift, rowGround, part);
    }

    Response force(Pattern p, Complex amplitude, double w) {
        double ar = amplitude.getReal();
        double ai = amplitude.getImaginary();
        if (modal) {
            double[] er = new double[n];
            double[] ei = new double[n];
            for (int m = 0; m < n; m++) {
                // a·P_m
                double nr = ar * p.partRe()[m] - ai * p.partIm()[m];
                double ni = ar * p.partIm()[m] + ai * p.partRe()[m];
                divideByModalDenominator(m, w, nr, ni, er, ei);
            }
            return modalResponse(er, ei, w, null, 0, 0);
        }
        double[] br = new double[n];
        double[] bi = new double[n];
        for (int j = 0; j < n; j++) {
            br[j] = ar * p.re()[j] - ai * p.im()[j];
            bi[j] = ar * p.im()[j] + ai * p.re()[j];
        }
        return directResponse(br, bi, w, null, 0, 0);
    }

    Response base(BaseShape b, Complex amplitude, double w) {
        double ar = amplitude.getReal();
        double ai = amplitude.getImaginary();
        if (modal) {
            double[] er = new double[n];
            double[] ei = new double[n];
            double w2 = w * w;
            for (int m = 0; m < n; m++) {
                divideByModalDenominator(m, w, w2 * b.part()[m] * ar, w2 * b.part()[m] * ai, er, ei);
            }
            return modalResponse(er, ei, w, b.shift(), ar, ai);
        }
        double[] br = new double[n];
        double[] bi = new double[n];
        for (int idx = 0; idx < rows.length; idx++) {
            double share = b.rowGround()[idx];
            if (share == 0) {
                continue;
            }
            // g_r·(k_r + i(k_r·η_r + ω·c_r))·(ground share)·Y
            Row r = rows[idx];
            double zr = r.k() * share;
            double zi = (r.k() * r.eta() + w * r.c()) * share;
            double fr = zr * ar - zi * ai;
            double fi = zr * ai + zi * ar;
            for (int j = 0; j < n; j++) {
                br[j] += r.gather()[j] * fr;
                bi[j] += r.gather()[j] * fi;
            }
        }
        return directResponse(br, bi, w, b.rowGround(), ar, ai);
    }

    /** η_m = (nr + i·ni)/(ω_m² − ω² + 2iζ_mω_mω). */
    private void divideByModalDenominator(int m, double w, double nr, double ni, double[] er, double[] ei) {
        double dr = omegaSq[m] - w * w;
        double di = 2 * zeta[m] * omegaN[m] * w;
        double d = dr * dr + di * di;
        er[m] = (nr * dr + ni * di) / d;
        ei[m] = (ni * dr - nr * di) / d;
    }

    /**
     * q = s·Y + Σ φ_m·η_m; element force k_r·Σ (g_r·φ_m)·η_m·(1 + i·2ζ_m·ω/ω_m); each formed
     * only when read.
     */
    private Response modalResponse(double[] er, double[] ei, double w, double[] shift, double yr, double yi) {
        double[] rigidRe = null;
        double[] rigidIm = null;
        if (shift != null) {
            rigidRe = new double[n];
            rigidIm = new double[n];
            for (int j = 0; j < n; j++) {
                rigidRe[j] = shift[j] * yr;
                rigidIm[j] = shift[j] * yi;
            }
        }
        return new Response(new ModalParts(er, ei, w, rigidRe, rigidIm));
    }

    /**
     * The modal amplitudes of one response, from which its quantities are formed on demand, and
     * the rigid motion the ground carries the model along by (null when the ground stands still).
     */
    private final class ModalParts implements Response.Parts {

        private final double[] er;
        private final double[] ei;
        private final double w;
        private final double[] rigidRe;
        private final double[] rigidIm;
        private double[] gr;
        private double[] gi;

        ModalParts(double[] er, double[] ei, double w, double[] rigidRe, double[] rigidIm) {
            this.er = er;
            this.ei = ei;
            this.w = w;
            this.rigidRe = rigidRe;
            this.rigidIm = rigidIm;
        }

        private MatrixModel owner() {
            return MatrixModel.this;
        }

        /** g·q = g·(rigid motion) + Σ (g·φ_m)·η_m, the coefficients worked out once per set of rows. */
        @Override
        public boolean along(double[][] gathers, double[] re, double[] im) {
            double[][] coefficients = probeModes.get(gathers, MatrixModel.this::modalCoefficients);
            for (int j = 0; j < gathers.length; j++) {
                double r = 0;
                double i = 0;
                if (rigidRe != null) {
                    double[] g = gathers[j];
                    for (int k = 0; k < n; k++) {
                        r += g[k] * rigidRe[k];
                        i += g[k] * rigidIm[k];
                    }
                }
                double[] c = coefficients[j];
                for (int m = 0; m < n; m++) {
                    r += c[m] * er[m];
                    i += c[m] * ei[m];
                }
                re[j] = r;
                im[j] = i;
            }
            return true;
        }

        /** Loads at one frequency on one model: their modal amplitudes (and rigid motions) add. */
        @Override
        public Response.Parts plus(Response.Parts other) {
            if (!(other instanceof ModalParts o) || o.owner() != owner() || o.w != w) {
                return null;
            }
            double[] sr = new double[n];
            double[] si = new double[n];
            for (int m = 0; m < n; m++) {
                sr[m] = er[m] + o.er[m];
                si[m] = ei[m] + o.ei[m];
            }
            if (rigidRe == null && o.rigidRe == null) {
                return new ModalParts(sr, si, w, null, null);
            }
            double[] rr = new double[n];
            double[] ri = new double[n];
            for (int j = 0; j < n; j++) {
                rr[j] = (rigidRe == null ? 0 : rigidRe[j]) + (o.rigidRe == null ? 0 : o.rigidRe[j]);
                ri[j] = (rigidIm == null ? 0 : rigidIm[j]) + (o.rigidIm == null ? 0 : o.rigidIm[j]);
            }
            return new ModalParts(sr, si, w, rr, ri);
        }

        @Override
        public Phasors displacements() {
            Phasors q = new Phasors(n);
            if (rigidRe != null) {
                System.arraycopy(rigidRe, 0, q.re, 0, n);
                System.arraycopy(rigidIm, 0, q.im, 0, n);
            }
            for (int m = 0; m < n; m++) {
                double[] v = phi[m];
                for (int j = 0; j < n; j++) {
                    q.re[j] += v[j] * er[m];
                    q.im[j] += v[j] * ei[m];
                }
            }
            return q;
        }

        @Override
        public Phasors elementForces() {
            modalForces();
            Phasors f = new Phasors(rows.length);
            for (int r = 0; r < rows.length; r++) {
                rowForce(r, f.re, f.im, r);
            }
            return f;
        }

        @Override
        public boolean forces(int[] wanted, double[] re, double[] im) {
            modalForces();
            for (int j = 0; j < wanted.length; j++) {
                rowForce(wanted[j], re, im, j);
            }
            return true;
        }

        /** Row r's force k_r·Σ (g_r·φ_m)·η_m·(1 + i·2ζ_m·ω/ω_m), into slot {@code at} (after {@link #modalForces}). */
        private void rowForce(int r, double[] re, double[] im, int at) {
            modalSum(rowModal[r], rows[r].k(), re, im, at);
        }

        /** factor·Σ a_m·(elastic-plus-damping amplitude of mode m), into slot {@code at}. */
        private void modalSum(double[] a, double factor, double[] re, double[] im, int at) {
            double sr = 0;
            double si = 0;
            for (int m = 0; m < n; m++) {
                sr += a[m] * gr[m];
                si += a[m] * gi[m];
            }
            re[at] = factor * sr;
            im[at] = factor * si;
        }

        /**
         * The ground force straight from the modes (the rows' modal coefficients are summed per
         * component once per model), so judging isolation does not form every mount's force.
         */
        @Override
        public Phasors groundForces() {
            modalForces();
            Phasors g = new Phasors(groundComponents);
            for (int c = 0; c < groundComponents; c++) {
                modalSum(groundModal[c], 1, g.re, g.im, c); // × 1 is exact: the same sums as before
            }
            return g;
        }

        /** Each mode's elastic-plus-damping amplitude η_m·(1 + i·2ζ_m·ω/ω_m), worked out once. */
        private void modalForces() {
            if (gr != null) {
                return;
            }
            gr = new double[n];
            gi = new double[n];
            for (int m = 0; m < n; m++) {
                double t = omegaN[m] > 0 ? 2 * zeta[m] * w / omegaN[m] : 0;
                gr[m] = er[m] - t * ei[m];
                gi[m] = ei[m] + t * er[m];
            }
        }
    }

    /** Solves (K − ω²M + i(H + ωC))·q = b; element force (k(1 + iη) + iωc)·(g·q − ground share·Y). */
    private Response directResponse(double[] br, double[] bi, double w, double[] rowGround, double yr, double yi) {
        double[][] ar = new double[n][n];
        double[][] ai = new double[n][n];
        double w2 = w * w;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                ar[i][j] = stiffness[i][j] - w2 * mass[i][j];
                ai[i][j] = hysteretic[i][j] + w * viscous[i][j];
            }
        }
        ComplexSolve.solveInPlace(ar, ai, br, bi);
        Phasors q = new Phasors(n);
        System.arraycopy(br, 0, q.re, 0, n);
        System.arraycopy(bi, 0, q.im, 0, n);
        Phasors f = new Phasors(rows.length);
        Phasors g = new Phasors(groundComponents);
        for (int r = 0; r < rows.length; r++) {
            Row row = rows[r];
            double dr = dot(row.gather(), br);
            double di = dot(row.gather(), bi);
            if (rowGround != null) {
                dr -= rowGround[r] * yr;
                di -= rowGround[r] * yi;
            }
            double zr = row.k();
            double zi = row.k() * row.eta() + w * row.c();
            f.re[r] = zr * dr - zi * di;
            f.im[r] = zr * di + zi * dr;
            if (row.groundComponent() >= 0) {
                g.re[row.groundComponent()] += f.re[r];
                g.im[row.groundComponent()] += f.im[r];
            }
        }
        return new Response(q, f, g);
    }

    /** Kinetic-energy shares f_j = |φ_j·(Mφ)_j|, renormalised, those ≥ 5 %, largest first. */
    private List<MotionShare> shares(double[] v, String[] names, String[] readings) {
        double[] mv = multiply(mass, v);
        double[] f = new double[n];
        double total = 0;
        for (int j = 0; j < n; j++) {
            f[j] = Math.abs(v[j] * mv[j]);
            total += f[j];
        }
        List<MotionShare> out = new ArrayList<>();
        for (int j = 0; j < n; j++) {
            double share = total > 0 ? f[j] / total : 0;
            if (share >= SHARE_SHOWN) {
                out.add(new MotionShare(names[j], readings[j], share));
            }
        }
        // Stable sort: equal shares keep degree-of-freedom order.
        out.sort(Comparator.comparingDouble(MotionShare::fraction).reversed());
        return out;
    }

    /** Solves K·u = b (static); non-finite when K is singular (a free part). */
    double[] staticSolve(double[] b) {
        double[][] ar = new double[n][n];
        double[][] ai = new double[n][n];
        for (int i = 0; i < n; i++) {
            ar[i] = stiffness[i].clone();
        }
        double[] br = b.clone();
        double[] bi = new double[n];
        ComplexSolve.solveInPlace(ar, ai, br, bi);
        return br;
    }

    static double dot(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += a[i] * b[i];
        }
        return s;
    }

    static double[] multiply(double[][] a, double[] v) {
        double[] out = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            out[i] = dot(a[i], v);
        }
        return out;
    }

    private static double quadratic(double[][] a, double[] v) {
        return dot(v, multiply(a, v));
    }

    private static void addOuter(double[][] a, double[] g, double k) {
        if (k == 0) {
            return;
        }
        for (int i = 0; i < g.length; i++) {
            if (g[i] == 0) {
                continue;
            }
            for (int j = 0; j < g.length; j++) {
                a[i][j] += k * g[i] * g[j];
            }
        }
    }
}
