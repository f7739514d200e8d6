package org.qfleet.app;

import java.io.PrintWriter;
import java.time.Clock;
import java.time.Duration;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import org.qfleet.codec.TraceForm;
import org.qfleet.sim.DemoPlant;
import org.qfleet.sim.StationFault;
import org.qfleet.stream.StreamSettings;

/**
 * The streaming demo, once the service runs: the invented plant publishes sweeps at a steady rate,
 * a console sums up what comes out every few seconds; a plating bath tires (the next cavity lot
 * loses 4 % of its Qu) and, halfway, a fixture connector works loose on station st-03. Ends after
 * the given duration or on Ctrl-C, with totals and end-to-end latency.
 */
final class LiveDemo implements RunCommand.WhileRunning {

    static final String PREFIX = "qfleet demo: ";
    private static final String TIRED_PRODUCT = "cav-x104";
    private static final double TIRED_BATH_QU_LOSS = 0.04;
    private static final String LOOSE_STATION = "st-03";
    private static final Duration DRAIN_TIMEOUT = Duration.ofSeconds(20);

    private final PrintWriter err;
    private final Duration duration;
    private final double rate;
    private final long seed;
    private final List<TraceForm> forms;
    private final Duration every;

    /** @param duration how long to publish, or null for until Ctrl-C */
    LiveDemo(PrintWriter err, Duration duration, double rate, long seed, List<TraceForm> forms, Duration every) {
        this.err = err;
        this.duration = duration;
        this.rate = rate;
        this.seed = seed;
        this.forms = forms;
        this.every = every;
    }

    @Override
    public int run(ServiceRunner runner, CountDownLatch stopRequested) throws InterruptedException {
        StreamSettings s = runner.settings();
        DemoPlant plant = new DemoPlant(seed, Clock.systemUTC());
        AtomicBoolean stopPublishing = new AtomicBoolean();
        DemoConsole console = new DemoConsole(s.clientProperties(), s.topics().results(), s.topics().rejects(), s.topics().alerts(), err);
        console.awaitAssignment(Duration.ofSeconds(30));
        Thread reader = new Thread(console, "qfleet-demo-console");
        reader.start();
        SweepPublisher publisher = new SweepPublisher(s.clientProperties(), s.topics().sweeps(), plant, forms);
        Thread producer = new Thread(() -> {
            try {
                publisher.publish(0, rate, stopPublishing::get);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }, "qfleet-demo-plant");
        err.println(PREFIX + String.format(Locale.ROOT, "the invented plant publishes %.0f sweeps/s to %s%s", rate,
                s.topics().sweeps(), duration == null ? " until Ctrl-C" : " for " + duration.toSeconds() + " s"));
        err.flush();
        long start = System.nanoTime();
        producer.start();
        boolean bathTired = false;
        boolean connectorLoose = false;
        long resultsBefore = 0;
        long lastSummary = start;
        while (true) {
            boolean stopped = stopRequested.await(every.toMillis(), TimeUnit.MILLISECONDS);
            long now = System.nanoTime();
            double elapsed = (now - start) / 1e9;
            if (!bathTired) {
                String lot = plant.degradeNextLot(TIRED_PRODUCT, TIRED_BATH_QU_LOSS);
                err.println(PREFIX + "the plating bath of " + TIRED_PRODUCT + " tires: lot " + lot + " will lose "
                        + Math.round(TIRED_BATH_QU_LOSS * 100) + " % of its Qu");
                bathTired = true;
            }
            if (!connectorLoose && elapsed >= halfway()) {
                plant.loosenConnector(LOOSE_STATION, StationFault.LOOSE_CONNECTOR);
                err.println(PREFIX + "the fixture connector of station " + LOOSE_STATION + " works loose");
                connectorLoose = true;
            }
            console.print(err, console.summary(publisher.sent(), elapsed, resultsBefore, (now - lastSummary) / 1e9));
            resultsBefore = console.results();
            lastSummary = now;
            if (stopped || (duration != null && elapsed >= duration.toSeconds()) || runner.failed()
                    || publisher.failure() != null) {
                break;
            }
        }
        stopPublishing.set(true);
        producer.join(TimeUnit.SECONDS.toMillis(10));
        publisher.close();
        double publishSeconds = (System.nanoTime() - start) / 1e9;
        long published = publisher.acknowledged();
        long drainDeadline = System.nanoTime() + DRAIN_TIMEOUT.toNanos();
        while (console.processed() < published && System.nanoTime() < drainDeadline) {
            Thread.sleep(100);
        }
        console.close();
        reader.join(TimeUnit.SECONDS.toMillis(10));
        err.println(PREFIX + String.format(Locale.ROOT,
                "done: %d sweeps published in %.1f s (%.1f/s), %d results, %d rejects; end-to-end latency p50 %s, p99 %s",
                published, publishSeconds, published / publishSeconds, console.results(), console.rejects(),
                DemoConsole.millis(console.overallLatency(50)), DemoConsole.millis(console.overallLatency(99))));
        if (publisher.failure() != null) {
            err.println(PREFIX + "publishing failed: " + publisher.failure().getMessage());
            return 1;
        }
        if (runner.failed()) {
            err.println(PREFIX + "the stream stopped after an error; see the log above");
            return 1;
        }
        return console.processed() >= published ? 0 : 1;
    }

    /** When the connector works loose: halfway through a given duration, else after 30 s. */
    private double halfway() {
        return duration == null ? 30 : duration.toSeconds() / 2.0;
    }
}
