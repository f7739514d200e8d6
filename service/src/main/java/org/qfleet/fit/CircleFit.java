package org.qfleet.fit;

/**
 * A converged circle fit in the estimator's normalized coordinates, with its covariance, and the
 * mapping back to physical units so that any derived quantity can be propagated.
 *
 * @param parameters   normalized parameters ([br, bi,] ar, ai, x0, g, t)
 * @param covariance   their covariance (sigma^2 (J^T J)^-1)
 * @param referenceHz  frequency at x = 0
 * @param scaleHz      hertz per unit of x
 * @param background   whether B was fitted (else B = 0)
 * @param tilt         whether a magnitude slope was fitted (the last parameter)
 * @param sigma        residual standard deviation per real component
 * @param noiseSigma   noise per real component estimated from the data alone
 * @param points       number of complex points fitted
 * @param residualPower |data - model|^2 at each point, from the optimizer's last pass (within about a tenth of
 *                      a standard deviation of the parameters)
 */
record CircleFit(double[] parameters, double[][] covariance, double referenceHz, double scaleHz,
                 boolean background, boolean tilt, double sigma, double noiseSigma, int points, double[] residualPower) {

    CircleModel model() {
        return model(parameters);
    }

    /** The physical model for any parameter vector near the solution (for error propagation). */
    CircleModel model(double[] p) {
        int o = background ? 2 : 0;
        double br = background ? p[0] : 0;
        double bi = background ? p[1] : 0;
        double f0 = referenceHz + scaleHz * p[o + 2];
        double gamma = Math.abs(scaleHz * p[o + 3]);
        double tau = p[o + 4] / (2 * Math.PI * scaleHz);
        double slope = tilt ? p[o + 5] / scaleHz : 0;
        return new CircleModel(referenceHz, f0, gamma, tau, p[o], p[o + 1], br, bi, slope);
    }
}
