package org.qfleet.fit;

/**
 * A compact Levenberg-Marquardt solver for problems with a handful of parameters (Marquardt's
 * scaled damping, as in Numerical Recipes ch. 15.5). Every trial point is evaluated with its normal
 * equations in one pass, so an accepted step costs a single pass over the data. The iteration stops
 * when a step lowers the cost by less than 1e-4 of the residual variance, that is when the
 * parameters move by about a hundredth of their own standard deviation; the next step of a
 * converging Gauss-Newton iteration is smaller still by orders of magnitude.
 */
final class LevenbergMarquardt {

    /** Solution of a least-squares problem. {@code jtj} is the full (symmetric) matrix at {@code p}. */
    record Solution(double[] p, double cost, double[][] jtj, int iterations, boolean converged) {
    }

    private static final int MAX_ITERATIONS = 100;
    private static final double VARIANCE_FRACTION = 1e-4;
    private static final double MAX_LAMBDA = 1e12;

    private LevenbergMarquardt() {
    }

    static Solution solve(LeastSquaresProblem problem, double[] start) {
        return solve(problem, start, VARIANCE_FRACTION);
    }

    /**
     * The same with another stopping fraction of the residual variance: a solution that only starts a
     * finer one may stop when its steps fall to about a tenth of a standard deviation (1e-2).
     */
    static Solution solve(LeastSquaresProblem problem, double[] start, double varianceFraction) {
        int n = problem.parameterCount();
        int dof = Math.max(1, problem.residualCount() - n);
        double[] p = start.clone();
        double[][] jtj = new double[n][n];
        double[] jtr = new double[n];
        double[][] trialJtj = new double[n][n];
        double[] trialJtr = new double[n];
        double[][] damped = new double[n][n];
        double[] step = new double[n];
        double[] trial = new double[n];
        double cost = problem.normalEquations(p, jtj, jtr);
        double lambda = 1e-3;
        int iteration = 0;
        boolean converged = false;
        while (iteration < MAX_ITERATIONS && !converged) {
            iteration++;
            for (int i = 0; i < n; i++) {
                System.arraycopy(jtj[i], i, damped[i], i, n - i);
                damped[i][i] = jtj[i][i] * (1 + lambda) + 1e-300;
            }
            if (!Linear.solveSymmetric(damped, jtr, step)) {
                lambda *= 10;
                if (lambda > MAX_LAMBDA) {
                    break;
                }
                continue;
            }
            double predicted = 0;
            for (int i = 0; i < n; i++) {
                trial[i] = p[i] + step[i];
                predicted += step[i] * jtr[i];
            }
            if (predicted <= varianceFraction * cost / dof) {
                // Even the full step would gain next to nothing (the Gauss-Newton model predicts
                // about twice the actual drop near a minimum): stop without evaluating it.
                converged = true;
                break;
            }
            double trialCost = problem.normalEquations(trial, trialJtj, trialJtr);
            if (trialCost <= cost) {
                double drop = cost - trialCost;
                double[] swapP = p;
                p = trial;
                trial = swapP;
                double[][] swapJtj = jtj;
                jtj = trialJtj;
                trialJtj = swapJtj;
                double[] swapJtr = jtr;
                jtr = trialJtr;
                trialJtr = swapJtr;
                cost = trialCost;
                lambda = Math.max(lambda / 10, 1e-12);
                converged = drop <= varianceFraction * cost / dof;
            } else {
                lambda *= 10;
                // No downhill step left at any damping: the current point is the minimum to working precision.
                converged = lambda > MAX_LAMBDA;
            }
        }
        Linear.mirrorUpper(jtj);
        return new Solution(p, cost, jtj, iteration, converged);
    }
}
