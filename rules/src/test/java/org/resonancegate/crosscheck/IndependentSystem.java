package org.resonancegate.crosscheck;

import java.util.Arrays;
import java.util.Comparator;
import java.util.stream.IntStream;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.CholeskyDecomposition_F64;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;

/**
 * A linear mounted system written for the cross-checks only, with no engine class in it: a mass
 * matrix, and elastic elements each described by one "row" r (the element's deformation is r·q)
 * and a stiffness k, so that K = Σ k·r·rᵀ. A lumped spring is one row (x_to − x_from); a
 * rigid-body mount is three rows, one per axis, taken from T_i = [I₃ | −[r_i]×] (Harris' Shock and
 * Vibration Handbook, 5th ed., ch. 3, eqs 3.31 ff.; check-values.md §6).
 *
 * <p>Modes come from the generalised symmetric eigenproblem K·φ = ω²·M·φ solved with EJML
 * (Cholesky M = L·Lᵀ, then the symmetric eigen decomposition of L⁻¹·K·L⁻ᵀ, φ = L⁻ᵀ·y, so that
 * φᵀ·M·φ = 1). Responses are textbook modal superposition (e.g. Thomson, Theory of Vibration
 * with Applications, ch. on multi-degree-of-freedom systems):
 * x = Σ_r φ_r·φ_rᵀ·F / (ω_r² − ω² + 2i·ζ_r·ω_r·ω), each mode's share of an element force multiplied
 * by (1 + 2i·ζ_r·ω/ω_r) (spec-format.md, "transmitted-force"); or, with hysteretic element damping,
 * the full complex solve (Σ k(1 + iη)·r·rᵀ − ω²·M)·x = F with our own complex Gaussian elimination.
 */
final class IndependentSystem {

    final int n;
    final double[][] mass;
    final double[][] stiffness;
    /** Element rows: deformation of row j is rows[j]·q. */
    final double[][] rows;
    final double[] rowK;
    final double[] rowEta;
    /** For each element row, the component of the ground force it feeds, or −1 when it is not tied to ground. */
    final int[] rowGround;
    final int groundDims;
    /** Elements as ranges of rows: start, count, name. */
    final int[] elementStart;
    final int[] elementCount;
    final String[] elementNames;
    /** Response points as ranges of point rows (u = pointRows[j]·q). */
    final double[][] pointRows;
    final int[] pointStart;
    final int[] pointCount;
    /** The element row whose deformation is the element's static deflection. */
    final int[] staticRow;
    /** Null where gravity does not apply (torsion). */
    final double[] gravityLoad;
    /** Model-level modal damping ratio, or NaN under element (hysteretic) damping. */
    final double modalRatio;

    final double[] omega;
    /** phi[r][dof], mass-normalised. */
    final double[][] phi;
    final double[] modeZeta;
    private final double[][] rowPhi;
    private final double[][] pointPhi;

