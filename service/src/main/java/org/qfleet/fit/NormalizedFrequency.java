package org.qfleet.fit;

/**
 * Sweep frequencies mapped to x = (f - referenceHz) / scaleHz, from -1 at the first point to +1 at
 * the last, so that the fits work with numbers near one whatever the band.
 */
record NormalizedFrequency(double referenceHz, double scaleHz, double[] x) {

    static NormalizedFrequency of(double[] frequencyHz) {
        int n = frequencyHz.length;
        double reference = 0.5 * (frequencyHz[0] + frequencyHz[n - 1]);
        double scale = 0.5 * (frequencyHz[n - 1] - frequencyHz[0]);
        double[] x = new double[n];
        double perHz = 1 / scale;
        for (int i = 0; i < n; i++) {
            x[i] = (frequencyHz[i] - reference) * perHz;
        }
        return new NormalizedFrequency(reference, scale, x);
    }

    double toHz(double normalized) {
        return referenceHz + scaleHz * normalized;
    }
}
