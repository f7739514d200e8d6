package org.qfleet.fit;

import org.qfleet.sweep.Topology;
import org.qfleet.sweep.Trace;

/**
 * Estimates f0, QL and the resonance circle of one trace. Implementations are stateless and
 * thread-safe; the coupling corrections work on what they return, whatever the estimator.
 */
interface ResonanceEstimator {

    /** The method that results produced by this estimator report. */
    Method method();

    /**
     * @param frequencyHz strictly ascending sweep frequencies
     * @param trace       the trace to fit, one sample per frequency
     * @param topology    decides whether the resonance is a peak or a dip and which background applies
     */
    TraceFit fit(double[] frequencyHz, Trace trace, Topology topology) throws FitException;

    /** |S| of every sample, for the estimators that use the magnitude only. */
    static double[] magnitude(Trace trace) {
        double[] m = new double[trace.size()];
        for (int i = 0; i < m.length; i++) {
            m[i] = trace.magnitude(i);
        }
        return m;
    }

    /** (|S| - model)^2 at every point, for a model of the magnitude. */
    static double[] magnitudeResidualPower(double[] frequencyHz, double[] magnitude, ResponseModel model) {
        double[] out = new double[magnitude.length];
        double[] m = new double[2];
        for (int i = 0; i < out.length; i++) {
            model.evaluate(frequencyHz[i], m);
            double r = magnitude[i] - m[0];
            out[i] = r * r;
        }
        return out;
    }
}
