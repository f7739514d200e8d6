package org.qfleet.stream;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import org.apache.kafka.clients.producer.KafkaProducer;
import org.apache.kafka.clients.producer.ProducerConfig;
import org.apache.kafka.clients.producer.ProducerRecord;
import org.apache.kafka.common.serialization.ByteArraySerializer;
import org.junit.jupiter.api.Test;
import org.qfleet.drift.Alert;
import org.qfleet.drift.AlertStatus;
import org.qfleet.drift.DriftEngine;
import org.qfleet.drift.Measurement;
import org.qfleet.drift.PlantValues;
import org.qfleet.sweep.SweepLimits;
import org.qfleet.verdict.ProductCatalogue;

/**
 * The drift monitors on a real broker in this JVM: results of a scenario with one low lot and one
 * faulty station are written to the results topic, and the alerts read back with read_committed
 * must be the in-memory {@link DriftEngine}'s for the same units, with exactly one lot episode (the
 * low lot) and one station episode for the faulty station; also when the service is closed in the
 * middle of the scenario and started again with the same application id and state folder.
 */
class DriftStreamTest {

    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final Duration WAIT = Duration.ofSeconds(90);

    @Test
    void aLowLotAndAFaultyStationGiveTheirAlertsOnceAcrossARestart() throws Exception {
        String bootstrap = TestBroker.get().bootstrapServers();
        Topics topics = TestBroker.freshTopics(3);
        Path stateDir = Files.createTempDirectory(Files.createDirectories(Paths.get("target", "test-state")), "drift-");
        StreamSettings settings = new StreamSettings(topics, "drift-" + UUID.randomUUID(), 1, SweepLimits.DEFAULT, 1 << 20,
                1024, Map.of("bootstrap.servers", bootstrap, "state.dir", stateDir.toString(), "commit.interval.ms", "100"));

        PlantValues plant = new PlantValues(21, 4);
        List<Measurement> firstHalf = new ArrayList<>(plant.lot("L1", 80, 1.0));
        firstHalf.addAll(plant.lot("L2", 80, 0.96));
        List<Measurement> secondHalf = new ArrayList<>(plant.lot("L3", 120, 1.0, "st-03", new PlantValues.Fault(0, 0, 3)));
        DriftEngine reference = new DriftEngine(PlantValues.settings());
        List<Alert> expectedFirst = new ArrayList<>();
        firstHalf.forEach(m -> expectedFirst.addAll(reference.accept(m)));
        List<Alert> expected = new ArrayList<>(expectedFirst);
        secondHalf.forEach(m -> expected.addAll(reference.accept(m)));

        try (KafkaProducer<byte[], byte[]> producer = new KafkaProducer<>(Map.of(ProducerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap,
                ProducerConfig.ACKS_CONFIG, "all"), new ByteArraySerializer(), new ByteArraySerializer())) {
            StreamService first = StreamService.start(settings, ProductCatalogue.demoPlant(), PlantValues.settings());
            assertThat(first.awaitRunning(WAIT)).isTrue();
            publish(producer, topics.results(), firstHalf);
            TopicReader.read(bootstrap, topics.alerts(), expectedFirst.size(), WAIT);
            first.close(Duration.ofSeconds(30));

            StreamService second = StreamService.start(settings, ProductCatalogue.demoPlant(), PlantValues.settings());
            try {
                assertThat(second.awaitRunning(WAIT)).isTrue();
                publish(producer, topics.results(), secondHalf);
                TopicReader.read(bootstrap, topics.alerts(), expected.size(), WAIT);
                Thread.sleep(2000);
            } finally {
                second.close(Duration.ofSeconds(30));
            }
        }

        List<TopicReader.Message> alerts = TopicReader.readAll(bootstrap, topics.alerts(), WAIT);
        assertThat(alerts.stream().map(m -> m.key() + "#" + m.value().get("revision").asInt() + "#" + m.value().get("status").asText()))
                .containsExactlyInAnyOrderElementsOf(expected.stream().map(a -> a.key() + "#" + a.revision() + "#" + a.status().code()).toList());
        List<JsonNode> episodes = alerts.stream().map(TopicReader.Message::value)
                .filter(v -> v.get("status").asText().equals("raised") && v.get("revision").asInt() == 1).toList();
        assertThat(episodes.stream().filter(v -> v.get("kind").asText().equals("lot")).map(v -> v.get("subject").asText()))
                .containsExactly("L2");
        assertThat(episodes.stream().filter(v -> v.get("kind").asText().equals("station")).map(v -> v.get("subject").asText()))
                .containsExactly("st-03");
        assertThat(alerts).allSatisfy(m -> assertThat(m.key()).isEqualTo(m.value().get("key").asText()));
        assertThat(expected).anyMatch(a -> a.status() == AlertStatus.RAISED);
    }

    static void publish(KafkaProducer<byte[], byte[]> producer, String topic, List<Measurement> units) throws Exception {
        for (Measurement m : units) {
            ObjectNode r = MAPPER.createObjectNode();
            r.put("sweepId", m.unit());
            r.put("stationId", m.station());
            r.put("product", m.product());
            r.put("lot", m.lot());
            r.put("unit", m.unit());
            r.put("measuredAt", Instant.ofEpochMilli(m.measuredAt()).toString());
            r.put("f0Hz", m.f0Hz());
            r.put("qUnloaded", m.qUnloaded());
            r.put("resonanceDb", -m.levelDb());
            r.put("topology", "transmission");
            r.putArray("flags");
            producer.send(new ProducerRecord<>(topic, m.lot().getBytes(StandardCharsets.UTF_8), MAPPER.writeValueAsBytes(r)));
        }
        producer.flush();
    }
}
