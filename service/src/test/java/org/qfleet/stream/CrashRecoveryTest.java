package org.qfleet.stream;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Duration;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.UUID;
import java.util.stream.Collectors;
import org.apache.kafka.clients.producer.KafkaProducer;
import org.apache.kafka.clients.producer.ProducerConfig;
import org.apache.kafka.clients.producer.ProducerRecord;
import org.apache.kafka.common.serialization.ByteArraySerializer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The service killed like {@code kill -9} in the middle of a burst and started again with the same
 * application id: read with {@code read_committed}, every sweep has exactly one result.
 */
class CrashRecoveryTest {

    private static final int SWEEPS = 400;
    private static final Duration WAIT = Duration.ofSeconds(90);

    @TempDir
    Path dir;

    @Test
    void everySweepHasExactlyOneResultAfterAKillAndARestart() throws Exception {
        String bootstrap = TestBroker.get().bootstrapServers();
        Topics topics = TestBroker.freshTopics(6);
        String[] args = {"--bootstrap-servers", bootstrap, "--application-id", "crash-" + UUID.randomUUID(),
            "--sweeps-topic", topics.sweeps(), "--results-topic", topics.results(), "--rejects-topic", topics.rejects(),
            "--alerts-topic", topics.alerts(), "--threads", "2",
            // The killed member must leave the group before its partitions move: a short session keeps the test quick.
            "--kafka", "session.timeout.ms=6000", "--kafka", "heartbeat.interval.ms=1000"};
        List<StreamSweeps.Message> sweeps = StreamSweeps.mixed(SWEEPS, 21, "crash-" + UUID.randomUUID());
        Set<String> ids = sweeps.stream().map(StreamSweeps.Message::sweepId).collect(Collectors.toSet());

        try (ServiceProcess first = ServiceProcess.start(dir.resolve("first.log"), args)) {
            first.awaitReady(WAIT);
            publish(bootstrap, topics.sweeps(), sweeps);
            // Some results are committed, many sweeps are still to come: kill it mid-stream.
            TopicReader.read(bootstrap, topics.results(), SWEEPS / 10, WAIT);
            first.kill();
        }
        int committedAtKill = TopicReader.readAll(bootstrap, topics.results(), WAIT).size();
        assertThat(committedAtKill).as("killed mid-stream").isLessThan(SWEEPS);

        try (ServiceProcess second = ServiceProcess.start(dir.resolve("second.log"), args)) {
            second.awaitReady(WAIT);
            TopicReader.readUntil(bootstrap, topics.results(),
                    m -> m.stream().map(r -> r.value().get("sweepId").asText()).collect(Collectors.toSet()).containsAll(ids),
                    WAIT, "a result for each of " + SWEEPS + " sweeps");
            assertThat(second.stop(Duration.ofSeconds(30))).as(second.output()).isIn(0, 143);
            assertThat(second.output()).doesNotContain("\tat ").contains("qfleet run: stopped");
        }
        Map<String, Integer> resultsPerSweep = new HashMap<>();
        for (TopicReader.Message m : TopicReader.readAll(bootstrap, topics.results(), WAIT)) {
            resultsPerSweep.merge(m.value().get("sweepId").asText(), 1, Integer::sum);
        }
        assertThat(resultsPerSweep.keySet()).isEqualTo(ids);
        assertThat(resultsPerSweep.values()).allMatch(n -> n == 1);
        assertThat(TopicReader.readAll(bootstrap, topics.rejects(), WAIT)).isEmpty();
    }

    static void publish(String bootstrap, String topic, List<StreamSweeps.Message> sweeps) {
        try (KafkaProducer<byte[], byte[]> producer = new KafkaProducer<>(Map.of(ProducerConfig.BOOTSTRAP_SERVERS_CONFIG,
                bootstrap, ProducerConfig.ACKS_CONFIG, "all"), new ByteArraySerializer(), new ByteArraySerializer())) {
            for (StreamSweeps.Message m : sweeps) {
                producer.send(new ProducerRecord<>(topic, m.key().getBytes(StandardCharsets.UTF_8), m.value()));
            }
        }
    }
}
