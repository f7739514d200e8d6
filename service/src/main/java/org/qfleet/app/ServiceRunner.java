package org.qfleet.app;

import java.io.PrintWriter;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeoutException;
import java.util.function.BooleanSupplier;
import org.apache.kafka.clients.admin.Admin;
import org.apache.kafka.clients.admin.AdminClientConfig;
import org.apache.kafka.streams.KafkaStreams;
import org.qfleet.app.broker.BrokerException;
import org.qfleet.app.broker.EmbeddedBroker;
import org.qfleet.app.http.HttpEndpoints;
import org.qfleet.app.http.Readiness;
import org.qfleet.drift.DriftSettings;
import org.qfleet.stream.ServiceObserver;
import org.qfleet.stream.StreamService;
import org.qfleet.stream.StreamSettings;
import org.qfleet.stream.TopicSetup;
import org.qfleet.verdict.ProductCatalogue;

/**
 * Brings the service up in order: the metrics and health endpoints, the embedded broker when no
 * bootstrap servers are configured, a broker that answers, the topics, the running topology; then
 * says once that it is ready.
 * Closes everything in reverse order, once, whoever asks first (a shutdown hook, the end of a
 * demo, a failure).
 */
final class ServiceRunner implements AutoCloseable {

    private static final Duration ADMIN_TIMEOUT = Duration.ofSeconds(10);
    private static final Duration RETRY_EVERY = Duration.ofSeconds(5);
    private static final Duration CLOSE_TIMEOUT = Duration.ofSeconds(30);
    /** How often the Kafka clients' metrics are looked up again (clients change with rebalances). */
    private static final Duration KAFKA_METRICS_REFRESH = Duration.ofSeconds(10);

    private final String prefix;
    private final PrintWriter err;
    private final boolean httpFallback;
    private volatile ServiceEndpoints endpoints;
    private volatile EmbeddedBroker broker;
    private volatile StreamService service;
    private volatile StreamSettings settings;
    private volatile BooleanSupplier stopRequested = () -> false;
    private boolean closed;

    /**
     * @param prefix       what starts each message line, e.g. {@code qfleet run: }
     * @param httpFallback when the HTTP port is taken, serve on a free one instead of failing (the demo)
     */
    ServiceRunner(String prefix, PrintWriter err, boolean httpFallback) {
        this.prefix = prefix;
        this.err = err;
        this.httpFallback = httpFallback;
    }

    /**
     * Starts everything and returns once the topology runs; waits for an unreachable broker until
     * asked to stop, saying so once.
     *
     * @param stop says when to give up waiting (Ctrl-C); then this throws {@link InterruptedException}
     * @throws ServiceException when something cannot start (the message says what and why)
     */
    void start(ServiceConfig config, ProductCatalogue catalogue, BooleanSupplier stop)
            throws ServiceException, InterruptedException {
        stopRequested = stop;
        settings = config.stream();
        if (config.httpAddress().isPresent()) {
            endpoints = ServiceEndpoints.start(config.httpAddress().get(), httpFallback, this::readiness);
        }
        if (config.embedded()) {
            try {
                broker = EmbeddedBroker.start(config.dataDir(), config.brokerPort(), config.cleanStart());
            } catch (BrokerException e) {
                throw new ServiceException(e.getMessage(), e);
            }
            Map<String, String> kafka = new java.util.LinkedHashMap<>(settings.kafka());
            kafka.put(AdminClientConfig.BOOTSTRAP_SERVERS_CONFIG, broker.bootstrapServers());
            settings = settings.withKafka(kafka);
        }
        checkStop();
        try (Admin admin = Admin.create(settings.clientProperties())) {
            awaitBroker(admin);
            prepareTopics(admin, config);
        }
        checkStop();
        ServiceEndpoints e = endpoints;
        StreamService started = StreamService.start(settings, catalogue, DriftSettings.DEFAULT,
                e == null ? ServiceObserver.NONE : e.observer());
        service = started;
        if (e != null) {
            started.bindMetrics(e.registry(), KAFKA_METRICS_REFRESH);
        }
        boolean saidWaiting = false;
        while (!started.awaitRunning(RETRY_EVERY)) {
            checkStop();
            if (started.hasFailed()) {
                throw new ServiceException("the stream stopped while starting: " + started.state() + "; see the log above");
            }
            if (!saidWaiting) {
                err.println(prefix + "waiting for the stream to join its group and start (state " + started.state() + ")");
                err.flush();
                saidWaiting = true;
            }
        }
    }

    private void checkStop() throws InterruptedException {
        if (stopRequested.getAsBoolean() || isClosed()) {
            throw new InterruptedException("stopped on request before the service was ready");
        }
    }

    private synchronized boolean isClosed() {
        return closed;
    }

