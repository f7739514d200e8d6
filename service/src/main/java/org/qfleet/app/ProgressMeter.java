package org.qfleet.app;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import java.util.function.LongSupplier;

/**
 * Tells a person on stderr how a long run is going: every few seconds the number of files done
 * and the rate, then a closing line. Silent for short runs, so scripts see nothing extra.
 */
final class ProgressMeter {

    /** Runs with more inputs than this report progress. */
    static final int THRESHOLD = 50;
    static final long INTERVAL_NANOS = TimeUnit.SECONDS.toNanos(5);

    private final int total;
    private final PrintWriter err;
    private final LongSupplier nanoClock;
    private final long start;
    private final boolean enabled;
    private long lastReport;

    ProgressMeter(int total, PrintWriter err, LongSupplier nanoClock) {
        this.total = total;
        this.err = err;
        this.nanoClock = nanoClock;
        this.start = nanoClock.getAsLong();
        this.lastReport = start;
        this.enabled = total > THRESHOLD;
    }

    /** Called after each file with the number of files finished so far. */
    void advanced(int done) {
        if (!enabled) {
            return;
        }
        long now = nanoClock.getAsLong();
        if (now - lastReport >= INTERVAL_NANOS) {
            lastReport = now;
            err.println(String.format(Locale.ROOT, "qfleet: %d of %d files, %.1f files/s", done, total, rate(done, now)));
            err.flush();
        }
    }

    void finished(int done) {
        if (!enabled) {
            return;
        }
        long now = nanoClock.getAsLong();
        err.println(String.format(Locale.ROOT, "qfleet: %d files in %.1f s, %.1f files/s",
                done, (now - start) / 1e9, rate(done, now)));
        err.flush();
    }

    private double rate(int done, long now) {
        double seconds = (now - start) / 1e9;
        return seconds > 0 ? done / seconds : 0;
    }
}
