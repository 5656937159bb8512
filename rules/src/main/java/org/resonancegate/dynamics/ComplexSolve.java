package org.resonancegate.dynamics;

/**
 * Solves a small dense complex linear system A·x = b by Gaussian elimination with partial
 * pivoting, on primitive arrays (the element-damping response solves one per frequency).
 */
final class ComplexSolve {

    private ComplexSolve() {
    }

    /** Overwrites {@code ar}, {@code ai}; returns x in {@code br}, {@code bi}. */
    static void solveInPlace(double[][] ar, double[][] ai, double[] br, double[] bi) {
        int n = br.length;
        for (int c = 0; c < n; c++) {
            int p = c;
            double best = ar[c][c] * ar[c][c] + ai[c][c] * ai[c][c];
            for (int r = c + 1; r < n; r++) {
                double v = ar[r][c] * ar[r][c] + ai[r][c] * ai[r][c];
                if (v > best) {
                    best = v;
                    p = r;
                }
            }
            if (!(best > 0)) {
                // Singular: let the result be non-finite so the caller reports numerical trouble.
                for (int i = 0; i < n; i++) {
                    br[i] = Double.NaN;
                    bi[i] = Double.NaN;
                }
                return;
            }
            if (p != c) {
                double[] t = ar[p];
                ar[p] = ar[c];
                ar[c] = t;
                t = ai[p];
                ai[p] = ai[c];
                ai[c] = t;
                double s = br[p];
                br[p] = br[c];
                br[c] = s;
                s = bi[p];
                bi[p] = bi[c];
                bi[c] = s;
            }
            double pr = ar[c][c];
            double pi = ai[c][c];
            for (int r = c + 1; r < n; r++) {
                // factor = a[r][c] / a[c][c]
                double fr = (ar[r][c] * pr + ai[r][c] * pi) / best;
                double fi = (ai[r][c] * pr - ar[r][c] * pi) / best;
                if (fr == 0 && fi == 0) {
                    continue;
                }
                for (int k = c; k < n; k++) {
                    ar[r][k] -= fr * ar[c][k] - fi * ai[c][k];
                    ai[r][k] -= fr * ai[c][k] + fi * ar[c][k];
                }
                br[r] -= fr * br[c] - fi * bi[c];
                bi[r] -= fr * bi[c] + fi * br[c];
            }
        }
        for (int r = n - 1; r >= 0; r--) {
            double sr = br[r];
            double si = bi[r];
            for (int k = r + 1; k < n; k++) {
                sr -= ar[r][k] * br[k] - ai[r][k] * bi[k];
                si -= ar[r][k] * bi[k] + ai[r][k] * br[k];
            }
            double dr = ar[r][r];
            double di = ai[r][r];
            double d = dr * dr + di * di;
            br[r] = (sr * dr + si * di) / d;
            bi[r] = (si * dr - sr * di) / d;
        }
    }
}
