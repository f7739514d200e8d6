package org.qfleet.fit;

/**
 * A compact Levenberg-Marquardt solver for problems with a handful of parameters (Marquardt's
 * scaled damping, as in Numerical Recipes ch. 15.5). Every trial point is evaluated with its normal
 * equations in one pass, so an accepted step costs a single pass over the data. The iteration stops
 * when the quadratic model's own minimum, the undamped Gauss-Newton step, is predicted to lower the
 * cost by less than 1e-2 of the residual variance (a move of about a tenth of a standard
 * deviation): that last step is then taken without another pass, since so close to the minimum the
 * Gauss-Newton model is exact to a small fraction of the step itself. The test looks at the
 * undamped step on purpose: a damped step, or the drop of an accepted one, can shrink to nothing
 * along a poorly determined direction (a background against the delay) while the minimum still
 * lies standard deviations away.
 */
final class LevenbergMarquardt {

    /**
     * Solution of a least-squares problem. {@code cost} and {@code jtj} (the full, symmetric matrix)
     * were evaluated at {@code evaluatedAt}, which is {@code p} or lies within about a tenth of a
     * standard deviation of it (the last step, taken without a pass).
     */
    record Solution(double[] p, double cost, double[][] jtj, double[] evaluatedAt, int iterations, boolean converged) {
    }

    private static final int MAX_ITERATIONS = 100;
    private static final double LAST_STEP_FRACTION = 1e-2;
    /** A solution that only starts a finer one stops at steps of about a third of a standard deviation. */
    private static final double ROUGH_FRACTION = 1e-1;
    private static final double MAX_LAMBDA = 1e12;

    private LevenbergMarquardt() {
    }

    static Solution solve(LeastSquaresProblem problem, double[] start) {
        return solve(problem, start, LAST_STEP_FRACTION);
    }

    /** A looser solution, for the start of a finer one (a solve on more points). */
    static Solution solveRoughly(LeastSquaresProblem problem, double[] start) {
        return solve(problem, start, ROUGH_FRACTION);
    }

    private static Solution solve(LeastSquaresProblem problem, double[] start, double lastStepFraction) {
        int n = problem.parameterCount();
        int dof = Math.max(1, problem.residualCount() - n);
        double[] p = start.clone();
        double[][] jtj = new double[n][n];
        double[] jtr = new double[n];
        double[][] trialJtj = new double[n][n];
        double[] trialJtr = new double[n];
        double[][] damped = new double[n][n];
        double[] step = new double[n];
        double[] gaussNewton = new double[n];
        double[] trial = new double[n];
        double cost = problem.normalEquations(p, jtj, jtr);
        double lambda = 1e-3;
        int iteration = 0;
        boolean converged = false;
        while (iteration < MAX_ITERATIONS && !converged) {
            iteration++;
            if (!solveDamped(jtj, jtr, lambda, damped, step)) {
                lambda *= 10;
                if (lambda > MAX_LAMBDA) {
                    break;
                }
                continue;
            }
            double tolerance = lastStepFraction * cost / dof;
            // Near the end, the quadratic model's own minimum, undamped: when it lies within the
            // tolerance, so does the true one. (Damping only shortens a step, so a damped step that
            // promises more leaves nothing to check; one that promises less may merely have been
            // shrunk to nothing along a poorly determined direction.)
            if (drop(step, jtr) <= tolerance && solveDamped(jtj, jtr, 0, damped, gaussNewton)
                    && drop(gaussNewton, jtr) <= tolerance) {
                for (int i = 0; i < n; i++) {
                    trial[i] = p[i] + gaussNewton[i];
                }
                Linear.mirrorUpper(jtj);
                return new Solution(trial, cost, jtj, p, iteration, true);
            }
            for (int i = 0; i < n; i++) {
                trial[i] = p[i] + step[i];
            }
            double trialCost = problem.normalEquations(trial, trialJtj, trialJtr);
            if (trialCost <= cost) {
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
            } else {
                lambda *= 10;
                // No downhill step left at any damping: the current point is the minimum to working precision.
                converged = lambda > MAX_LAMBDA;
            }
        }
        Linear.mirrorUpper(jtj);
        return new Solution(p, cost, jtj, p, iteration, converged);
    }

    /** Solves (J^T J + lambda diag(J^T J)) step = J^T r from the upper triangle of J^T J; false when singular. */
    private static boolean solveDamped(double[][] jtj, double[] jtr, double lambda, double[][] work, double[] step) {
        int n = jtr.length;
        for (int i = 0; i < n; i++) {
            System.arraycopy(jtj[i], i, work[i], i, n - i);
            work[i][i] = jtj[i][i] * (1 + lambda) + 1e-300;
        }
        return Linear.solveSymmetric(work, jtr, step);
    }

    /** The drop in cost the quadratic model predicts for a step, step . J^T r (exact for the undamped step). */
    private static double drop(double[] step, double[] jtr) {
        double d = 0;
        for (int i = 0; i < step.length; i++) {
            d += step[i] * jtr[i];
        }
        return d;
    }
}
