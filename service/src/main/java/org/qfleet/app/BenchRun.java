package org.qfleet.app;

import java.io.PrintWriter;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.BooleanSupplier;
import org.apache.kafka.clients.admin.Admin;
import org.apache.kafka.clients.producer.ProducerConfig;
import org.apache.kafka.common.KafkaException;
import org.qfleet.codec.TraceForm;
import org.qfleet.stream.StreamService;
import org.qfleet.stream.StreamSettings;
import org.qfleet.stream.SweepHandler;
import org.qfleet.stream.SweepOutcome;
import org.qfleet.stream.TopicSetup;
import org.qfleet.stream.Topics;
import org.qfleet.sweep.SweepLimits;
import org.qfleet.verdict.ProductCatalogue;

/**
 * The phases of one {@code bench} run against a running broker: make the sweep messages, publish
 * them into fresh topics, read and decode them with a plain consumer (the raw ceiling), let the
 * full service work through them (saturation), then offer sweeps at a fixed rate to the running
 * service and record end-to-end latencies.
 */
final class BenchRun {

    private static final Duration ADMIN_TIMEOUT = Duration.ofSeconds(30);
    private static final Duration SERVICE_CLOSE_TIMEOUT = Duration.ofSeconds(30);
    private static final int WARM_UP_PASSES = 2;
    private static final int PRELOAD_BATCH_BYTES = 1024 * 1024;

    /**
     * What to run.
     *
     * @param broker       how to name the broker in the figures: "embedded" or the bootstrap servers
     * @param kafka        client settings for every client and the service, with {@code bootstrap.servers}
     * @param replication  replication factor of the topics, or empty for the broker's default
     * @param stallTimeout give up on a phase when nothing has come for this long
     */
    record Plan(String broker, Map<String, String> kafka, Optional<Short> replication, long sweeps, long warmUpSweeps,
            int points, int distinct, List<TraceForm> forms, int partitions, int threads, double rate, Duration rateDuration,
            Duration lateAfter, Duration stallTimeout, boolean skipRaw, boolean skipLatency, long seed) {
    }

    private final Plan plan;
    private final PrintWriter err;
    private final BenchProgress progress;
    private final BooleanSupplier stop;
    private final String runTag = Long.toString(System.currentTimeMillis(), 36);
    private final Map<String, Object> clients;

    BenchRun(Plan plan, PrintWriter err, BenchProgress progress, BooleanSupplier stop) {
        this.plan = plan;
        this.err = err;
        this.progress = progress;
        this.stop = stop;
        this.clients = new HashMap<>(plan.kafka());
    }

    /** The run's topics: unique names, so runs on the same cluster never mix. */
    Topics topics() {
        return topics(applicationId());
    }

    /** The run's Kafka Streams application id, new for every run. */
    String applicationId() {
        return "qfleet-bench-" + runTag;
    }

    /**
     * Whether a topic belongs to this run: its own topics, the warm-up's, and the internal topics of
     * both applications all start with the application id and a dot or a dash.
     */
    boolean owns(String topic) {
        return topic.startsWith(applicationId() + ".") || topic.startsWith(applicationId() + "-");
    }

    private static Topics topics(String prefix) {
        return new Topics(prefix + ".sweeps", prefix + ".results", prefix + ".rejects", prefix + ".alerts");
    }

    private StreamSettings serviceSettings(Topics topics, String applicationId) {
        return new StreamSettings(topics, applicationId, plan.threads(), SweepLimits.DEFAULT,
                StreamSettings.DEFAULT_MAX_SWEEP_BYTES, StreamSettings.DEFAULT_MAX_REJECT_PAYLOAD_BYTES, plan.kafka());
    }

