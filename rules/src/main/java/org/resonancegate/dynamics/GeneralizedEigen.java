package org.resonancegate.dynamics;

import java.util.Arrays;
import java.util.Comparator;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.NonPositiveDefiniteMatrixException;
import org.apache.commons.math3.linear.NonSymmetricMatrixException;
import org.apache.commons.math3.linear.RealMatrix;

/**
 * The generalised symmetric eigenproblem K·φ = λ·M·φ with M positive definite: M = L·Lᵀ
 * (Cholesky), the standard symmetric problem (L⁻¹·K·L⁻ᵀ)·v = λ·v, then φ = L⁻ᵀ·v. The vectors
 * come out mass-normalised (φᵀMφ = 1), the values ascending; a value that is negative only by
 * round-off (a free body's zero) is clamped to 0.
 */
final class GeneralizedEigen {

    /** λ below this fraction of the largest counts as zero (a free motion). */
    static final double ZERO = 1e-10;

    /** Eigenvalues λ_r = ω_r², ascending, and vectors {@code vectors[r][j]}, mass-normalised. */
    record Solution(double[] values, double[][] vectors) {
    }

    private GeneralizedEigen() {
    }

    static Solution solve(double[][] mass, double[][] stiffness) {
        int n = mass.length;
        RealMatrix l;
        try {
            l = new CholeskyDecomposition(new Array2DRowRealMatrix(mass, true), 1e-12, 0).getL();
        } catch (NonPositiveDefiniteMatrixException | NonSymmetricMatrixException e) {
            throw new IllegalArgumentException("the mass matrix is not positive definite (check masses, "
                    + "inertias and products of inertia)");
        }
        double[][] lo = l.getData();
        // A = L⁻¹ K L⁻ᵀ: first Y = L⁻¹ K (forward substitution on columns), then A = L⁻¹ Yᵀ.
        double[][] y = forward(lo, stiffness);
        double[][] a = forward(lo, transpose(y));
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                double s = (a[i][j] + a[j][i]) / 2;
                a[i][j] = s;
                a[j][i] = s;
            }
        }
        EigenDecomposition eig = new EigenDecomposition(new Array2DRowRealMatrix(a, false));
        double[] values = eig.getRealEigenvalues();
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        Arrays.sort(order, Comparator.comparingDouble(i -> values[i]));
        double largest = 0;
        for (double v : values) {
            largest = Math.max(largest, Math.abs(v));
        }
        double[] sortedValues = new double[n];
        double[][] vectors = new double[n][];
        for (int r = 0; r < n; r++) {
            double lambda = values[order[r]];
            if (lambda < ZERO * largest) {
                if (lambda < -ZERO * largest) {
                    throw new IllegalArgumentException("the stiffness matrix is not positive semi-definite "
                            + "(eigenvalue " + lambda + "); check the stiffnesses");
                }
                lambda = 0;
            }
            sortedValues[r] = lambda;
            double[] v = eig.getEigenvector(order[r]).toArray();
            double[] phi = backward(lo, v);
            // A fixed sign (largest component positive) keeps reports deterministic.
            int big = 0;
            for (int j = 1; j < n; j++) {
                if (Math.abs(phi[j]) > Math.abs(phi[big]) * (1 + 1e-12)) {
                    big = j;
                }
            }
            if (phi[big] < 0) {
                for (int j = 0; j < n; j++) {
                    phi[j] = -phi[j];
                }
            }
            vectors[r] = phi;
        }
        return new Solution(sortedValues, vectors);
    }

    /** L⁻¹·B for lower-triangular L, column by column. */
    private static double[][] forward(double[][] lo, double[][] b) {
        int n = lo.length;
        int m = b[0].length;
        double[][] x = new double[n][m];
        for (int c = 0; c < m; c++) {
            for (int i = 0; i < n; i++) {
                double s = b[i][c];
                for (int k = 0; k < i; k++) {
                    s -= lo[i][k] * x[k][c];
                }
                x[i][c] = s / lo[i][i];
            }
        }
        return x;
    }

    /** L⁻ᵀ·v: solves Lᵀ·x = v. */
    private static double[] backward(double[][] lo, double[] v) {
        int n = lo.length;
        double[] x = new double[n];
        for (int i = n - 1; i >= 0; i--) {
            double s = v[i];
            for (int k = i + 1; k < n; k++) {
                s -= lo[k][i] * x[k];
            }
            x[i] = s / lo[i][i];
        }
        return x;
    }

    private static double[][] transpose(double[][] a) {
        double[][] t = new double[a[0].length][a.length];
        for (int i = 0; i < a.length; i++) {
            for (int j = 0; j < a[0].length; j++) {
                t[j][i] = a[i][j];
            }
        }
        return t;
    }
}
