package org.resonancegate.hardening;

import java.util.Arrays;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.CholeskyDecomposition_F64;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;

/**
 * Natural frequencies of a rigid body on mounts computed independently of the engine, with EJML:
 * M = diag(m, m, m) ⊕ I_G (off-diagonal terms −P), K = Σ T_iᵀ·diag(kx, ky, kz)·T_i with
 * T_i = [I₃ | −[r_i]×] and r_i the mount's offset from the centre of gravity (Harris' Shock and
 * Vibration Handbook, 5th ed., ch. 3, as in check-values.md §6), solved as the symmetric problem
 * L⁻¹·K·L⁻ᵀ with M = L·Lᵀ.
 */
final class EdgeCaseModes {

    private EdgeCaseModes() {
    }

    static double[] frequenciesHz(SpecGenerator.RigidBody b) {
        DMatrixRMaj m = new DMatrixRMaj(6, 6);
        for (int i = 0; i < 3; i++) {
            m.set(i, i, b.mass());
            m.set(3 + i, 3 + i, b.inertia()[i]);
        }
        double[] p = b.products(); // xy, xz, yz
        m.set(3, 4, -p[0]);
        m.set(4, 3, -p[0]);
        m.set(3, 5, -p[1]);
        m.set(5, 3, -p[1]);
        m.set(4, 5, -p[2]);
        m.set(5, 4, -p[2]);
        DMatrixRMaj k = new DMatrixRMaj(6, 6);
        for (int i = 0; i < b.mountPositions().size(); i++) {
            double[] pos = b.mountPositions().get(i);
            double[] r = {pos[0] - b.cg()[0], pos[1] - b.cg()[1], pos[2] - b.cg()[2]};
            DMatrixRMaj t = new DMatrixRMaj(new double[][] {
                    {1, 0, 0, 0, r[2], -r[1]},
                    {0, 1, 0, -r[2], 0, r[0]},
                    {0, 0, 1, r[1], -r[0], 0}});
            double[] s = b.mountStiffness().get(i);
            DMatrixRMaj d = CommonOps_DDRM.diag(s[0], s[1], s[2]);
            DMatrixRMaj dt = new DMatrixRMaj(3, 6);
            CommonOps_DDRM.mult(d, t, dt);
            CommonOps_DDRM.multAddTransA(t, dt, k);
        }
        CholeskyDecomposition_F64<DMatrixRMaj> chol = DecompositionFactory_DDRM.chol(6, true);
        if (!chol.decompose(m.copy())) {
            throw new IllegalArgumentException("mass matrix not positive definite");
        }
        DMatrixRMaj l = chol.getT(null);
        DMatrixRMaj li = new DMatrixRMaj(6, 6);
        CommonOps_DDRM.invert(l, li);
        DMatrixRMaj tmp = new DMatrixRMaj(6, 6);
        DMatrixRMaj a = new DMatrixRMaj(6, 6);
        CommonOps_DDRM.mult(li, k, tmp);
        CommonOps_DDRM.multTransB(tmp, li, a);
        EigenDecomposition_F64<DMatrixRMaj> eig = DecompositionFactory_DDRM.eig(6, false, true);
        if (!eig.decompose(a)) {
            throw new IllegalStateException("eigen solve failed");
        }
        double[] f = new double[6];
        for (int i = 0; i < 6; i++) {
            f[i] = Math.sqrt(Math.max(0, eig.getEigenvalue(i).getReal())) / (2 * Math.PI);
        }
        Arrays.sort(f);
        return f;
    }
}
