package org.qfleet.app.broker;

import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import kafka.server.KafkaConfig;
import kafka.server.KafkaRaftServer;
import org.apache.kafka.clients.admin.Admin;
import org.apache.kafka.clients.admin.AdminClientConfig;
import org.apache.kafka.common.Uuid;
import org.apache.kafka.common.utils.Time;
import org.apache.kafka.metadata.storage.Formatter;
import org.apache.kafka.server.common.Feature;
import org.apache.kafka.server.common.MetadataVersion;

/**
 * A real single-node Kafka broker (KRaft, broker and controller in one process) running inside
 * this JVM, for the one-command local default, the demo and the tests. It listens on localhost
 * only: it has no authentication. Production runs against a real cluster instead.
 *
 * <p>The data directory is formatted on first use and reused afterwards, so a restart in the same
 * folder resumes where the last run stopped.
 */
public final class EmbeddedBroker implements AutoCloseable {

    private static final int NODE_ID = 1;
    private static final String CONTROLLER_LISTENER = "CONTROLLER";
    private static final Duration READY_TIMEOUT = Duration.ofSeconds(60);

    private final KafkaRaftServer server;
    /** Folder inside the data directory that holds the broker's logs and metadata. */
    public static final String LOG_FOLDER = "broker";

    private final Path dataDir;
    private final int port;
    private boolean closed;

    private EmbeddedBroker(KafkaRaftServer server, Path dataDir, int port) {
        this.server = server;
        this.dataDir = dataDir;
        this.port = port;
    }

    /**
     * Formats {@code dataDir} if needed, starts the broker and waits until it answers.
     *
     * @param dataDir    where the broker keeps its logs and metadata; created if needed
     * @param port       the client port on localhost, or 0 for a free one
     * @param cleanStart delete what an earlier run left in {@code dataDir} first
     */
    public static EmbeddedBroker start(Path dataDir, int port, boolean cleanStart) throws BrokerException {
        Path dir = dataDir.toAbsolutePath().normalize();
        if (port != 0 && !FreePorts.isFree(port)) {
            throw new BrokerException("cannot start the embedded Kafka broker: port " + port
                    + " on localhost is in use (another broker, or another qfleet?); choose another with --broker-port", null);
        }
        int clientPort = port == 0 ? FreePorts.find() : port;
        int controllerPort = FreePorts.find();
        try {
            if (cleanStart) {
                DataDirectory.wipe(dir);
            }
            Files.createDirectories(dir);
        } catch (IOException e) {
            throw new BrokerException("cannot prepare the broker's data directory " + dir + ": " + e.getMessage(), e);
        }
        // The broker's logs go one level down, so that the service's other local data (Kafka Streams
        // state) can live beside them without the broker taking its folder for a partition.
        Path logs = dir.resolve(LOG_FOLDER);
        try {
            Files.createDirectories(logs);
        } catch (IOException e) {
            throw new BrokerException("cannot prepare the broker's data directory " + logs + ": " + e.getMessage(), e);
        }
        Properties config = config(logs, clientPort, controllerPort);
        format(logs);
        KafkaRaftServer server = new KafkaRaftServer(KafkaConfig.fromProps(config, false), Time.SYSTEM);
        try {
            server.startup();
        } catch (RuntimeException e) {
            stopQuietly(server);
            throw new BrokerException("cannot start the embedded Kafka broker on localhost:" + clientPort
                    + " (is another broker or program using that port?): " + rootMessage(e), e);
        }
        EmbeddedBroker broker = new EmbeddedBroker(server, dir, clientPort);
        try {
            broker.awaitReady();
        } catch (BrokerException e) {
            broker.close();
            throw e;
        }
        return broker;
    }

    /** Where clients connect: {@code localhost:<port>}. */
    public String bootstrapServers() {
        return "localhost:" + port;
    }

    public int port() {
        return port;
    }

    public Path dataDir() {
        return dataDir;
    }

    /** Stops the broker and waits until it has stopped. Safe to call more than once. */
    @Override
    public synchronized void close() {
        if (!closed) {
            closed = true;
            stopQuietly(server);
        }
    }

