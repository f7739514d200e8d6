package org.qfleet.app;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import java.util.function.LongSupplier;

/**
 * Progress of {@code bench} on stderr: every few seconds the phase, how far it is and its rate;
 * and, more often, a sample of the heap for the phase's meter. Runs on a daemon thread of its own.
 */
final class BenchProgress implements AutoCloseable {

    static final String PREFIX = "qfleet bench: ";
    static final long REPORT_EVERY_NANOS = TimeUnit.SECONDS.toNanos(5);
    private static final long SAMPLE_EVERY_MILLIS = 250;

    private final PrintWriter err;
    private final LongSupplier nanoClock;
    private final Thread thread;
    private volatile Phase phase;

    private record Phase(String name, long total, LongSupplier done, PhaseMeter meter, long startNanos) {
    }

    BenchProgress(PrintWriter err, LongSupplier nanoClock) {
        this.err = err;
        this.nanoClock = nanoClock;
        this.thread = new Thread(this::loop, "qfleet-bench-progress");
        this.thread.setDaemon(true);
        this.thread.start();
    }

    /** From now on, report {@code name} with {@code done} of {@code total}, and sample the heap for {@code meter}. */
    void begin(String name, long total, LongSupplier done, PhaseMeter meter) {
        phase = new Phase(name, total, done, meter, nanoClock.getAsLong());
    }

    /** Stops reporting until the next {@link #begin}. */
    void end() {
        phase = null;
    }

    /** The progress line for a phase, {@code elapsedNanos} after it began. */
    static String line(String name, long done, long total, long elapsedNanos) {
        double seconds = elapsedNanos / 1e9;
        return String.format(Locale.ROOT, "%s%s: %d of %d, %.0f/s over %.0f s", PREFIX, name, done, total,
                seconds > 0 ? done / seconds : 0.0, seconds);
    }

    private void loop() {
        long lastReport = nanoClock.getAsLong();
        try {
            while (!Thread.currentThread().isInterrupted()) {
                Thread.sleep(SAMPLE_EVERY_MILLIS);
                Phase p = phase;
                if (p == null) {
                    continue;
                }
                p.meter().sampleHeap();
                long now = nanoClock.getAsLong();
                if (now - lastReport >= REPORT_EVERY_NANOS && now - p.startNanos() >= REPORT_EVERY_NANOS) {
                    lastReport = now;
                    err.println(line(p.name(), p.done().getAsLong(), p.total(), now - p.startNanos()));
                    err.flush();
                }
            }
        } catch (InterruptedException e) {
            // Closing.
        }
    }

    @Override
    public void close() {
        thread.interrupt();
    }
}
