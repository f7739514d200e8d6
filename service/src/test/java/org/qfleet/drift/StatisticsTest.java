package org.qfleet.drift;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Welford statistics, retests in a lot, untrusted units, and the robust baseline. */
class StatisticsTest {

    @Test
    void welfordAgreesWithTheTwoPassFormulasAndCanTakeValuesOutAgain() {
        double[] x = {10.4e9 + 1, 10.4e9 - 3, 10.4e9 + 7, 10.4e9 + 2, 10.4e9 - 5};
        Welford w = Welford.EMPTY;
        for (double v : x) {
            w = w.plus(v);
        }
        double mean = 10.4e9 + 0.4;
        double ss = 0;
        for (double v : x) {
            ss += (v - mean) * (v - mean);
        }
        assertThat(w.mean()).isCloseTo(mean, offset(1e-5));
        assertThat(w.variance()).isCloseTo(ss / 4, offset(1e-3));
        Welford first3 = Welford.EMPTY.plus(x[0]).plus(x[1]).plus(x[2]);
        Welford last2 = Welford.EMPTY.plus(x[3]).plus(x[4]);
        assertThat(first3.combine(last2).variance()).isCloseTo(ss / 4, offset(1e-3));
        assertThat(w.without(last2).variance()).isCloseTo(first3.variance(), offset(1e-3));
        assertThat(w.minus(x[4]).minus(x[3]).mean()).isCloseTo(first3.mean(), offset(1e-5));
    }

    @Test
    void aRetestReplacesTheUnitsEarlierValue() {
        UnitValue first = UnitValue.of(unit("u1", "st-01", 6000));
        LotStatistics s = LotStatistics.EMPTY
                .plus(first, null)
                .plus(UnitValue.of(unit("u2", "st-02", 6100)), null)
                .plus(UnitValue.of(unit("u1", "st-02", 5900)), first);
        assertThat(s.count()).isEqualTo(2);
        assertThat(s.mean()).isCloseTo(6000, offset(1e-9));
        assertThat(s.byStation()).containsOnlyKeys("st-02");
        assertThat(s.byStation().get("st-02").qu().n()).isEqualTo(2);
    }

    @Test
    void untrustedFlagsKeepAUnitOutOfTheStatistics() {
        DriftEngine engine = new DriftEngine(DriftSettings.DEFAULT.withBaselines(
                java.util.Map.of("p", Baseline.configured("p", 6000, 90, Double.NaN))));
        engine.accept(new Measurement("p", "L1", "st-01", "u1", 0, 6000, 10e9, 25, List.of("low-snr")));
        engine.accept(new Measurement("p", "L1", "st-01", "u2", 0, 6010, 10e9, 25, List.of("resonance-at-edge")));
        LotState lot = engine.get("p", "L1");
        assertThat(lot.excluded()).isEqualTo(1);
        assertThat(lot.stats().count()).isEqualTo(1);
        assertThat(lot.stats().mean()).isEqualTo(6010);
    }

    @Test
    void theLearnedBaselineIsTheMeanAndSdOfTheUnitsNearTheMedianAndIgnoresAnOutlier() {
        BaselineLearner learner = BaselineLearner.start("p", 5);
        double[] qu = {100, 102, 98, 101, 5};
        for (double q : qu) {
            learner = learner.plus(new Measurement("p", "L", "s", "u", 0, q, 1e9, 25, List.of()));
        }
        Baseline b = learner.baseline(90);
        // median 100; absolute deviations 0, 2, 2, 1, 95 -> MAD 2, MAD-sigma 1.4826 * 2 = 2.97: the unit at 5 lies
        // 32 MAD-sigmas out and is dropped; mean of 100, 102, 98, 101 = 100.25, sample SD 1.7078 / 0.9969
        assertThat(b.quMean()).isCloseTo(100.25, offset(1e-9));
        assertThat(b.quSigma()).isCloseTo(Math.sqrt((0.0625 + 3.0625 + 5.0625 + 0.5625) / 3) / 0.9969, offset(1e-9));
        assertThat(b.origin()).isEqualTo(Baseline.LEARNED);
        assertThat(b.units()).isEqualTo(5);
        assertThat(b.lotLimit()).isEqualTo(90);
    }

    @Test
    void aLearnedSigmaIsNeverBelowItsFloor() {
        BaselineLearner learner = BaselineLearner.start("p", 4);
        for (int i = 0; i < 4; i++) {
            learner = learner.plus(new Measurement("p", "L", "s", "u" + i, 0, 6000 + i * 0.01, 10e9, 25, List.of()));
        }
        Baseline b = learner.baseline(Double.NaN);
        assertThat(b.quSigma()).isCloseTo(0.005 * b.quMean(), offset(1e-6));
        assertThat(b.f0SigmaHz()).isCloseTo(2e-6 * 10e9, offset(1e-3));
        assertThat(b.levelSigmaDb()).isEqualTo(0.05);
    }

    private static Measurement unit(String unit, String station, double qu) {
        return new Measurement("p", "L1", station, unit, 0, qu, 10e9, 25, List.of());
    }
}
