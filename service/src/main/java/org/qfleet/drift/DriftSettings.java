package org.qfleet.drift;

import java.time.Duration;
import java.util.Map;
import java.util.Objects;

/**
 * How the drift monitors work.
 *
 * @param learnUnits        accepted units of a product its baseline is learned from (default 200)
 * @param minLotCount       trusted units a lot needs before the lot-mean rule is applied (default 10)
 * @param minReferenceUnits units a lot needs on its other stations before a station's values are
 *                          measured against them (default 10)
 * @param quietPeriod       a lot with no unit for this long (event time) is closed (default 30 min)
 * @param ewmaLambda        EWMA weight (default 0.2)
 * @param ewmaWidth         EWMA limit width L (default 3.5, see {@link #DEFAULT})
 * @param cusumK            CUSUM reference value k, in sigma (default 0.5)
 * @param cusumH            CUSUM decision interval h, in sigma (default 8, see {@link #DEFAULT})
 * @param confirmWithin     charted units within which a station's restarted chart must signal again
 *                          before the station is alerted (default 30; 0 alerts on the first signal)
 * @param closeAfterUnits   a lot is also closed when this many units of the product's other lots
 *                          arrived since its own latest unit (default 100; 0 turns it off)
 * @param baselines         configured baselines by product; other products learn theirs
 * @param lotLimits         lower limit on a lot's mean Qu by product (for example the unit spec limit)
 */
public record DriftSettings(int learnUnits, int minLotCount, int minReferenceUnits, Duration quietPeriod,
        double ewmaLambda, double ewmaWidth, double cusumK, double cusumH, int confirmWithin, int closeAfterUnits,
        Map<String, Baseline> baselines, Map<String, Double> lotLimits) {

    /**
     * Wider station limits than the single-chart designs (EWMA lambda 0.2 with L 2.962, CUSUM k 0.5
     * with h 5, each with an in-control run length near 500; Lucas & Saccucci 1990, Montgomery):
     * a station carries three charts, its units are measured against a lot reference and a learned
     * baseline that have noise of their own, so those designs alert a healthy station about once
     * per 130 units. With L 3.5, h 8 and a confirmed signal ({@code confirmWithin} 30) the
     * simulated rate falls to about one per 16,000 station units, and a shift of 2 sigma is still
     * reported within a median 12-15 of the station's units, 3 sigma within 8-11, counted from a
     * lot start (see the drift tests and DEVELOPERS.md). The published designs stay available:
     * set L, h and confirmWithin.
     */
    public static final double STATION_EWMA_WIDTH = 3.5;
    public static final double STATION_CUSUM_H = 8;

    public static final DriftSettings DEFAULT = new DriftSettings(200, 10, 10, Duration.ofMinutes(30),
            Ewma.DEFAULT_LAMBDA, STATION_EWMA_WIDTH, Cusum.DEFAULT_K, STATION_CUSUM_H, 30, 100, Map.of(), Map.of());

    public DriftSettings {
        Objects.requireNonNull(quietPeriod, "quietPeriod");
        baselines = Map.copyOf(baselines);
        lotLimits = Map.copyOf(lotLimits);
        if (learnUnits < 2 || minLotCount < 2 || minReferenceUnits < 1) {
            throw new IllegalArgumentException("drift needs learnUnits >= 2, minLotCount >= 2 and minReferenceUnits >= 1, got "
                    + learnUnits + ", " + minLotCount + ", " + minReferenceUnits);
        }
        if (confirmWithin < 0 || closeAfterUnits < 0) {
            throw new IllegalArgumentException("drift needs confirmWithin >= 0 and closeAfterUnits >= 0, got "
                    + confirmWithin + " and " + closeAfterUnits);
        }
        if (quietPeriod.isNegative() || quietPeriod.isZero()) {
            throw new IllegalArgumentException("the quiet period must be positive, got " + quietPeriod);
        }
        Ewma.start(ewmaLambda, ewmaWidth);
        Cusum.start(cusumK, cusumH);
    }

    public DriftSettings withLotLimits(Map<String, Double> limits) {
        return new DriftSettings(learnUnits, minLotCount, minReferenceUnits, quietPeriod, ewmaLambda, ewmaWidth, cusumK,
                cusumH, confirmWithin, closeAfterUnits, baselines, limits);
    }

    public DriftSettings withBaselines(Map<String, Baseline> configured) {
        return new DriftSettings(learnUnits, minLotCount, minReferenceUnits, quietPeriod, ewmaLambda, ewmaWidth, cusumK,
                cusumH, confirmWithin, closeAfterUnits, configured, lotLimits);
    }

    public DriftSettings withLearnUnits(int units) {
        return new DriftSettings(units, minLotCount, minReferenceUnits, quietPeriod, ewmaLambda, ewmaWidth, cusumK,
                cusumH, confirmWithin, closeAfterUnits, baselines, lotLimits);
    }

    public DriftSettings withQuietPeriod(Duration quiet) {
        return new DriftSettings(learnUnits, minLotCount, minReferenceUnits, quiet, ewmaLambda, ewmaWidth, cusumK,
                cusumH, confirmWithin, closeAfterUnits, baselines, lotLimits);
    }

    /** The same settings with the station charts' limits: EWMA width L, CUSUM interval h, confirmation window. */
    public DriftSettings withStationCharts(double width, double h, int within) {
        return new DriftSettings(learnUnits, minLotCount, minReferenceUnits, quietPeriod, ewmaLambda, width, cusumK,
                h, within, closeAfterUnits, baselines, lotLimits);
    }

    public DriftSettings withConfirmWithin(int units) {
        return new DriftSettings(learnUnits, minLotCount, minReferenceUnits, quietPeriod, ewmaLambda, ewmaWidth, cusumK,
                cusumH, units, closeAfterUnits, baselines, lotLimits);
    }

    public DriftSettings withCloseAfterUnits(int units) {
        return new DriftSettings(learnUnits, minLotCount, minReferenceUnits, quietPeriod, ewmaLambda, ewmaWidth, cusumK,
                cusumH, confirmWithin, units, baselines, lotLimits);
    }

    double lotLimit(String product) {
        return lotLimits.getOrDefault(product, Double.NaN);
    }
}
