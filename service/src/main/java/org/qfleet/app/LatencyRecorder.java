package org.qfleet.app;

import org.HdrHistogram.Histogram;

/**
 * Latencies for percentiles, in whatever unit the caller records (milliseconds in the demo,
 * microseconds in {@code bench}): an HdrHistogram with three significant digits, so memory stays
 * bounded however long a run lasts and values below 2048 units are kept exactly. Negative values
 * (clocks of two hosts that disagree) count as 0. Not thread-safe.
 */
final class LatencyRecorder {

    private static final int SIGNIFICANT_DIGITS = 3;

    private final Histogram histogram = new Histogram(SIGNIFICANT_DIGITS);

    void add(long value) {
        histogram.recordValue(Math.max(0, value));
    }

    long count() {
        return histogram.getTotalCount();
    }

    /**
     * The {@code p}-th percentile (0 to 100) by the nearest-rank method, to three significant
     * digits; -1 when empty.
     */
    long percentile(double p) {
        return count() == 0 ? -1 : histogram.getValueAtPercentile(p);
    }

    /** The largest value recorded, to three significant digits; -1 when empty. */
    long max() {
        return count() == 0 ? -1 : histogram.getMaxValue();
    }

    double mean() {
        return count() == 0 ? Double.NaN : histogram.getMean();
    }

    void clear() {
        histogram.reset();
    }
}
