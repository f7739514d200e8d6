package org.qfleet.app.plot;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.qfleet.sweep.FrequencyUnit;

class NiceScaleTest {

    @Test
    void unitRangeGetsTicksEveryFifth() {
        // Heckbert's rule: range 1 is nice already; 1/5 rounds to the nice step 0.2.
        NiceScale s = NiceScale.covering(0, 1, 6);

        assertThat(s.step()).isCloseTo(0.2, within(1e-15));
        double[] ticks = s.ticks();
        assertThat(ticks).hasSize(6);
        for (int i = 0; i < ticks.length; i++) {
            assertThat(ticks[i]).isCloseTo(0.2 * i, within(1e-12));
        }
    }

    @Test
    void ticksCoverTheDataAndStepIsOneTwoOrFiveTimesAPowerOfTen() {
        double[][] ranges = {{0.13, 0.97}, {-47.3, -19.8}, {10.395e9, 10.405e9}, {-3e-4, 7e-4}, {1, 1e6}};
        for (double[] r : ranges) {
            NiceScale s = NiceScale.covering(r[0], r[1], 7);
            double mantissa = s.step() / Math.pow(10, Math.floor(Math.log10(s.step())));
            assertThat(Math.round(mantissa * 1000) / 1000.0).as("step %s", s.step()).isIn(1.0, 2.0, 5.0);
            assertThat(s.min()).isLessThanOrEqualTo(r[0]);
            assertThat(s.max()).isGreaterThanOrEqualTo(r[1]);
            assertThat(s.ticks().length).isBetween(3, 11);
        }
    }

    @Test
    void narrowSpanAtMicrowaveFrequencyIsLabelledInGigahertz() {
        // 10 MHz span: range 1e7, step 1e7 / 6 = 1.67e6 rounds to 2e6, ticks every 2 MHz.
        NiceScale s = NiceScale.covering(10.395e9, 10.405e9, 7);

        assertThat(s.step()).isEqualTo(2e6);
        assertThat(AxisUnits.forAxis(s)).isEqualTo(FrequencyUnit.GHZ);
        assertThat(s.label(s.ticks()[0], 1e9)).isEqualTo("10.394");
        assertThat(s.label(s.ticks()[1], 1e9)).isEqualTo("10.396");
    }

    @Test
    void veryNarrowSpanFallsBackToMegahertz() {
        // 100 kHz span: step 2e4 Hz would need 5 decimals in GHz but only 2 in MHz.
        NiceScale s = NiceScale.covering(10.39995e9, 10.40005e9, 7);

        assertThat(s.step()).isEqualTo(2e4);
        assertThat(AxisUnits.forAxis(s)).isEqualTo(FrequencyUnit.MHZ);
        assertThat(s.label(10_399_980_000.0, 1e6)).isEqualTo("10399.98");
    }

    @Test
    void aSingleValueStillGetsARange() {
        NiceScale s = NiceScale.covering(-20, -20, 5);

        assertThat(s.min()).isLessThan(-20);
        assertThat(s.max()).isGreaterThan(-20);
        assertThat(s.ticks()).isNotEmpty();
    }

    @Test
    void labelsNeverShowNegativeZero() {
        NiceScale s = NiceScale.covering(-1, 1, 5);

        assertThat(s.label(-0.0, 1)).isEqualTo("0.0");
    }
}
