package org.qfleet.fit;

/** The parameter covariance sigma^2 (J^T J)^-1 of a converged least-squares fit. */
final class Covariance {

    private Covariance() {
    }

    /**
     * @return the covariance, or null when J^T J is singular even after a relative regularization of
     *         1e-10 on its diagonal (which leaves well-determined parameters untouched and gives the
     *         nearly free ones the huge variance they deserve)
     */
    static double[][] of(double[][] jtj, double sigma2) {
        double[][] inverse = Linear.inverseSymmetric(jtj);
        if (inverse == null) {
            double[][] regularized = new double[jtj.length][];
            for (int i = 0; i < jtj.length; i++) {
                regularized[i] = jtj[i].clone();
                regularized[i][i] *= 1 + 1e-10;
            }
            inverse = Linear.inverseSymmetric(regularized);
        }
        if (inverse == null) {
            return null;
        }
        for (double[] row : inverse) {
            for (int j = 0; j < row.length; j++) {
                row[j] *= sigma2;
            }
        }
        return inverse;
    }
}
