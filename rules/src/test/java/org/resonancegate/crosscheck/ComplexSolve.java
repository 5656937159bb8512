package org.resonancegate.crosscheck;

/**
 * Gaussian elimination with partial pivoting on a complex augmented matrix [A | b], written for
 * the cross-checks so that the hysteretic responses do not depend on any engine code (textbook
 * algorithm, e.g. Golub &amp; Van Loan, Matrix Computations, §3.4).
 */
final class ComplexSolve {

    private ComplexSolve() {
    }

    /** Solves A·x = b for the n×(n+1) augmented matrix given as real and imaginary parts; returns {Re x, Im x}. */
    static double[][] solve(double[][] re, double[][] im) {
        int n = re.length;
        for (int col = 0; col < n; col++) {
            int pivot = col;
            double best = -1;
            for (int r = col; r < n; r++) {
                double mag = Math.hypot(re[r][col], im[r][col]);
                if (mag > best) {
                    best = mag;
                    pivot = r;
                }
            }
            if (best == 0) {
                throw new IllegalStateException("singular complex system");
            }
            double[] t = re[col];
            re[col] = re[pivot];
            re[pivot] = t;
            t = im[col];
            im[col] = im[pivot];
            im[pivot] = t;
            double pRe = re[col][col];
            double pIm = im[col][col];
            double pAbs2 = pRe * pRe + pIm * pIm;
            for (int r = col + 1; r < n; r++) {
                // factor = a[r][col] / a[col][col]
                double fRe = (re[r][col] * pRe + im[r][col] * pIm) / pAbs2;
                double fIm = (im[r][col] * pRe - re[r][col] * pIm) / pAbs2;
                for (int c = col; c <= n; c++) {
                    double aRe = re[col][c];
                    double aIm = im[col][c];
                    re[r][c] -= fRe * aRe - fIm * aIm;
                    im[r][c] -= fRe * aIm + fIm * aRe;
                }
            }
        }
        double[] xRe = new double[n];
        double[] xIm = new double[n];
        for (int r = n - 1; r >= 0; r--) {
            double sRe = re[r][n];
            double sIm = im[r][n];
            for (int c = r + 1; c < n; c++) {
                sRe -= re[r][c] * xRe[c] - im[r][c] * xIm[c];
                sIm -= re[r][c] * xIm[c] + im[r][c] * xRe[c];
            }
            double dRe = re[r][r];
            double dIm = im[r][r];
            double d2 = dRe * dRe + dIm * dIm;
            xRe[r] = (sRe * dRe + sIm * dIm) / d2;
            xIm[r] = (sIm * dRe - sRe * dIm) / d2;
        }
        return new double[][] {xRe, xIm};
    }
}
