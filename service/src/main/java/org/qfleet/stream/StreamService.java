package org.qfleet.stream;

import io.micrometer.core.instrument.MeterRegistry;
import io.micrometer.core.instrument.binder.kafka.KafkaStreamsMetrics;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import org.apache.kafka.streams.KafkaStreams;
import org.apache.kafka.streams.errors.StreamsUncaughtExceptionHandler.StreamThreadExceptionResponse;
import org.qfleet.drift.DriftSettings;
import org.qfleet.verdict.ProductCatalogue;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The running topology: starts Kafka Streams, tells when it is processing, closes it. A stream
 * thread that dies of an unexpected failure is replaced, so a long broker outage or a transient
 * fault is waited out rather than ending the service.
 */
public final class StreamService implements AutoCloseable {

    private static final Logger LOG = LoggerFactory.getLogger(StreamService.class);

    private final KafkaStreams streams;
    private final CountDownLatch running = new CountDownLatch(1);
    private final CountDownLatch failed = new CountDownLatch(1);
    private KafkaStreamsMetrics clientMetrics;
    private ScheduledExecutorService clientMetricsRefresh;

    private StreamService(KafkaStreams streams) {
        this.streams = streams;
    }

    /** Builds the topology and starts processing. */
    public static StreamService start(StreamSettings settings, ProductCatalogue catalogue) {
        return start(settings, catalogue, DriftSettings.DEFAULT);
    }

    /** Builds the topology with the given drift settings and starts processing. */
    public static StreamService start(StreamSettings settings, ProductCatalogue catalogue, DriftSettings drift) {
        return start(settings, catalogue, drift, ServiceObserver.NONE);
    }

    /** Builds the topology, reporting what it does to {@code observer}, and starts processing. */
    public static StreamService start(StreamSettings settings, ProductCatalogue catalogue, DriftSettings drift,
            ServiceObserver observer) {
        KafkaStreams streams = new KafkaStreams(SweepTopology.build(settings, catalogue, drift, observer),
                settings.streamsProperties());
        StreamService service = new StreamService(streams);
        streams.setStateListener((now, before) -> {
            if (now == KafkaStreams.State.RUNNING) {
                service.running.countDown();
            } else if (now == KafkaStreams.State.ERROR || now == KafkaStreams.State.PENDING_ERROR) {
                service.failed.countDown();
            }
        });
        streams.setUncaughtExceptionHandler(e -> {
            LOG.warn("a stream thread failed and is replaced: {}", e.toString());
            return StreamThreadExceptionResponse.REPLACE_THREAD;
        });
        streams.start();
        return service;
    }

    /**
     * Waits until the topology is running (partitions assigned, processing), or has failed.
     *
     * @return true when running within {@code timeout}
     */
    public boolean awaitRunning(Duration timeout) throws InterruptedException {
        long deadline = System.nanoTime() + timeout.toNanos();
        while (System.nanoTime() < deadline) {
            if (running.await(100, TimeUnit.MILLISECONDS)) {
                return true;
            }
            if (failed.getCount() == 0) {
                return false;
            }
        }
        return false;
    }

    /** Whether Kafka Streams has stopped for good after an error. */
    public boolean hasFailed() {
        return failed.getCount() == 0;
    }

    /** Tasks (input partitions) this instance processes now; changes with every rebalance. */
    public int activeTasks() {
        return streams.metadataForLocalThreads().stream().mapToInt(t -> t.activeTasks().size()).sum();
    }

    /** The active tasks of each stream thread, e.g. {@code "StreamThread-1 [0_0, 1_1]"}, for diagnostics. */
    public List<String> tasksByThread() {
        return streams.metadataForLocalThreads().stream()
                .map(t -> t.threadName().replaceFirst(".*-(StreamThread-\\d+)$", "$1") + " "
                        + t.activeTasks().stream().map(task -> task.taskId().toString()).sorted().toList())
                .sorted()
                .toList();
    }

    public KafkaStreams.State state() {
        return streams.state();
    }

    /**
     * Exports the metrics of Kafka Streams and of its Kafka clients (consumer lag, commit rates,
     * ...) to {@code registry} until this service is closed. Clients come and go with rebalances
     * and replaced threads: their metrics are looked up again every {@code refresh}.
     */
    public synchronized void bindMetrics(MeterRegistry registry, Duration refresh) {
        if (clientMetrics != null) {
            throw new IllegalStateException("the Kafka metrics are bound already");
        }
        clientMetricsRefresh = Executors.newSingleThreadScheduledExecutor(r -> {
            Thread t = new Thread(r, "qfleet-kafka-metrics");
            t.setDaemon(true);
            return t;
        });
        clientMetrics = new KafkaStreamsMetrics(streams, List.of(), clientMetricsRefresh, refresh);
        clientMetrics.bindTo(registry);
    }

    /** Stops processing, commits what is done and leaves the group; waits at most {@code timeout}. */
    public void close(Duration timeout) {
        streams.close(new KafkaStreams.CloseOptions().timeout(timeout).leaveGroup(true));
        synchronized (this) {
            if (clientMetrics != null) {
                clientMetrics.close();
                clientMetricsRefresh.shutdownNow();
            }
        }
    }

    @Override
    public void close() {
        close(Duration.ofSeconds(30));
    }
}
