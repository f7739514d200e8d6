package org.qfleet.fit;

/**
 * A compact Levenberg-Marquardt solver for problems with a handful of parameters (Marquardt's
 * scaled damping, Numerical Recipes ch. 15.5 style). Returns the solution and the undamped
 * J^T J there, from which the covariance follows.
 */
final class LevenbergMarquardt {

    /** Solution of a least-squares problem. {@code jtj} is the full (symmetric) matrix at {@code p}. */
    record Solution(double[] p, double cost, double[][] jtj, int iterations, boolean converged) {
    }

    private static final int MAX_ITERATIONS = 100;
    private static final double RELATIVE_TOLERANCE = 1e-12;

    private LevenbergMarquardt() {
    }

    static Solution solve(LeastSquaresProblem problem, double[] start) {
        int n = problem.parameterCount();
        double[] p = start.clone();
        double[][] jtj = new double[n][n];
        double[] jtr = new double[n];
        double[][] damped = new double[n][n];
        double[] step = new double[n];
        double[] trial = new double[n];
        double cost = problem.normalEquations(p, jtj, jtr);
        double lambda = 1e-3;
        boolean converged = false;
        int iteration = 0;
        while (iteration < MAX_ITERATIONS && !converged) {
            iteration++;
            boolean improved = false;
            while (!improved) {
                for (int i = 0; i < n; i++) {
                    for (int j = i; j < n; j++) {
                        damped[i][j] = jtj[i][j];
                    }
                    damped[i][i] = jtj[i][i] * (1 + lambda) + 1e-300;
                }
                if (!Linear.solveSymmetric(damped, jtr, step)) {
                    lambda *= 10;
                    if (lambda > 1e12) {
                        return finish(problem, p, cost, iteration, false);
                    }
                    continue;
                }
                for (int i = 0; i < n; i++) {
                    trial[i] = p[i] + step[i];
                }
                double trialCost = problem.cost(trial);
                if (trialCost <= cost) {
                    double drop = cost - trialCost;
                    System.arraycopy(trial, 0, p, 0, n);
                    cost = problem.normalEquations(p, jtj, jtr);
                    lambda = Math.max(lambda / 10, 1e-12);
                    improved = true;
                    converged = drop <= RELATIVE_TOLERANCE * cost || smallStep(step, p);
                } else {
                    lambda *= 10;
                    if (lambda > 1e12) {
                        return finish(problem, p, cost, iteration, true);
                    }
                }
            }
        }
        return finish(problem, p, cost, iteration, converged);
    }

    private static boolean smallStep(double[] step, double[] p) {
        for (int i = 0; i < step.length; i++) {
            if (Math.abs(step[i]) > 1e-10 * (Math.abs(p[i]) + 1e-10)) {
                return false;
            }
        }
        return true;
    }

    private static Solution finish(LeastSquaresProblem problem, double[] p, double cost, int iterations, boolean converged) {
        int n = p.length;
        double[][] jtj = new double[n][n];
        double[] jtr = new double[n];
        double finalCost = problem.normalEquations(p, jtj, jtr);
        Linear.mirrorUpper(jtj);
        return new Solution(p, finalCost, jtj, iterations, converged || finalCost <= cost);
    }
}
