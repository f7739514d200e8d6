package org.qfleet.sim;

/**
 * What a real fixture and analyzer add to the ideal network response.
 *
 * @param snrDb          20 log10(circle diameter / sigma), sigma the noise standard deviation of
 *                       each of the real and imaginary parts; {@code Double.POSITIVE_INFINITY} for none
 * @param delaySeconds   uncorrected cable delay: every trace is multiplied by exp(-j 2 pi f tau)
 * @param leakageRe      real part of a direct port-to-port leakage added to S21 (linear)
 * @param leakageIm      imaginary part of that leakage
 * @param tiltDbPerSpan  magnitude slope across the sweep (dB from first to last point, 0 dB at the centre)
 * @param magnitudeOnly  true to drop the phase (magnitude-only data)
 */
public record Impairments(
        double snrDb, double delaySeconds, double leakageRe, double leakageIm, double tiltDbPerSpan, boolean magnitudeOnly) {

    public static final Impairments NONE = new Impairments(Double.POSITIVE_INFINITY, 0, 0, 0, 0, false);

    public static Impairments noise(double snrDb) {
        return new Impairments(snrDb, 0, 0, 0, 0, false);
    }
}
