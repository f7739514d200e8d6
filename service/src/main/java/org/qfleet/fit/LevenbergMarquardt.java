package org.qfleet.fit;

/**
 * A compact Levenberg-Marquardt solver for problems with a handful of parameters (Marquardt's
 * scaled damping, as in Numerical Recipes ch. 15.5). A trial point is evaluated with its normal
 * equations in one pass, so an accepted step costs a single pass over the data. The iteration stops
 * when an evaluated step lowered the cost by less than 1e-4 of the residual variance (the
 * parameters moved by about a hundredth of their own standard deviation), or when the next step is
 * predicted to lower it by less than 1e-2 of it (a move of about a tenth of a standard deviation):
 * that last step is then taken without another pass, since so close to the minimum the
 * Gauss-Newton model is exact to a small fraction of the step itself. A step of up to ten standard
 * deviations is first tried with the cost and J^T J alone (cheaper than a full pass where the
 * problem can leave out the residual's projections): when the cost falls by what the quadratic
 * model predicted closely enough that the point reached lies within 1e-2 of the residual variance
 * of the minimum (a tenth of a standard deviation at most), the iteration stops there, with J^T J
 * of that point (the ratio test of trust-region methods, Nocedal and Wright, Numerical
 * Optimization, 2nd ed., ch. 4, made strict); otherwise the full pass follows.
 */
final class LevenbergMarquardt {

    /**
     * Solution of a least-squares problem. {@code cost} and {@code jtj} (the full, symmetric matrix)
     * were evaluated at {@code evaluatedAt}, which is {@code p} or lies within about a tenth of a
     * standard deviation of it (the last step, taken without a pass); {@code jtr} at
     * {@code gradientAt}, which is {@code evaluatedAt} or, after a step confirmed by its cost, the
     * point it started from.
     */
    record Solution(double[] p, double cost, double[][] jtj, double[] evaluatedAt, double[] jtr, double[] gradientAt,
                    int iterations, boolean converged) {
    }

    private static final int MAX_ITERATIONS = 100;
    private static final double DROP_FRACTION = 1e-4;
    private static final double LAST_STEP_FRACTION = 1e-2;
    /** A solution that only starts a finer one stops at steps of about a third of a standard deviation. */
    private static final double ROUGH_FRACTION = 1e-1;
    private static final double MAX_LAMBDA = 1e12;
    /** Steps predicted to lower the cost by at most this many residual variances are tried with cost and J^T J alone. */
    private static final double CHECKED_STEP_FRACTION = 100;

    private LevenbergMarquardt() {
    }

    static Solution solve(LeastSquaresProblem problem, double[] start) {
        return solve(problem, start, DROP_FRACTION, LAST_STEP_FRACTION);
    }

    /** A looser solution, for the start of a finer one (a solve on more points). */
    static Solution solveRoughly(LeastSquaresProblem problem, double[] start) {
        return solve(problem, start, ROUGH_FRACTION, ROUGH_FRACTION);
    }

    private static Solution solve(LeastSquaresProblem problem, double[] start, double dropFraction, double lastStepFraction) {
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
            double variance = cost / dof;
            if (predicted <= lastStepFraction * variance) {
                // Close enough to the minimum for the model to be trusted: take the step unevaluated.
                Linear.mirrorUpper(jtj);
                return new Solution(trial, cost, jtj, p, jtr, p, iteration, true);
            }
            if (predicted <= CHECKED_STEP_FRACTION * variance) {
                double trialCost = problem.costAndCurvature(trial, trialJtj);
                if (modelHolds(cost - trialCost, modelDrop(predicted, jtj, lambda, step), lastStepFraction * variance)) {
                    Linear.mirrorUpper(trialJtj);
                    return new Solution(trial, trialCost, trialJtj, trial, jtr, p, iteration, true);
                }
                if (trialCost > cost) {
                    lambda *= 10;
                    converged = lambda > MAX_LAMBDA;
                    continue;
                }
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
                converged = drop <= dropFraction * cost / dof;
            } else {
                lambda *= 10;
                // No downhill step left at any damping: the current point is the minimum to working precision.
                converged = lambda > MAX_LAMBDA;
            }
        }
        Linear.mirrorUpper(jtj);
        return new Solution(p, cost, jtj, p, jtr, p, iteration, converged);
    }

    /**
     * The drop the quadratic model predicts for a step: 2 step.J^T r - step.J^T J.step, which with
     * (J^T J + damping) step = J^T r is step.J^T r + step.damping.step.
     */
    private static double modelDrop(double predicted, double[][] jtj, double lambda, double[] step) {
        double drop = predicted;
        for (int i = 0; i < step.length; i++) {
            drop += (lambda * jtj[i][i] + 1e-300) * step[i] * step[i];
        }
        return drop;
    }

    /**
     * Whether a step that reached the model's minimum left the true one within {@code tolerance} in
     * cost: a cubic term e, the gap between the actual and the predicted drop D, leaves the slope 3e
     * at the end of the step and so the point about 9 e^2 / 4 D above the minimum along it (the
     * other directions are taken to be as nearly quadratic as this one).
     */
    private static boolean modelHolds(double actualDrop, double modelDrop, double tolerance) {
        double gap = actualDrop - modelDrop;
        return modelDrop > 0 && 9 * gap * gap <= 4 * modelDrop * tolerance;
    }
}