    IndependentSystem(double[][] mass, double[][] rows, double[] rowK, double[] rowEta, int[] rowGround,
                      int groundDims, int[] elementStart, int[] elementCount, String[] elementNames,
                      double[][] pointRows, int[] pointStart, int[] pointCount, int[] staticRow,
                      double[] gravityLoad, double modalRatio) {
        this.n = mass.length;
        this.mass = mass;
        this.rows = rows;
        this.rowK = rowK;
        this.rowEta = rowEta;
        this.rowGround = rowGround;
        this.groundDims = groundDims;
        this.elementStart = elementStart;
        this.elementCount = elementCount;
        this.elementNames = elementNames;
        this.pointRows = pointRows;
        this.pointStart = pointStart;
        this.pointCount = pointCount;
        this.staticRow = staticRow;
        this.gravityLoad = gravityLoad;
        this.modalRatio = modalRatio;
        this.stiffness = new double[n][n];
        for (int j = 0; j < rows.length; j++) {
            for (int a = 0; a < n; a++) {
                for (int b = 0; b < n; b++) {
                    stiffness[a][b] += rowK[j] * rows[j][a] * rows[j][b];
                }
            }
        }
        // Generalised symmetric eigenproblem with EJML, independent of the engine's solver.
        DMatrixRMaj m = new DMatrixRMaj(mass);
        DMatrixRMaj k = new DMatrixRMaj(stiffness);
        CholeskyDecomposition_F64<DMatrixRMaj> chol = DecompositionFactory_DDRM.chol(n, true);
        if (!chol.decompose(m.copy())) {
            throw new IllegalStateException("mass matrix not positive definite");
        }
        DMatrixRMaj lower = chol.getT(null);
        DMatrixRMaj lowerInv = new DMatrixRMaj(n, n);
        CommonOps_DDRM.invert(lower, lowerInv);
        DMatrixRMaj tmp = new DMatrixRMaj(n, n);
        DMatrixRMaj a = new DMatrixRMaj(n, n);
        CommonOps_DDRM.mult(lowerInv, k, tmp);
        CommonOps_DDRM.multTransB(tmp, lowerInv, a);
        DMatrixRMaj sym = new DMatrixRMaj(n, n);
        CommonOps_DDRM.transpose(a, sym);
        CommonOps_DDRM.add(0.5, a, 0.5, sym, sym);
        EigenDecomposition_F64<DMatrixRMaj> eig = DecompositionFactory_DDRM.eig(n, true, true);
        if (!eig.decompose(sym.copy())) {
            throw new IllegalStateException("eigen decomposition failed");
        }
        double[] lambda = new double[n];
        double[][] vec = new double[n][];
        for (int i = 0; i < n; i++) {
            lambda[i] = eig.getEigenvalue(i).real;
            DMatrixRMaj y = eig.getEigenVector(i);
            DMatrixRMaj x = new DMatrixRMaj(n, 1);
            CommonOps_DDRM.multTransA(lowerInv, y, x);
            double norm = Math.sqrt(quadratic(mass, x.data, x.data));
            vec[i] = Arrays.stream(x.data).map(v -> v / norm).toArray();
        }
        Integer[] order = IntStream.range(0, n).boxed().sorted(Comparator.comparingDouble(i -> lambda[i]))
                .toArray(Integer[]::new);
        omega = new double[n];
        phi = new double[n][];
        modeZeta = new double[n];
        double largest = lambda[order[n - 1]];
        for (int r = 0; r < n; r++) {
            // a free line ("free": true) has a rigid-body mode: ω² zero up to round-off
            omega[r] = lambda[order[r]] < 1e-9 * largest ? 0 : Math.sqrt(lambda[order[r]]);
            phi[r] = vec[order[r]];
        }
        for (int r = 0; r < n; r++) {
            if (omega[r] == 0) {
                modeZeta[r] = Double.NaN; // a zero-frequency mode has no damping ratio
            } else if (Double.isNaN(modalRatio)) {
                // Diagonal modal estimate ζ_r = φᵀ·H·φ/(2ω_r²), H = Σ η·k·r·rᵀ (spec-format.md, Fine points).
                double h = 0;
                for (int j = 0; j < rows.length; j++) {
                    double d = dot(rows[j], phi[r]);
                    h += rowEta[j] * rowK[j] * d * d;
                }
                modeZeta[r] = h / (2 * omega[r] * omega[r]);
            } else {
                modeZeta[r] = modalRatio;
            }
        }
        rowPhi = new double[rows.length][n];
        for (int j = 0; j < rows.length; j++) {
            for (int r = 0; r < n; r++) {
                rowPhi[j][r] = dot(rows[j], phi[r]);
            }
        }
        pointPhi = new double[pointRows.length][n];
        for (int j = 0; j < pointRows.length; j++) {
            for (int r = 0; r < n; r++) {
                pointPhi[j][r] = dot(pointRows[j], phi[r]);
            }
        }
    }

    double frequencyHz(int r) {
        return omega[r] / (2 * Math.PI);
    }

    /** Static deflection of every element under gravity: K·x = gravity load, solved with EJML (none for torsion). */
    double[] staticDeflections() {
        DMatrixRMaj x = new DMatrixRMaj(n, 1);
        if (!CommonOps_DDRM.solve(new DMatrixRMaj(stiffness), new DMatrixRMaj(n, 1, true, gravityLoad), x)) {
            throw new IllegalStateException("singular stiffness");
        }
        double[] out = new double[elementNames.length];
        for (int e = 0; e < out.length; e++) {
            out[e] = dot(rows[staticRow[e]], x.data);
        }
        return out;
    }

    /** Phasors of every point row and every element row's force for the load F = scale·(fRe + i·fIm) at ω. */
    void respond(double w, double scale, double[] fRe, double[] fIm, double[] ptRe, double[] ptIm, double[] elRe,
                 double[] elIm) {
        if (Double.isNaN(modalRatio)) {
            respondHysteretic(w, scale, fRe, fIm, ptRe, ptIm, elRe, elIm);
            return;
        }
        Arrays.fill(ptRe, 0);
        Arrays.fill(ptIm, 0);
        Arrays.fill(elRe, 0);
        Arrays.fill(elIm, 0);
        for (int r = 0; r < n; r++) {
            double pRe = scale * dot(phi[r], fRe);
            double pIm = scale * dot(phi[r], fIm);
            // c_r = p / (ω_r² − ω² + 2iζω_rω)
            double dRe = omega[r] * omega[r] - w * w;
            double dIm = omega[r] == 0 ? 0 : 2 * modeZeta[r] * omega[r] * w;
            double den = dRe * dRe + dIm * dIm;
            double cRe = (pRe * dRe + pIm * dIm) / den;
            double cIm = (pIm * dRe - pRe * dIm) / den;
            for (int j = 0; j < pointRows.length; j++) {
                ptRe[j] += pointPhi[j][r] * cRe;
                ptIm[j] += pointPhi[j][r] * cIm;
            }
            // element share times (1 + i·2ζ_r·ω/ω_r)
            double g = omega[r] == 0 ? 0 : 2 * modeZeta[r] * w / omega[r]; // a rigid mode deforms no element
            double sRe = cRe - g * cIm;
            double sIm = cIm + g * cRe;
            for (int j = 0; j < rows.length; j++) {
                elRe[j] += rowK[j] * rowPhi[j][r] * sRe;
                elIm[j] += rowK[j] * rowPhi[j][r] * sIm;
            }
        }
    }

