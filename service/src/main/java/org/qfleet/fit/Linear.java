package org.qfleet.fit;

/** Dense linear algebra for the small symmetric systems of the fits (n below about ten). */
final class Linear {

    private Linear() {
    }

    /** Copies the upper triangle of a square matrix into its lower triangle. */
    static void mirrorUpper(double[][] a) {
        for (int i = 0; i < a.length; i++) {
            for (int j = 0; j < i; j++) {
                a[i][j] = a[j][i];
            }
        }
    }

    /**
     * Solves A x = b for symmetric positive definite A given by its upper triangle (Cholesky).
     * Returns false when A is not positive definite. {@code a} is overwritten.
     */
    static boolean solveSymmetric(double[][] a, double[] b, double[] x) {
        int n = b.length;
        for (int j = 0; j < n; j++) {
            double d = a[j][j];
            for (int k = 0; k < j; k++) {
                d -= a[k][j] * a[k][j];
            }
            if (!(d > 0)) {
                return false;
            }
            double l = Math.sqrt(d);
            a[j][j] = l;
            for (int i = j + 1; i < n; i++) {
                double s = a[j][i];
                for (int k = 0; k < j; k++) {
                    s -= a[k][j] * a[k][i];
                }
                a[j][i] = s / l;
            }
        }
        for (int i = 0; i < n; i++) {
            double s = b[i];
            for (int k = 0; k < i; k++) {
                s -= a[k][i] * x[k];
            }
            x[i] = s / a[i][i];
        }
        for (int i = n - 1; i >= 0; i--) {
            double s = x[i];
            for (int k = i + 1; k < n; k++) {
                s -= a[i][k] * x[k];
            }
            x[i] = s / a[i][i];
        }
        return true;
    }

    /** Inverse of a symmetric positive definite matrix (full storage), or null when singular. */
    static double[][] inverseSymmetric(double[][] a) {
        int n = a.length;
        double[][] inverse = new double[n][n];
        double[] e = new double[n];
        double[] column = new double[n];
        for (int c = 0; c < n; c++) {
            double[][] work = new double[n][];
            for (int i = 0; i < n; i++) {
                work[i] = a[i].clone();
            }
            java.util.Arrays.fill(e, 0);
            e[c] = 1;
            if (!solveSymmetric(work, e, column)) {
                return null;
            }
            for (int r = 0; r < n; r++) {
                inverse[r][c] = column[r];
            }
        }
        return inverse;
    }
}
