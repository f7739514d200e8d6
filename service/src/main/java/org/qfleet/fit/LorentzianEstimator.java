package org.qfleet.fit;

import org.qfleet.sweep.Topology;
import org.qfleet.sweep.Trace;

/**
 * Magnitude-only estimator: the Lorentzian-with-background fit of {@link LorentzianProblem},
 * started from the half-power reading and re-weighted once from its own first solution. Without
 * phase the circle's rotation is only known through the line's asymmetry, and a reflection or a
 * notch is read as under-coupled.
 */
final class LorentzianEstimator implements ResonanceEstimator {

    /** The same test as the circle fit: chi-square(2) at 0.999, in units of sigma^2. */
    private static final double BACKGROUND_SIGNIFICANCE = ComplexCircleEstimator.BACKGROUND_SIGNIFICANCE;

    @Override
    public Method method() {
        return Method.LORENTZIAN;
    }

    @Override
    public TraceFit fit(double[] frequencyHz, Trace trace, Topology topology) throws FitException {
        double[] magnitude = ResonanceEstimator.magnitude(trace);
        int n = frequencyHz.length;
        NormalizedFrequency normalized = NormalizedFrequency.of(frequencyHz);
        double referenceHz = normalized.referenceHz();
        double scaleHz = normalized.scaleHz();
        double[] x = normalized.x();
        double noise = NoiseEstimate.realSigma(magnitude);
        double floor = Math.max(noise, 1e-6 * max(magnitude));
        double[] power = new double[n];
        for (int i = 0; i < n; i++) {
            power[i] = magnitude[i] * magnitude[i] - 2 * noise * noise;
        }
        ResonanceShape start = HalfPowerEstimator.read(frequencyHz, magnitude, topology);
        double x0 = (start.f0Hz() - referenceHz) / scaleHz;
        double g = start.f0Hz() / (2 * start.qLoaded()) / scaleHz;
        double b2 = start.background() * start.background();
        double level = topology == Topology.TRANSMISSION
                ? start.amplitude() * start.amplitude()
                : Math.pow(start.background() - start.amplitude(), 2) - b2;

        boolean background = topology != Topology.TRANSMISSION;
        double[] p = background ? new double[] {b2, level, 0, x0, g} : new double[] {level, x0, g};
        LevenbergMarquardt.Solution solution = null;
        double[] weight = new double[n];
        for (int pass = 0; pass < 2; pass++) {
            weigh(x, p, background, floor, weight);
            solution = LevenbergMarquardt.solve(new LorentzianProblem(x, power, weight, background), p);
            p = solution.p();
        }
        if (!background) {
            // A transmission line keeps a background only when the data demand it (chi-square, 2 parameters, 0.999).
            LorentzianProblem full = new LorentzianProblem(x, power, weight, true);
            LevenbergMarquardt.Solution s5 = LevenbergMarquardt.solve(full, new double[] {0, p[0], 0, p[1], p[2]});
            double sigma2 = s5.cost() / Math.max(1, n - 5);
            if (solution.cost() - s5.cost() > BACKGROUND_SIGNIFICANCE * sigma2) {
                background = true;
                solution = s5;
                p = s5.p();
            }
        }
        int k = p.length;
        double sigma2 = solution.cost() / Math.max(1, n - k);
        double[][] covariance = Covariance.of(solution.jtj(), sigma2);
        if (covariance == null) {
            throw new FitException("the Lorentzian is not determined by the data (singular fit)");
        }
        if (!(Math.abs(p[background ? 4 : 2]) > 0)) {
            throw new FitException("no resonance found: the fitted width is zero");
        }
        boolean asymmetric = background && Math.abs(p[2]) > 3 * Math.sqrt(covariance[2][2]);
        LorentzianShape mapping = new LorentzianShape(referenceHz, scaleHz, background, asymmetric);
        // Residual per point of |S|, for comparison with the noise: sqrt(chi2 / n) times sigma.
        double residualSigma = Math.sqrt(sigma2) * floor;
        ResponseModel model = mapping.model(p);
        return new TraceFit(p, covariance, mapping::shape, model, Method.LORENTZIAN, residualSigma, noise,
                ResonanceEstimator.magnitudeResidualPower(frequencyHz, magnitude, model));
    }

    /** Inverse variance of |S|^2 for complex noise of sigma per component: 4 sigma^2 (P + sigma^2). */
    private static void weigh(double[] x, double[] p, boolean background, double sigma, double[] weight) {
        double s2 = sigma * sigma;
        for (int i = 0; i < x.length; i++) {
            double model = Math.max(0, LorentzianProblem.power(x[i], p, background));
            weight[i] = 1 / (4 * s2 * (model + s2));
        }
    }

    private static double max(double[] v) {
        double m = 0;
        for (double e : v) {
            m = Math.max(m, e);
        }
        return m;
    }
}