    private void awaitReady() throws BrokerException {
        Map<String, Object> admin = Map.of(AdminClientConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrapServers());
        try (Admin client = Admin.create(admin)) {
            client.describeCluster().nodes().get(READY_TIMEOUT.toMillis(), TimeUnit.MILLISECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new BrokerException("interrupted while waiting for the embedded broker", e);
        } catch (ExecutionException | TimeoutException e) {
            throw new BrokerException("the embedded broker on " + bootstrapServers() + " did not answer within "
                    + READY_TIMEOUT.toSeconds() + " s: " + rootMessage(e), e);
        }
    }

    /** Writes the cluster's first metadata, once: a directory with {@code meta.properties} is already formatted. */
    private static void format(Path dir) throws BrokerException {
        if (Files.exists(dir.resolve("meta.properties"))) {
            return;
        }
        try {
            new Formatter()
                    .setPrintStream(new PrintStream(OutputStream.nullOutputStream(), true, StandardCharsets.UTF_8))
                    .setNodeId(NODE_ID)
                    .setClusterId(Uuid.randomUuid().toString())
                    .setDirectories(List.of(dir.toString()))
                    .setMetadataLogDirectory(dir.toString())
                    .setReleaseVersion(MetadataVersion.LATEST_PRODUCTION)
                    .setSupportedFeatures(Feature.PRODUCTION_FEATURES)
                    .setControllerListenerName(CONTROLLER_LISTENER)
                    .setIgnoreFormatted(true)
                    .run();
        } catch (Exception e) {
            throw new BrokerException("cannot format the broker's data directory " + dir + ": " + rootMessage(e), e);
        }
    }

    private static Properties config(Path dir, int clientPort, int controllerPort) {
        Properties p = new Properties();
        p.put("process.roles", "broker,controller");
        p.put("node.id", Integer.toString(NODE_ID));
        p.put("controller.quorum.voters", NODE_ID + "@localhost:" + controllerPort);
        p.put("listeners", "PLAINTEXT://localhost:" + clientPort + "," + CONTROLLER_LISTENER + "://localhost:" + controllerPort);
        p.put("advertised.listeners", "PLAINTEXT://localhost:" + clientPort);
        p.put("listener.security.protocol.map", "PLAINTEXT:PLAINTEXT," + CONTROLLER_LISTENER + ":PLAINTEXT");
        p.put("controller.listener.names", CONTROLLER_LISTENER);
        p.put("inter.broker.listener.name", "PLAINTEXT");
        p.put("log.dirs", dir.toString());
        p.put("metadata.log.dir", dir.toString());
        // One node: every internal topic has one replica, or consumers and transactions hang.
        p.put("offsets.topic.replication.factor", "1");
        p.put("offsets.topic.num.partitions", "1");
        p.put("transaction.state.log.replication.factor", "1");
        p.put("transaction.state.log.min.isr", "1");
        p.put("transaction.state.log.num.partitions", "1");
        p.put("share.coordinator.state.topic.replication.factor", "1");
        p.put("share.coordinator.state.topic.min.isr", "1");
        p.put("default.replication.factor", "1");
        p.put("min.insync.replicas", "1");
        // Quick first join and rebalances; a small cleaner buffer keeps the heap small.
        p.put("group.initial.rebalance.delay.ms", "0");
        p.put("group.consumer.heartbeat.interval.ms", "500");
        p.put("group.consumer.min.heartbeat.interval.ms", "500");
        p.put("log.cleaner.dedupe.buffer.size", Integer.toString(2 * 1024 * 1024));
        // Topics are created on purpose, never by a typo in a client.
        p.put("auto.create.topics.enable", "false");
        return p;
    }

    private static void stopQuietly(KafkaRaftServer server) {
        try {
            server.shutdown();
            server.awaitShutdown();
        } catch (RuntimeException e) {
            // Stopping is best effort; the JVM may be on its way out.
        }
    }

    static String rootMessage(Throwable t) {
        Throwable root = t;
        while (root.getCause() != null && root.getCause() != root) {
            root = root.getCause();
        }
        String message = root.getMessage();
        return message == null ? root.getClass().getSimpleName() : message;
    }
}
