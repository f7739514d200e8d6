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
 *                          measured against them rather than against the product baseline (default 10)
 * @param quietPeriod       a lot with no unit for this long (event time) is closed (default 30 min)
 * @param ewmaLambda        EWMA weight (default 0.2)
 * @param ewmaWidth         EWMA limit width L (default 2.962)
 * @param cusumK            CUSUM reference value k, in sigma (default 0.5)
 * @param cusumH            CUSUM decision interval h, in sigma (default 5)
 * @param baselines         configured baselines by product; other products learn theirs
 * @param lotLimits         lower limit on a lot's mean Qu by product (for example the unit spec limit)
 */
public record DriftSettings(int learnUnits, int minLotCount, int minReferenceUnits, Duration quietPeriod,
        double ewmaLambda, double ewmaWidth, double cusumK, double cusumH,
        Map<String, Baseline> baselines, Map<String, Double> lotLimits) {

    public static final DriftSettings DEFAULT = new DriftSettings(200, 10, 10, Duration.ofMinutes(30),
            Ewma.DEFAULT_LAMBDA, Ewma.DEFAULT_WIDTH, Cusum.DEFAULT_K, Cusum.DEFAULT_H, Map.of(), Map.of());

    public DriftSettings {
        Objects.requireNonNull(quietPeriod, "quietPeriod");
        baselines = Map.copyOf(baselines);
        lotLimits = Map.copyOf(lotLimits);
        if (learnUnits < 2 || minLotCount < 2 || minReferenceUnits < 1) {
            throw new IllegalArgumentException("drift needs learnUnits >= 2, minLotCount >= 2 and minReferenceUnits >= 1, got "
                    + learnUnits + ", " + minLotCount + ", " + minReferenceUnits);
        }
        if (quietPeriod.isNegative() || quietPeriod.isZero()) {
            throw new IllegalArgumentException("the quiet period must be positive, got " + quietPeriod);
        }
        Ewma.start(ewmaLambda, ewmaWidth);
        Cusum.start(cusumK, cusumH);
    }

    public DriftSettings withLotLimits(Map<String, Double> limits) {
        return new DriftSettings(learnUnits, minLotCount, minReferenceUnits, quietPeriod, ewmaLambda, ewmaWidth, cusumK,
                cusumH, baselines, limits);
    }

    public DriftSettings withBaselines(Map<String, Baseline> configured) {
        return new DriftSettings(learnUnits, minLotCount, minReferenceUnits, quietPeriod, ewmaLambda, ewmaWidth, cusumK,
                cusumH, configured, lotLimits);
    }

    public DriftSettings withLearnUnits(int units) {
        return new DriftSettings(units, minLotCount, minReferenceUnits, quietPeriod, ewmaLambda, ewmaWidth, cusumK,
                cusumH, baselines, lotLimits);
    }

    public DriftSettings withQuietPeriod(Duration quiet) {
        return new DriftSettings(learnUnits, minLotCount, minReferenceUnits, quiet, ewmaLambda, ewmaWidth, cusumK,
                cusumH, baselines, lotLimits);
    }

    double lotLimit(String product) {
        return lotLimits.getOrDefault(product, Double.NaN);
    }
}