    BenchFigures run() throws BenchException, InterruptedException {
        String startedAt = Instant.now().toString();
        Topics topics = topics();
        StreamSettings service = serviceSettings(topics, applicationId());
        say(String.format(Locale.ROOT, "simulating %d distinct sweeps of %d points", plan.distinct(), plan.points()));
        BenchSweeps sweeps = BenchSweeps.generate(plan.distinct(), plan.points(), plan.forms(), plan.seed(), runTag);
        warmUp(sweeps, service);
        if (plan.warmUpSweeps() > 0) {
            rehearse(sweeps);
        }
        createTopics(topics);
        long offered = plan.skipLatency() ? 0 : Math.max(1, Math.round(plan.rate() * plan.rateDuration().toNanos() / 1e9));
        List<BenchFigures.Phase> phases = new ArrayList<>();
        phases.add(publish(BenchFigures.PUBLISH, sweeps, topics, plan.sweeps()));
        checkStop();
        if (!plan.skipRaw()) {
            phases.add(raw(BenchFigures.RAW, topics, plan.sweeps()));
            checkStop();
        }
        withService(sweeps, service, plan.sweeps() + offered, (watcher, running, start) -> {
            phases.add(saturation(BenchFigures.SERVICE, watcher, running, start, plan.sweeps()));
            if (!plan.skipLatency() && !stop.getAsBoolean() && !running.hasFailed()) {
                phases.add(latency(sweeps, topics, watcher, running, offered));
            }
        });
        checkStop();
        return new BenchFigures(startedAt, BenchMachine.describe(),
                new BenchFigures.Settings(plan.broker(), plan.sweeps(), plan.warmUpSweeps(), plan.points(), sweeps.distinct(), sweeps.meanMessageBytes(),
                        plan.forms().stream().map(TraceForm::code).toList(), plan.partitions(), plan.threads(), plan.rate(),
                        plan.rateDuration().toNanos() / 1e9, plan.lateAfter().toNanos() / 1e6),
                phases);
    }

    /**
     * Decodes and fits every distinct message a few times before anything is timed, so that no
     * phase pays for compiling the hot code and the comparison between phases is fair.
     */
    private void warmUp(BenchSweeps sweeps, StreamSettings service) throws BenchException {
        SweepHandler handler = new SweepHandler(service, ProductCatalogue.demoPlant());
        for (int pass = 0; pass < WARM_UP_PASSES; pass++) {
            for (byte[] message : sweeps.poolMessages()) {
                if (!(handler.handle("warm-up", message) instanceof SweepOutcome.Fitted)) {
                    throw new BenchException("a simulated sweep could not be fitted; the benchmark would not measure the service's normal work");
                }
            }
        }
    }

    /**
     * The publish, raw and service phases once through, unmeasured, on {@link Plan#warmUpSweeps} sweeps
     * in topics of their own with an application of its own: the JIT compiles the paths of the
     * clients, the broker and Kafka Streams (far more code than the fit and the decoder) before
     * anything is timed, so the figures are those of a service that has been running for a while.
     */
    private void rehearse(BenchSweeps sweeps) throws BenchException, InterruptedException {
        String applicationId = applicationId() + "-warm-up";
        Topics topics = topics(applicationId);
        long n = plan.warmUpSweeps();
        say("warming up on " + n + " sweeps in topics of their own (not measured)");
        createTopics(topics);
        publish("warm-up publish", sweeps, topics, n);
        checkStop();
        if (!plan.skipRaw()) {
            raw("warm-up raw", topics, n);
            checkStop();
        }
        withService(sweeps, serviceSettings(topics, applicationId), n,
                (watcher, running, start) -> saturation("warm-up service", watcher, running, start, n));
        checkStop();
    }

    /** What runs while a service works and a watcher reads its results. */
    @FunctionalInterface
    private interface ServiceWork {
        void run(BenchResultWatcher watcher, StreamService running, long startNanos) throws BenchException, InterruptedException;
    }

    /**
     * Starts a watcher of the results and rejects and the service, does {@code work}, then stops both;
     * a service that stopped after an error fails the run.
     */
    private void withService(BenchSweeps sweeps, StreamSettings service, long expected, ServiceWork work)
            throws BenchException, InterruptedException {
        Topics topics = service.topics();
        try (BenchResultWatcher watcher = new BenchResultWatcher(clients, topics.results(), topics.rejects(), sweeps,
                Math.toIntExact(expected))) {
            Thread reader = new Thread(watcher, "qfleet-bench-results-" + service.applicationId());
            reader.setDaemon(true);
            reader.start();
            StreamService running = null;
            try {
                long start = System.nanoTime();
                say("starting the service (application id " + service.applicationId() + ", " + plan.threads() + " stream threads)");
                running = StreamService.start(service, ProductCatalogue.demoPlant());
                work.run(watcher, running, start);
            } finally {
                progress.end();
                if (running != null) {
                    running.close(SERVICE_CLOSE_TIMEOUT);
                }
                watcher.close();
                reader.join(10_000);
            }
            if (running.hasFailed()) {
                throw new BenchException("the service " + service.applicationId() + " stopped after an error; see the log above");
            }
        }
    }

    private void createTopics(Topics topics) throws BenchException, InterruptedException {
        try (Admin admin = Admin.create(clients)) {
            new TopicSetup(Map.of(topics.rejects(), 1, topics.alerts(), 1), plan.partitions(), plan.replication())
                    .createMissing(admin, topics.all(), ADMIN_TIMEOUT);
        } catch (ExecutionException | TimeoutException | KafkaException e) {
            throw new BenchException("cannot create the topics on " + plan.broker() + ": " + BenchException.reason(e), e);
        }
        say("topics " + topics.sweeps() + " and " + topics.results() + " with " + plan.partitions() + " partitions");
    }

