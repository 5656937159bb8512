package org.resonancegate.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.CholeskyDecomposition_F64;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;
import org.junit.jupiter.api.Test;

/**
 * The generalised symmetric eigen solve against an independent general-purpose library (EJML,
 * test scope): for seeded random symmetric positive definite pairs (M, K), EJML's Cholesky and
 * symmetric eigen decomposition give the same eigenvalues to 1e-9 relative, and our vectors satisfy
 * K·φ = λ·M·φ and φᵀ·M·φ = 1, checked with EJML's matrix products.
 */
class EigenCrossCheckTest {

    private static double[][] randomSpd(Random rnd, int n, double scale) {
        double[][] a = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                a[i][j] = rnd.nextGaussian();
            }
        }
        double[][] s = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double v = 0;
                for (int k = 0; k < n; k++) {
                    v += a[i][k] * a[j][k];
                }
                s[i][j] = scale * (v + (i == j ? 0.5 : 0));
            }
        }
        return s;
    }

    private static double[] ejmlEigenvalues(double[][] m, double[][] k) {
        int n = m.length;
        CholeskyDecomposition_F64<DMatrixRMaj> chol = DecompositionFactory_DDRM.chol(n, true);
        DMatrixRMaj mm = new DMatrixRMaj(m);
        assertTrue(chol.decompose(mm));
        DMatrixRMaj l = chol.getT(null);
        DMatrixRMaj li = new DMatrixRMaj(n, n);
        assertTrue(CommonOps_DDRM.invert(l, li));
        DMatrixRMaj tmp = new DMatrixRMaj(n, n);
        DMatrixRMaj a = new DMatrixRMaj(n, n);
        CommonOps_DDRM.mult(li, new DMatrixRMaj(k), tmp);
        CommonOps_DDRM.multTransB(tmp, li, a);
        DMatrixRMaj at = new DMatrixRMaj(n, n);
        CommonOps_DDRM.transpose(a, at);
        CommonOps_DDRM.add(0.5, a, 0.5, at, a);
        EigenDecomposition_F64<DMatrixRMaj> eig = DecompositionFactory_DDRM.eig(n, false, true);
        assertTrue(eig.decompose(a));
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = eig.getEigenvalue(i).getReal();
        }
        Arrays.sort(out);
        return out;
    }

    @Test
    void randomPairsAgreeWithEjml() {
        Random rnd = new Random(20261202L);
        for (int trial = 0; trial < 200; trial++) {
            int n = 1 + trial % 8;
            double[][] m = randomSpd(rnd, n, Math.pow(10, rnd.nextInt(4)));
            double[][] k = randomSpd(rnd, n, Math.pow(10, 3 + rnd.nextInt(5)));
            GeneralizedEigen.Solution ours = GeneralizedEigen.solve(m, k);
            double[] theirs = ejmlEigenvalues(m, k);
            for (int r = 0; r < n; r++) {
                assertEquals(theirs[r], ours.values()[r], 1e-9 * Math.abs(theirs[r]),
                        "trial " + trial + ", eigenvalue " + r);
                DMatrixRMaj phi = new DMatrixRMaj(n, 1, true, ours.vectors()[r]);
                DMatrixRMaj kp = new DMatrixRMaj(n, 1);
                DMatrixRMaj mp = new DMatrixRMaj(n, 1);
                CommonOps_DDRM.mult(new DMatrixRMaj(k), phi, kp);
                CommonOps_DDRM.mult(new DMatrixRMaj(m), phi, mp);
                double scale = CommonOps_DDRM.elementMaxAbs(kp);
                CommonOps_DDRM.add(kp, -ours.values()[r], mp, kp);
                assertTrue(CommonOps_DDRM.elementMaxAbs(kp) <= 1e-9 * scale, "residual, trial " + trial);
                assertEquals(1.0, CommonOps_DDRM.dot(phi, mp), 1e-10, "mass normalisation, trial " + trial);
            }
        }
    }
}
