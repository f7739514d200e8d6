package org.qfleet.fit;

import java.util.function.Function;

/**
 * One fitted trace: the estimator's parameters and covariance, how they map to the resonance
 * shape (so any derived quantity can be propagated), and the fitted response.
 *
 * @param parameters    estimator parameters
 * @param covariance    their covariance; all zeros when the estimator gives none
 * @param shapeOf       maps a parameter vector to the resonance shape
 * @param model         the fitted response, for residuals and plots
 * @param method        the estimator
 * @param residualSigma RMS residual per real component
 * @param noiseSigma    noise per real component estimated from the data alone
 * @param residualPower |data - model|^2 at every point (of |S| for magnitude-only models)
 */
record TraceFit(double[] parameters, double[][] covariance, Function<double[], ResonanceShape> shapeOf,
                ResponseModel model, Method method, double residualSigma, double noiseSigma, double[] residualPower) {

    ResonanceShape shape() {
        return shapeOf.apply(parameters);
    }
}
