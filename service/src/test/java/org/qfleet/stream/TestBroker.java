package org.qfleet.stream;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;
import org.apache.kafka.clients.admin.Admin;
import org.apache.kafka.clients.admin.AdminClientConfig;
import org.qfleet.app.broker.EmbeddedBroker;

/**
 * One real Kafka broker for all stream tests of this JVM, on a free localhost port with its data
 * under {@code target/}, started on first use and stopped when the JVM exits. Each test class
 * works on topics and an application id of its own.
 */
public final class TestBroker {

    private static EmbeddedBroker broker;

    private TestBroker() {
    }

    public static synchronized EmbeddedBroker get() throws Exception {
        if (broker == null) {
            Path dir = Files.createTempDirectory(Files.createDirectories(Paths.get("target", "test-brokers")), "broker-");
            broker = EmbeddedBroker.start(dir, 0, false);
            Runtime.getRuntime().addShutdownHook(new Thread(broker::close, "test-broker-stop"));
        }
        return broker;
    }

    static Admin admin() throws Exception {
        return Admin.create(Map.of(AdminClientConfig.BOOTSTRAP_SERVERS_CONFIG, get().bootstrapServers()));
    }

    /** Four fresh topics with a common random prefix, created with {@code partitions} partitions each. */
    static Topics freshTopics(int partitions) throws Exception {
        String prefix = "t" + UUID.randomUUID().toString().substring(0, 8) + ".";
        Topics topics = new Topics(prefix + "sweeps", prefix + "results", prefix + "rejects", prefix + "alerts");
        try (Admin admin = admin()) {
            new TopicSetup(Map.of(), partitions, Optional.of((short) 1)).createMissing(admin, topics.all(), Duration.ofSeconds(30));
        }
        return topics;
    }

    static List<String> names(Topics topics) {
        return topics.all();
    }
}
