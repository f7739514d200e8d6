package org.qfleet.fit;

import org.qfleet.sweep.Topology;

/**
 * Magnitude-only estimator: the Lorentzian-with-background fit of {@link LorentzianProblem},
 * started from the half-power reading. Without phase the circle's rotation is only known through
 * the line's asymmetry, and a reflection or notch is taken as under-coupled.
 */
final class LorentzianEstimator {

    private static final double BACKGROUND_SIGNIFICANCE = 13.8;

    TraceFit fit(double[] frequencyHz, double[] magnitude, Topology topology) throws FitException {
        int n = frequencyHz.length;
        double referenceHz = 0.5 * (frequencyHz[0] + frequencyHz[n - 1]);
        double scaleHz = 0.5 * (frequencyHz[n - 1] - frequencyHz[0]);
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = (frequencyHz[i] - referenceHz) / scaleHz;
        }
        ResonanceShape start = HalfPowerEstimator.read(frequencyHz, magnitude, topology);
        double x0 = (start.f0Hz() - referenceHz) / scaleHz;
        double g = start.f0Hz() / (2 * start.qLoaded()) / scaleHz;
        double b2 = start.background() * start.background();
        double level = topology == Topology.TRANSMISSION
                ? start.amplitude() * start.amplitude()
                : Math.pow(start.background() - start.amplitude(), 2) - b2;

        LeastSquaresProblem chosen;
        LevenbergMarquardt.Solution solution;
        if (topology == Topology.TRANSMISSION) {
            LorentzianProblem plain = new LorentzianProblem(x, magnitude, false);
            LevenbergMarquardt.Solution s3 = LevenbergMarquardt.solve(plain, new double[] {level, x0, g});
            LorentzianProblem full = new LorentzianProblem(x, magnitude, true);
            double[] p3 = s3.p();
            LevenbergMarquardt.Solution s5 = LevenbergMarquardt.solve(full, new double[] {0, p3[0], 0, p3[1], p3[2]});
            double sigma2 = s5.cost() / Math.max(1, n - 5);
            boolean keep = s3.cost() - s5.cost() > BACKGROUND_SIGNIFICANCE * sigma2;
            chosen = keep ? full : plain;
            solution = keep ? s5 : s3;
        } else {
            chosen = new LorentzianProblem(x, magnitude, true);
            solution = LevenbergMarquardt.solve(chosen, new double[] {b2, level, 0, x0, g});
        }
        int k = chosen.parameterCount();
        double sigma2 = solution.cost() / Math.max(1, n - k);
        double[][] covariance = Linear.inverseSymmetric(solution.jtj());
        if (covariance == null) {
            throw new FitException("the Lorentzian is not determined by the data (singular fit)");
        }
        for (double[] row : covariance) {
            for (int j = 0; j < k; j++) {
                row[j] *= sigma2;
            }
        }
        boolean background = ((LorentzianProblem) chosen).background();
        LorentzianShape mapping = new LorentzianShape(referenceHz, scaleHz, background);
        double[] p = solution.p();
        if (!(Math.abs(p[background ? 4 : 2]) > 0)) {
            throw new FitException("no resonance found: the fitted width is zero");
        }
        return new TraceFit(p, covariance, mapping::shape, mapping.model(p), Method.LORENTZIAN,
                Math.sqrt(sigma2), NoiseEstimate.realSigma(magnitude));
    }
}
