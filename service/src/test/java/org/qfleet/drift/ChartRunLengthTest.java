package org.qfleet.drift;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.SplittableRandom;
import java.util.function.DoubleFunction;
import org.junit.jupiter.api.Test;

/**
 * The charts simulated against published average run lengths (two-sided, zero-state start, known
 * in-control parameters, asymptotic EWMA limits). A simulated ARL is a mean of run lengths, so it
 * is compared within four of its own standard errors (sample standard deviation / sqrt(runs)).
 */
class ChartRunLengthTest {

    private static final int IN_CONTROL_RUNS = 3000;
    private static final int SHIFTED_RUNS = 5000;

    /** EWMA lambda 0.2, L 2.962: ARL 500 / 10.5 / 3.74 at a shift of 0 / 1 / 2 sigma (Lucas & Saccucci, Technometrics 32(1), 1990). */
    @Test
    void ewmaRunLengthsMatchLucasAndSaccucci() {
        assertArl("EWMA", 0, 500, IN_CONTROL_RUNS, this::ewmaRunLength);
        assertArl("EWMA", 1, 10.5, SHIFTED_RUNS, this::ewmaRunLength);
        assertArl("EWMA", 2, 3.74, SHIFTED_RUNS, this::ewmaRunLength);
    }

    /** Tabular CUSUM k 0.5, h 5: ARL 465 / 10.4 / 4.01 at 0 / 1 / 2 sigma (Montgomery's tables, as recalled from memory). */
    @Test
    void cusumRunLengthsMatchTheTabularCusumTables() {
        assertArl("CUSUM", 0, 465, IN_CONTROL_RUNS, this::cusumRunLength);
        assertArl("CUSUM", 1, 10.4, SHIFTED_RUNS, this::cusumRunLength);
        assertArl("CUSUM", 2, 4.01, SHIFTED_RUNS, this::cusumRunLength);
    }

    private final SplittableRandom random = new SplittableRandom(20240611L);

    private long ewmaRunLength(double shift) {
        Ewma chart = Ewma.start(Ewma.DEFAULT_LAMBDA, Ewma.DEFAULT_WIDTH);
        long n = 0;
        do {
            chart = chart.plus(shift + random.nextGaussian());
            n++;
        } while (!chart.beyondLimit());
        return n;
    }

    private long cusumRunLength(double shift) {
        Cusum chart = Cusum.start(Cusum.DEFAULT_K, Cusum.DEFAULT_H);
        long n = 0;
        do {
            chart = chart.plus(shift + random.nextGaussian());
            n++;
        } while (!chart.beyondLimit());
        return n;
    }

    private static void assertArl(String chart, double shift, double published, int runs, DoubleFunction<Long> runLength) {
        Welford lengths = Welford.EMPTY;
        for (int i = 0; i < runs; i++) {
            lengths = lengths.plus(runLength.apply(shift));
        }
        double standardError = lengths.standardDeviation() / Math.sqrt(runs);
        System.out.printf("%s shift %.0f sigma: simulated ARL %.2f +- %.2f over %d runs, published %.2f%n",
                chart, shift, lengths.mean(), standardError, runs, published);
        assertThat(lengths.mean()).as("%s ARL at a shift of %s sigma", chart, shift)
                .isCloseTo(published, org.assertj.core.data.Offset.offset(4 * standardError));
    }
}
