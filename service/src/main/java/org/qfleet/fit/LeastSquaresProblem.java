package org.qfleet.fit;

/**
 * A nonlinear least-squares problem small enough to be solved through its normal equations. The
 * problem accumulates J^T J and J^T r itself, so no Jacobian matrix is ever stored.
 */
interface LeastSquaresProblem {

    int parameterCount();

    /** Number of real residuals (twice the points for complex data). */
    int residualCount();

    /** Sum of squared residuals at {@code p}. */
    double cost(double[] p);

    /**
     * Fills the upper triangle of {@code jtj} (J^T J) and {@code jtr} (J^T r, with r = data - model)
     * at {@code p}, and returns the cost there.
     */
    double normalEquations(double[] p, double[][] jtj, double[] jtr);
}
