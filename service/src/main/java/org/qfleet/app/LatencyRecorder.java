package org.qfleet.app;

import java.util.Arrays;

/**
 * End-to-end latencies in milliseconds, for percentiles. Keeps at most a bounded number of
 * samples (the most recent), so a long demo does not grow without bound. Not thread-safe.
 */
final class LatencyRecorder {

    private final long[] samples;
    private long count;

    LatencyRecorder(int capacity) {
        this.samples = new long[capacity];
    }

    void add(long millis) {
        samples[(int) (count % samples.length)] = millis;
        count++;
    }

    long count() {
        return count;
    }

    /** The {@code p}-th percentile (0 to 100) of the kept samples by the nearest-rank method; -1 when empty. */
    long percentile(double p) {
        int n = (int) Math.min(count, samples.length);
        if (n == 0) {
            return -1;
        }
        long[] sorted = Arrays.copyOf(samples, n);
        Arrays.sort(sorted);
        int rank = (int) Math.ceil(p / 100 * n);
        return sorted[Math.max(0, Math.min(n - 1, rank - 1))];
    }

    void clear() {
        count = 0;
    }
}
