package org.qfleet.fit;

import java.util.function.Function;

/**
 * One fitted trace: the estimator's parameters and covariance, how they map to the resonance
 * shape (so any derived quantity can be propagated), and the fitted response. The shape and its
 * variations with each parameter are worked out once, on first use, however many quantities are
 * propagated from them. Used by one thread (the analysis that made it).
 */
final class TraceFit {

    private final double[] parameters;
    private final double[][] covariance;
    private final Function<double[], ResonanceShape> shapeOf;
    private final ResponseModel model;
    private final Method method;
    private final double residualSigma;
    private final double noiseSigma;
    private final double[] residualPower;
    private ResonanceShape shape;
    private ShapeVariations variations;

    /**
     * @param parameters    estimator parameters
     * @param covariance    their covariance; all zeros when the estimator gives none
     * @param shapeOf       maps a parameter vector to the resonance shape
     * @param model         the fitted response, for residuals and plots
     * @param method        the estimator
     * @param residualSigma RMS residual per real component
     * @param noiseSigma    noise per real component estimated from the data alone
     * @param residualPower |data - model|^2 at every point (of |S| for magnitude-only models)
     */
    TraceFit(double[] parameters, double[][] covariance, Function<double[], ResonanceShape> shapeOf, ResponseModel model,
             Method method, double residualSigma, double noiseSigma, double[] residualPower) {
        this.parameters = parameters;
        this.covariance = covariance;
        this.shapeOf = shapeOf;
        this.model = model;
        this.method = method;
        this.residualSigma = residualSigma;
        this.noiseSigma = noiseSigma;
        this.residualPower = residualPower;
    }

    double[] parameters() {
        return parameters;
    }

    double[][] covariance() {
        return covariance;
    }

    ResponseModel model() {
        return model;
    }

    Method method() {
        return method;
    }

    double residualSigma() {
        return residualSigma;
    }

    double noiseSigma() {
        return noiseSigma;
    }

    double[] residualPower() {
        return residualPower;
    }

    ResonanceShape shape() {
        if (shape == null) {
            shape = shapeOf.apply(parameters);
        }
        return shape;
    }

    /** The shape with each parameter moved a small step either way, for {@link Propagation}. */
    ShapeVariations variations() {
        if (variations == null) {
            variations = ShapeVariations.of(parameters, covariance, shapeOf);
        }
        return variations;
    }
}