    private void respondHysteretic(double w, double scale, double[] fRe, double[] fIm, double[] ptRe, double[] ptIm,
                                   double[] elRe, double[] elIm) {
        double[] loadRe = new double[n];
        double[] loadIm = new double[n];
        for (int p = 0; p < n; p++) {
            loadRe[p] = scale * fRe[p];
            loadIm[p] = scale * fIm[p];
        }
        solveHysteretic(w, loadRe, loadIm, new double[rows.length], new double[rows.length], ptRe, ptIm, elRe, elIm);
    }

    /**
     * Base motion with hysteretic elements: the ground under element row j moves by g_j·Y (g_j the
     * motion's direction component along the row's axis, 0 for a row not tied to ground), so the
     * row deforms by r_j·x − g_j·Y and the load is Σ k_j(1 + iη_j)·g_j·Y·r_j; the response x is
     * absolute (spec-format.md, Excitations). Only for element damping: the format leaves open how a
     * modal damping ratio acts on a moving ground, so the cross-check does not guess.
     */
    void respondBase(double w, double yRe, double yIm, double[] ground, double[] ptRe, double[] ptIm, double[] elRe,
                     double[] elIm) {
        if (!Double.isNaN(modalRatio)) {
            throw new IllegalStateException("base motion is cross-checked with element damping only");
        }
        double[] loadRe = new double[n];
        double[] loadIm = new double[n];
        double[] offRe = new double[rows.length];
        double[] offIm = new double[rows.length];
        for (int j = 0; j < rows.length; j++) {
            offRe[j] = ground[j] * yRe;
            offIm[j] = ground[j] * yIm;
            double kRe = rowK[j] * offRe[j] - rowK[j] * rowEta[j] * offIm[j];
            double kIm = rowK[j] * offIm[j] + rowK[j] * rowEta[j] * offRe[j];
            for (int p = 0; p < n; p++) {
                loadRe[p] += rows[j][p] * kRe;
                loadIm[p] += rows[j][p] * kIm;
            }
        }
        solveHysteretic(w, loadRe, loadIm, offRe, offIm, ptRe, ptIm, elRe, elIm);
    }

    private void solveHysteretic(double w, double[] loadRe, double[] loadIm, double[] offRe, double[] offIm,
                                 double[] ptRe, double[] ptIm, double[] elRe, double[] elIm) {
        double[][] aRe = new double[n][n + 1];
        double[][] aIm = new double[n][n + 1];
        for (int p = 0; p < n; p++) {
            for (int q = 0; q < n; q++) {
                aRe[p][q] = stiffness[p][q] - w * w * mass[p][q];
            }
            aRe[p][n] = loadRe[p];
            aIm[p][n] = loadIm[p];
        }
        for (int j = 0; j < rows.length; j++) {
            for (int p = 0; p < n; p++) {
                for (int q = 0; q < n; q++) {
                    aIm[p][q] += rowEta[j] * rowK[j] * rows[j][p] * rows[j][q];
                }
            }
        }
        double[][] x = ComplexSolve.solve(aRe, aIm);
        for (int j = 0; j < pointRows.length; j++) {
            ptRe[j] = dot(pointRows[j], x[0]);
            ptIm[j] = dot(pointRows[j], x[1]);
        }
        for (int j = 0; j < rows.length; j++) {
            double dRe = dot(rows[j], x[0]) - offRe[j];
            double dIm = dot(rows[j], x[1]) - offIm[j];
            // k(1 + iη)·deformation
            elRe[j] = rowK[j] * (dRe - rowEta[j] * dIm);
            elIm[j] = rowK[j] * (dIm + rowEta[j] * dRe);
        }
    }

    static double dot(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += a[i] * b[i];
        }
        return s;
    }

    private static double quadratic(double[][] m, double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            for (int j = 0; j < b.length; j++) {
                s += a[i] * m[i][j] * b[j];
            }
        }
        return s;
    }
}