    private BenchFigures.Phase publish(String name, BenchSweeps sweeps, Topics topics, long count)
            throws BenchException, InterruptedException {
        PhaseMeter meter = PhaseMeter.start();
        long start = System.nanoTime();
        // Large batches: a sweep message is bigger than the producer's default batch of 16 KiB.
        Map<String, Object> bulk = new HashMap<>();
        bulk.put(ProducerConfig.BATCH_SIZE_CONFIG, Integer.toString(PRELOAD_BATCH_BYTES));
        bulk.put(ProducerConfig.LINGER_MS_CONFIG, "20");
        bulk.putAll(clients);
        SweepPublisher publisher = new SweepPublisher(bulk, topics.sweeps(), sweeps::message);
        progress.begin(name, count, publisher::acknowledged, meter);
        try (publisher) {
            publisher.publish(count, 0, stop);
        }
        double seconds = (System.nanoTime() - start) / 1e9;
        progress.end();
        if (publisher.failure() != null) {
            throw new BenchException("publishing the sweeps failed after " + publisher.acknowledged() + ": "
                    + BenchException.reason(publisher.failure()));
        }
        checkStop();
        if (publisher.acknowledged() != count) {
            throw new BenchException("the broker acknowledged " + publisher.acknowledged() + " of " + count + " sweeps");
        }
        BenchFigures.Phase phase = new BenchFigures.Phase(name, count, seconds, count / seconds,
                meter.finish(), null, null, null, null);
        sayDone(phase);
        return phase;
    }

    private BenchFigures.Phase raw(String name, Topics topics, long count) throws BenchException {
        PhaseMeter meter = PhaseMeter.start();
        RawCeiling ceiling = new RawCeiling(clients, topics.sweeps(), SweepLimits.DEFAULT);
        progress.begin(name, count, ceiling::read, meter);
        RawCeiling.Result r = ceiling.run(count, plan.stallTimeout(), stop);
        progress.end();
        if (r.read() < count && !stop.getAsBoolean()) {
            throw new BenchException("the raw consumer read " + r.read() + " of " + count + " sweeps, then nothing for "
                    + plan.stallTimeout().toSeconds() + " s");
        }
        Span span = Span.of(r.read(), r.firstBatch(), r.startNanos(), r.firstNanos(), r.lastNanos());
        BenchFigures.Phase phase = new BenchFigures.Phase(name, r.read(), span.seconds(), span.rate(),
                meter.finish(), r.decodeFailures(), null, null, null);
        sayDone(phase);
        return phase;
    }

    private BenchFigures.Phase saturation(String name, BenchResultWatcher watcher, StreamService running, long start, long n)
            throws InterruptedException {
        // CPU and heap from the first result on: the service's start-up (joining the group, setting
        // up transactions) is reported as startSeconds, not averaged into the steady work.
        awaitFirst(watcher, running);
        PhaseMeter meter = PhaseMeter.start();
        progress.begin(name, n, () -> watcher.accounted(0, n), meter);
        awaitAccounted(watcher, running, 0, n);
        progress.end();
        say(name + ": tasks by stream thread " + String.join(", ", running.tasksByThread()));
        BenchResultWatcher.Snapshot s = watcher.snapshot();
        long out = s.results() + s.rejects();
        Span span = Span.of(out, s.firstBatch(), start, s.firstNanos(), s.lastNanos());
        BenchFigures.Phase phase = new BenchFigures.Phase(name, n, span.seconds(), span.rate(), meter.finish(), null,
                s.firstNanos() < 0 ? null : (s.firstNanos() - start) / 1e9,
                new BenchFigures.Accounting(n, s.results(), s.rejects(), s.duplicates()), null);
        sayDone(phase);
        return phase;
    }

