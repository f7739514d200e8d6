package org.qfleet.fit;

import org.qfleet.sweep.Topology;

/**
 * Fits the resonance circle with delay and complex background to complex data by weighted least
 * squares (equal noise on every point), started from model-free estimates: f0 and the width from the
 * speed along the trace |dS/df|, which peaks at f0 with a half-power full width of f0 / QL whatever
 * the background; the delay from the phase slope once the resonance's own slope is accounted for.
 * The covariance sigma^2 (J^T J)^-1 gives the asymptotic uncertainties (Coakley et al., IEEE Trans.
 * MTT 51(3), 862, 2003).
 */
final class ComplexCircleEstimator {

    /** chi-square(2) at 0.999: a background is kept only when it lowers the cost by more than this many sigma^2. */
    private static final double BACKGROUND_SIGNIFICANCE = 13.8;

    /**
     * @param backgroundPolicy transmission fits try without a background first (leakage is normally
     *                         negligible and a free background makes the delay ill-determined);
     *                         notches and reflections always need one
     */
    CircleFit fit(double[] frequencyHz, double[] re, double[] im, Topology topology) throws FitException {
        int n = frequencyHz.length;
        double referenceHz = 0.5 * (frequencyHz[0] + frequencyHz[n - 1]);
        double scaleHz = 0.5 * (frequencyHz[n - 1] - frequencyHz[0]);
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = (frequencyHz[i] - referenceHz) / scaleHz;
        }
        double[] peak = StartingPoint.speedPeak(x, re, im);
        double x0 = peak[0];
        double g = peak[1];
        double t = StartingPoint.delay(x, re, im, x0, g);
        t = StartingPoint.refineDelay(x, re, im, x0, g, t, topology != Topology.TRANSMISSION);

        CircleFit best;
        if (topology == Topology.TRANSMISSION) {
            double[] a = StartingPoint.linearAmplitudes(x, re, im, x0, g, t, false);
            CircleProblem plain = new CircleProblem(x, re, im, false, false);
            LevenbergMarquardt.Solution s5 = LevenbergMarquardt.solve(plain, new double[] {a[2], a[3], x0, g, t});
            CircleProblem withBackground = new CircleProblem(x, re, im, true, false);
            double[] p5 = s5.p();
            LevenbergMarquardt.Solution s7 = LevenbergMarquardt.solve(withBackground,
                    new double[] {0, 0, p5[0], p5[1], p5[2], p5[3], p5[4]});
            double sigma2 = s7.cost() / Math.max(1, 2 * n - 7);
            boolean keepBackground = s5.cost() - s7.cost() > BACKGROUND_SIGNIFICANCE * sigma2;
            best = keepBackground ? toFit(s7, withBackground, n, referenceHz, scaleHz)
                    : toFit(s5, plain, n, referenceHz, scaleHz);
        } else {
            double[] a = StartingPoint.linearAmplitudes(x, re, im, x0, g, t, true);
            CircleProblem problem = new CircleProblem(x, re, im, true, true);
            LevenbergMarquardt.Solution s = LevenbergMarquardt.solve(problem,
                    new double[] {a[0], a[1], a[2], a[3], x0, g, t, 0});
            best = toFit(s, problem, n, referenceHz, scaleHz);
        }
        return best;
    }

    private static CircleFit toFit(LevenbergMarquardt.Solution s, CircleProblem problem, int n,
                                   double referenceHz, double scaleHz) throws FitException {
        int k = problem.parameterCount();
        double sigma2 = s.cost() / Math.max(1, 2 * n - k);
        double[][] inverse = Linear.inverseSymmetric(s.jtj());
        if (inverse == null) {
            throw new FitException("the resonance circle is not determined by the data (singular fit)");
        }
        for (double[] row : inverse) {
            for (int j = 0; j < k; j++) {
                row[j] *= sigma2;
            }
        }
        double[] p = s.p();
        int o = problem.background() ? 2 : 0;
        if (!(Math.abs(p[o + 3]) > 0) || !Double.isFinite(p[o + 3])) {
            throw new FitException("no resonance found: the fitted width is zero or not finite");
        }
        return new CircleFit(p, inverse, referenceHz, scaleHz, problem.background(), problem.tilt(), Math.sqrt(sigma2), n);
    }
}
