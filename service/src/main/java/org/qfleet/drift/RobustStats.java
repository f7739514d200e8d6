package org.qfleet.drift;

import java.util.Arrays;

/** Median and the scaled median absolute deviation, the robust location and scale of a baseline. */
final class RobustStats {

    /**
     * Scale factor that makes the MAD estimate the standard deviation of normal data: 1/Phi^-1(3/4)
     * (Rousseeuw & Croux, JASA 88, 1273, 1993; common practice).
     */
    static final double MAD_TO_SIGMA = 1.4826;

    private RobustStats() {
    }

    static double median(double[] values) {
        if (values.length == 0) {
            return Double.NaN;
        }
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        int mid = sorted.length / 2;
        return sorted.length % 2 == 1 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
    }

    /** MAD times 1.4826. */
    static double madSigma(double[] values) {
        double median = median(values);
        double[] deviations = new double[values.length];
        for (int i = 0; i < values.length; i++) {
            deviations[i] = Math.abs(values[i] - median);
        }
        return MAD_TO_SIGMA * median(deviations);
    }
}