    private BenchFigures.Phase latency(BenchSweeps sweeps, Topics topics, BenchResultWatcher watcher, StreamService running,
            long offered) throws BenchException, InterruptedException {
        long from = plan.sweeps();
        BenchResultWatcher.Snapshot before = watcher.snapshot();
        watcher.startWindow();
        watcher.lateAfter(plan.lateAfter());
        PhaseMeter meter = PhaseMeter.start();
        AtomicLong firstSend = new AtomicLong(-1);
        AtomicLong lastSend = new AtomicLong(-1);
        SweepPublisher publisher = new SweepPublisher(clients, topics.sweeps(), i -> {
            SweepPublisher.Outgoing message = sweeps.message(from + i);
            watcher.sending(from + i);
            long now = System.nanoTime();
            firstSend.compareAndSet(-1, now);
            lastSend.set(now);
            return message;
        });
        long sent;
        try (publisher) {
            publisher.connect();
            say(String.format(Locale.ROOT, "offering %.0f sweeps/s for %.0f s to the running service", plan.rate(),
                    plan.rateDuration().toNanos() / 1e9));
            progress.begin(BenchFigures.LATENCY, offered, () -> watcher.accounted(from, from + offered), meter);
            sent = publisher.publish(offered, plan.rate(), stop);
        } catch (KafkaException e) {
            throw new BenchException("cannot publish to " + topics.sweeps() + ": " + BenchException.reason(e), e);
        }
        if (publisher.failure() != null) {
            progress.end();
            throw new BenchException("publishing at " + plan.rate() + "/s failed: " + BenchException.reason(publisher.failure()));
        }
        awaitAccounted(watcher, running, from, from + sent);
        progress.end();
        BenchResultWatcher.Snapshot s = watcher.snapshot();
        double sendSeconds = (lastSend.get() - firstSend.get()) / 1e9;
        double achieved = sent > 1 && sendSeconds > 0 ? (sent - 1) / sendSeconds : sent;
        BenchFigures.Latency latency = new BenchFigures.Latency(plan.rate(), achieved, s.latencies(), s.p50Micros() / 1000.0,
                s.p90Micros() / 1000.0, s.p99Micros() / 1000.0, s.p999Micros() / 1000.0, s.maxMicros() / 1000.0,
                s.meanMicros() / 1000.0, s.late());
        BenchFigures.Phase phase = new BenchFigures.Phase(BenchFigures.LATENCY, sent, sendSeconds, achieved, meter.finish(), null, null,
                new BenchFigures.Accounting(sent, s.results() - before.results(), s.rejects() - before.rejects(),
                        s.duplicates() - before.duplicates()), latency);
        sayDone(phase);
        return phase;
    }

    /** Waits until the first result or reject is visible, the stall timeout has passed, or the service failed. */
    private void awaitFirst(BenchResultWatcher watcher, StreamService running) throws InterruptedException {
        long deadline = System.nanoTime() + plan.stallTimeout().toNanos();
        while (watcher.snapshot().firstNanos() < 0 && !stop.getAsBoolean() && !running.hasFailed()
                && System.nanoTime() < deadline) {
            Thread.sleep(20);
        }
    }

    /** Waits until the sweeps [from, to) have all come out, nothing has come for the stall timeout, or the service failed. */
    private void awaitAccounted(BenchResultWatcher watcher, StreamService running, long from, long to) throws InterruptedException {
        long last = -1;
        long lastChange = System.nanoTime();
        while (!stop.getAsBoolean() && !running.hasFailed()) {
            long now = watcher.accounted(from, to);
            if (now >= to - from) {
                return;
            }
            if (now != last) {
                last = now;
                lastChange = System.nanoTime();
            } else if (System.nanoTime() - lastChange > plan.stallTimeout().toNanos()) {
                say("gave up waiting: " + now + " of " + (to - from) + " sweeps came out, then nothing for "
                        + plan.stallTimeout().toSeconds() + " s");
                return;
            }
            Thread.sleep(50);
        }
    }

    private void checkStop() throws InterruptedException {
        if (stop.getAsBoolean()) {
            throw new InterruptedException("stopped on request");
        }
    }

    private void sayDone(BenchFigures.Phase p) {
        say(String.format(Locale.ROOT, "%s: %d sweeps in %.1f s, %.0f/s", p.name(), p.sweeps(), p.seconds(), p.sweepsPerSecond()));
    }

    private void say(String message) {
        err.println(BenchProgress.PREFIX + message);
        err.flush();
    }

    /**
     * The steady rate of a phase whose sweeps arrive in batches: the sweeps after the first batch
     * over the time from the first batch to the last; with a single batch, all sweeps over the
     * time from the start of the phase.
     */
    record Span(double seconds, double rate) {

        static Span of(long count, long firstBatch, long startNanos, long firstNanos, long lastNanos) {
            if (count > firstBatch && lastNanos > firstNanos && firstNanos >= 0) {
                double seconds = (lastNanos - firstNanos) / 1e9;
                return new Span(seconds, (count - firstBatch) / seconds);
            }
            if (count > 0 && lastNanos > startNanos) {
                double seconds = (lastNanos - startNanos) / 1e9;
                return new Span(seconds, count / seconds);
            }
            return new Span(0, 0);
        }
    }
}
