package org.qfleet.drift;

import java.util.Objects;

/**
 * What a product's in-control units look like: the mean and standard deviation of Qu, f0 and the
 * coupling level (insertion loss in dB), and the product's lot limit on the mean Qu of a lot.
 * Stated in every alert.
 *
 * @param product    product id
 * @param quMean     mu0 of Qu
 * @param quSigma    sigma0 of Qu, unit to unit
 * @param f0MeanHz   mean resonant frequency
 * @param f0SigmaHz  unit-to-unit standard deviation of f0
 * @param levelMeanDb  mean coupling level (insertion loss, dB); NaN when not known
 * @param levelSigmaDb its standard deviation; NaN when not known
 * @param lotLimit   lower limit on a lot's mean Qu, or NaN for none
 * @param origin     {@code configured}, or {@code learned} from the first accepted units
 * @param units      how many units it was learned from (0 when configured)
 */
public record Baseline(
        String product,
        double quMean,
        double quSigma,
        double f0MeanHz,
        double f0SigmaHz,
        double levelMeanDb,
        double levelSigmaDb,
        double lotLimit,
        String origin,
        int units) {

    public static final String CONFIGURED = "configured";
    public static final String LEARNED = "learned";

    public Baseline {
        Objects.requireNonNull(product, "product");
        Objects.requireNonNull(origin, "origin");
        if (!(quSigma > 0) || !Double.isFinite(quMean)) {
            throw new IllegalArgumentException("the Qu baseline of " + product + " needs a finite mean and a sigma above 0, got "
                    + quMean + " and " + quSigma);
        }
    }

    /** A configured baseline of Qu only: f0 and the coupling level are then not charted. */
    public static Baseline configured(String product, double quMean, double quSigma, double lotLimit) {
        return new Baseline(product, quMean, quSigma, Double.NaN, Double.NaN, Double.NaN, Double.NaN, lotLimit, CONFIGURED, 0);
    }

    public Baseline withLotLimit(double limit) {
        return new Baseline(product, quMean, quSigma, f0MeanHz, f0SigmaHz, levelMeanDb, levelSigmaDb, limit, origin, units);
    }

    /** The X-bar lower limit of a lot of {@code n} units: mu0 - 3 sigma0 / sqrt(n) (Shewhart; Montgomery). */
    public double xbarLowerLimit(long n) {
        return quMean - 3 * quSigma / Math.sqrt(n);
    }
}
