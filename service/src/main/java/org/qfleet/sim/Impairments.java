package org.qfleet.sim;

/**
 * What a real fixture and analyzer add to the ideal network response. The simulator applies them
 * to every trace in this order: tilt, leakage (transmission traces only), delay, noise, then the
 * optional reduction to magnitude.
 *
 * @param snrDb          20 log10(circle diameter / sigma), sigma the noise standard deviation of
 *                       each of the real and imaginary parts and the diameter that of the main trace
 *                       ({@link Truth#circleDiameter()}); every trace gets noise of that same sigma,
 *                       as from one analyzer receiver; {@code Double.POSITIVE_INFINITY} for none
 * @param delaySeconds   uncorrected cable delay: every trace is multiplied by exp(-j 2 pi f tau)
 * @param leakageRe      real part of a direct port-to-port leakage added to S21 and S12 (linear)
 * @param leakageIm      imaginary part of that leakage
 * @param tiltDbPerSpan  magnitude slope across the sweep (dB from first to last point, 0 dB at the centre)
 * @param magnitudeOnly  true to drop the phase (magnitude-only data)
 */
public record Impairments(
        double snrDb, double delaySeconds, double leakageRe, double leakageIm, double tiltDbPerSpan, boolean magnitudeOnly) {

    public static final Impairments NONE = new Impairments(Double.POSITIVE_INFINITY, 0, 0, 0, 0, false);

    public Impairments {
        if (Double.isNaN(snrDb) || snrDb == Double.NEGATIVE_INFINITY) {
            throw new IllegalArgumentException("snrDb must be a number or +Infinity, got " + snrDb);
        }
        requireFinite("delaySeconds", delaySeconds);
        requireFinite("leakageRe", leakageRe);
        requireFinite("leakageIm", leakageIm);
        requireFinite("tiltDbPerSpan", tiltDbPerSpan);
    }

    public static Impairments noise(double snrDb) {
        return new Impairments(snrDb, 0, 0, 0, 0, false);
    }

    public Impairments withSnrDb(double newSnrDb) {
        return new Impairments(newSnrDb, delaySeconds, leakageRe, leakageIm, tiltDbPerSpan, magnitudeOnly);
    }

    public Impairments withDelay(double seconds) {
        return new Impairments(snrDb, seconds, leakageRe, leakageIm, tiltDbPerSpan, magnitudeOnly);
    }

    public Impairments withLeakage(double re, double im) {
        return new Impairments(snrDb, delaySeconds, re, im, tiltDbPerSpan, magnitudeOnly);
    }

    public Impairments withTilt(double dbPerSpan) {
        return new Impairments(snrDb, delaySeconds, leakageRe, leakageIm, dbPerSpan, magnitudeOnly);
    }

    public Impairments withMagnitudeOnly(boolean dropPhase) {
        return new Impairments(snrDb, delaySeconds, leakageRe, leakageIm, tiltDbPerSpan, dropPhase);
    }

    /** Noise standard deviation per component for a resonance circle of the given diameter. */
    public double noiseSigma(double circleDiameter) {
        return snrDb == Double.POSITIVE_INFINITY ? 0 : circleDiameter * Math.pow(10, -snrDb / 20);
    }

    private static void requireFinite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be finite, got " + value);
        }
    }
}
