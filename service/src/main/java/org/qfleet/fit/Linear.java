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

    /**
     * Inverse of a symmetric positive definite matrix (full storage), or null when singular: with
     * A = R^T R, A^-1 = T T^T for the triangular T = R^-1 (a third of the work of solving for each
     * column of the identity).
     */
    static double[][] inverseSymmetric(double[][] a) {
        int n = a.length;
        double[][] r = new double[n][];
        for (int i = 0; i < n; i++) {
            r[i] = a[i].clone();
        }
        if (!factor(r)) {
            return null;
        }
        double[][] t = new double[n][n];
        for (int j = 0; j < n; j++) {
            t[j][j] = 1 / r[j][j];
            for (int i = j - 1; i >= 0; i--) {
                double s = 0;
                for (int k = i + 1; k <= j; k++) {
                    s += r[i][k] * t[k][j];
                }
                t[i][j] = -s / r[i][i];
            }
        }
        double[][] inverse = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = i; j < n; j++) {
                double s = 0;
                for (int k = j; k < n; k++) {
                    s += t[i][k] * t[j][k];
                }
                inverse[i][j] = s;
                inverse[j][i] = s;
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