    /** Ready while the topology runs: partitions assigned, processing (not while rebalancing). */
    Readiness readiness() {
        StreamService s = service;
        if (s == null) {
            return new Readiness(false, "starting");
        }
        KafkaStreams.State state = s.state();
        return new Readiness(state == KafkaStreams.State.RUNNING, "Kafka Streams state " + state);
    }

    /** The HTTP server of the metrics and health endpoints, to mount more on; empty when turned off. */
    Optional<HttpEndpoints> http() {
        ServiceEndpoints e = endpoints;
        return e == null ? Optional.empty() : Optional.of(e.http());
    }

    /**
     * Where the status page, the metrics and the health checks are, to say after the ready line
     * (before it, a line naming /health/ready could be taken for it); empty when they are off.
     */
    Optional<String> endpointsLine() {
        ServiceEndpoints e = endpoints;
        return e == null ? Optional.empty() : Optional.of(prefix + e.line());
    }

    /** Where the service reads and writes, for the ready line. */
    String readyLine() {
        String where = broker != null
                ? settings.bootstrapServers() + " (embedded broker, data in " + broker.dataDir() + ")"
                : settings.bootstrapServers();
        return prefix + "ready: reading " + settings.topics().sweeps() + " on " + where + ", writing "
                + settings.topics().results() + ", " + settings.topics().rejects() + " and " + settings.topics().alerts()
                + " (application id " + settings.applicationId() + "); stop with Ctrl-C";
    }

    String bootstrapServers() {
        return settings.bootstrapServers();
    }

    StreamSettings settings() {
        return settings;
    }

    /** Whether the stream has stopped for good after an error. */
    boolean failed() {
        StreamService s = service;
        return s != null && s.hasFailed();
    }

    /** Closes the stream (committing what is done), then the embedded broker. Idempotent. */
    @Override
    public void close() {
        synchronized (this) {
            if (closed) {
                return;
            }
            closed = true;
        }
        StreamService s = service;
        if (s != null) {
            s.close(CLOSE_TIMEOUT);
        }
        EmbeddedBroker b = broker;
        if (b != null) {
            b.close();
        }
        ServiceEndpoints e = endpoints;
        if (e != null) {
            e.close();
        }
    }

    private void awaitBroker(Admin admin) throws InterruptedException {
        boolean saidWaiting = false;
        while (true) {
            try {
                admin.describeCluster().nodes().get(ADMIN_TIMEOUT.toMillis(), java.util.concurrent.TimeUnit.MILLISECONDS);
                if (saidWaiting) {
                    err.println(prefix + "Kafka at " + settings.bootstrapServers() + " answers now");
                    err.flush();
                }
                return;
            } catch (ExecutionException | TimeoutException e) {
                if (!saidWaiting) {
                    err.println(prefix + "cannot reach Kafka at " + settings.bootstrapServers() + " ("
                            + reason(e) + "); retrying every " + RETRY_EVERY.toSeconds() + " s until it answers (Ctrl-C to stop)");
                    err.flush();
                    saidWaiting = true;
                }
                for (int i = 0; i < RETRY_EVERY.toMillis() / 100; i++) {
                    checkStop();
                    Thread.sleep(100);
                }
            }
        }
    }

    private void prepareTopics(Admin admin, ServiceConfig config) throws ServiceException, InterruptedException {
        List<String> used = List.of(settings.topics().sweeps(), settings.topics().results(), settings.topics().rejects());
        try {
            if (config.createTopics()) {
                TopicSetup setup = new TopicSetup(config.partitionsByTopic(), config.streamPartitions(), config.replicationFactor());
                List<String> created = setup.createMissing(admin, settings.topics().all(), ADMIN_TIMEOUT);
                if (!created.isEmpty() && !config.embedded()) {
                    err.println(prefix + "created the topics " + String.join(", ", created));
                    err.flush();
                }
            } else {
                List<String> missing = TopicSetup.missing(admin, used, ADMIN_TIMEOUT);
                if (!missing.isEmpty()) {
                    throw new ServiceException("the topics " + String.join(", ", missing) + " do not exist on "
                            + settings.bootstrapServers() + "; create them, or start with --create-topics");
                }
            }
        } catch (ExecutionException | TimeoutException e) {
            throw new ServiceException("cannot check or create the topics on " + settings.bootstrapServers() + ": " + reason(e), e);
        }
    }

    private static String reason(Exception e) {
        if (e instanceof TimeoutException) {
            return "no answer within " + ADMIN_TIMEOUT.toSeconds() + " s";
        }
        Throwable t = e instanceof ExecutionException && e.getCause() != null ? e.getCause() : e;
        String message = t.getMessage();
        return message == null ? t.getClass().getSimpleName() : message;
    }
}
