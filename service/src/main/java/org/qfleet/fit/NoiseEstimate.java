package org.qfleet.fit;

/**
 * The noise of a trace estimated from the data alone, without a model: second differences of a
 * smooth response nearly vanish, those of white noise have variance 6 sigma^2 per component. The
 * median keeps the few points of fast change (the resonance itself) from inflating the estimate.
 */
final class NoiseEstimate {

    private NoiseEstimate() {
    }

    /** Standard deviation of each of the real and imaginary parts of complex white noise. */
    static double complexSigma(double[] re, double[] im) {
        int n = re.length;
        if (n < 5) {
            return Double.NaN;
        }
        double[] w = new double[n - 2];
        for (int i = 1; i < n - 1; i++) {
            double dr = re[i + 1] - 2 * re[i] + re[i - 1];
            double di = im[i + 1] - 2 * im[i] + im[i - 1];
            w[i - 1] = dr * dr + di * di;
        }
        // |w|^2 of complex Gaussian second differences is exponential with mean 12 sigma^2: median 12 sigma^2 ln 2.
        return Math.sqrt(median(w) / (12 * Math.log(2)));
    }

    /** Standard deviation of white noise on a real-valued trace (e.g. a magnitude). */
    static double realSigma(double[] y) {
        int n = y.length;
        if (n < 5) {
            return Double.NaN;
        }
        double[] w = new double[n - 2];
        for (int i = 1; i < n - 1; i++) {
            double d = y[i + 1] - 2 * y[i] + y[i - 1];
            w[i - 1] = d * d;
        }
        // d^2 / (6 sigma^2) is chi-square with one degree of freedom, whose median is 0.45494.
        return Math.sqrt(median(w) / (6 * 0.454936423119572));
    }

    private static double median(double[] w) {
        return Select.median(w, w.length);
    }
}
