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

    /**
     * Width of the lot-mean limit in standard errors. The textbook X-bar limit is 3 (Shewhart;
     * Montgomery) for one look at a subgroup; a lot's growing mean is looked at after every unit,
     * and with 3 about one in-control lot in sixty crossed it somewhere in 150 units in our
     * simulations (repeated looks at a random walk), with 3.5 none in 320. A lot 2 sigma0 low
     * still crosses it from its fourth unit on, before the minimum lot count.
     */
    public static final double XBAR_WIDTH = 3.5;

    /**
     * The X-bar lower limit of a lot of {@code n} units: mu0 - 3.5 sigma0 / sqrt(n), widened for a learned baseline by the uncertainty of its own mean, whose
     * variance is sigma0^2 / units: without it a mean learned 0.1 sigma0 too high would put every
     * large lot near its limit.
     */
    public double xbarLowerLimit(long n) {
        return lowerLimit(n, XBAR_WIDTH);
    }

    /** mu0 - width sigma0 sqrt(1/n + the baseline's own relative variance), see {@link #xbarLowerLimit}. */
    double lowerLimit(long n, double width) {
        double own = units > 0 ? 1.0 / units : 0;
        return quMean - width * quSigma * Math.sqrt(1.0 / n + own);
    }
}
