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
        if (!factor(a)) {
            return false;
        }
        substitute(a, b, x);
        return true;
    }

    /** Inverse of a symmetric positive definite matrix (full storage), or null when singular. */
    static double[][] inverseSymmetric(double[][] a) {
        int n = a.length;
        double[][] factor = new double[n][];
        for (int i = 0; i < n; i++) {
            factor[i] = a[i].clone();
        }
        if (!factor(factor)) {
            return null;
        }
        double[][] inverse = new double[n][n];
        double[] e = new double[n];
        double[] column = new double[n];
        for (int c = 0; c < n; c++) {
            java.util.Arrays.fill(e, 0);
            e[c] = 1;
            substitute(factor, e, column);
            for (int r = 0; r < n; r++) {
                inverse[r][c] = column[r];
            }
        }
        return inverse;
    }

    /** Replaces the upper triangle of A by R with A = R^T R; false when A is not positive definite. */
    private static boolean factor(double[][] a) {
        int n = a.length;
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
        return true;
    }

    /** Solves R^T R x = b with R from {@link #factor}. */
    private static void substitute(double[][] r, double[] b, double[] x) {
        int n = b.length;
        for (int i = 0; i < n; i++) {
            double s = b[i];
            for (int k = 0; k < i; k++) {
                s -= r[k][i] * x[k];
            }
            x[i] = s / r[i][i];
        }
        for (int i = n - 1; i >= 0; i--) {
            double s = x[i];
            for (int k = i + 1; k < n; k++) {
                s -= r[i][k] * x[k];
            }
            x[i] = s / r[i][i];
        }
    }
}
