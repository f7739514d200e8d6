package org.qfleet.stream;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import org.apache.kafka.clients.producer.KafkaProducer;
import org.apache.kafka.clients.producer.ProducerConfig;
import org.apache.kafka.common.serialization.ByteArraySerializer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.qfleet.drift.Alert;
import org.qfleet.drift.Baseline;
import org.qfleet.drift.DriftEngine;
import org.qfleet.drift.DriftSettings;
import org.qfleet.drift.Measurement;
import org.qfleet.drift.PlantValues;

/**
 * The drift monitors' state survives a {@code kill -9}: a separate service JVM, with the product's
 * baseline configured in its catalogue, is killed while a scenario (a low lot, then a faulty
 * station) is being processed and started again on the same state folder; the alerts read with
 * read_committed must be exactly those of an uninterrupted in-memory {@link DriftEngine} run over
 * the same units, each message once.
 */
class DriftCrashTest {

    private static final Duration WAIT = Duration.ofSeconds(120);

    @TempDir
    Path dir;

    @Test
    void theAlertsAfterAKillAndARestartAreThoseOfAnUninterruptedRun() throws Exception {
        String bootstrap = TestBroker.get().bootstrapServers();
        Topics topics = TestBroker.freshTopics(1);
        Path catalogue = dir.resolve("products.json");
        Files.writeString(catalogue, String.format(java.util.Locale.ROOT,
                "{\"products\":[{\"product\":\"%s\",\"qUnloadedMin\":%s,\"baseline\":{\"quMean\":%s,\"quSigma\":%s,"
                        + "\"f0MeanHz\":%s,\"f0SigmaHz\":%s,\"insertionLossMeanDb\":%s,\"insertionLossSigmaDb\":%s}}]}",
                PlantValues.PRODUCT, PlantValues.LOT_LIMIT, PlantValues.QU, PlantValues.QU_SIGMA, PlantValues.F0,
                PlantValues.F0_SIGMA, PlantValues.LEVEL, PlantValues.LEVEL_SIGMA), StandardCharsets.UTF_8);
        String[] args = {"--bootstrap-servers", bootstrap, "--application-id", "drift-crash-" + UUID.randomUUID(),
            "--sweeps-topic", topics.sweeps(), "--results-topic", topics.results(), "--rejects-topic", topics.rejects(),
            "--alerts-topic", topics.alerts(), "--products", catalogue.toString(), "--data-dir", dir.resolve("data").toString(),
            "--kafka", "session.timeout.ms=6000", "--kafka", "heartbeat.interval.ms=1000", "--kafka", "commit.interval.ms=100"};

        PlantValues plant = new PlantValues(31, 4);
        List<Measurement> units = new ArrayList<>(plant.lot("L1", 100, 1.0));
        units.addAll(plant.lot("L2", 100, 0.96));
        units.addAll(plant.lot("L3", 200, 1.0, "st-02", new PlantValues.Fault(0, 0, 4 * PlantValues.LEVEL_SIGMA)));
        units.addAll(plant.lot("L4", 120, 1.0));
        Baseline configured = new Baseline(PlantValues.PRODUCT, PlantValues.QU, PlantValues.QU_SIGMA, PlantValues.F0,
                PlantValues.F0_SIGMA, PlantValues.LEVEL, PlantValues.LEVEL_SIGMA, Double.NaN, Baseline.CONFIGURED, 0);
        DriftEngine reference = new DriftEngine(DriftSettings.DEFAULT.withBaselines(Map.of(PlantValues.PRODUCT, configured))
                .withLotLimits(Map.of(PlantValues.PRODUCT, PlantValues.LOT_LIMIT)));
        List<String> expected = new ArrayList<>();
        units.forEach(m -> reference.accept(m).forEach(a -> expected.add(id(a))));
        assertThat(expected).anyMatch(k -> k.startsWith("lot/")).anyMatch(k -> k.startsWith("station/"));

        try (KafkaProducer<byte[], byte[]> producer = new KafkaProducer<>(Map.of(ProducerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap,
                ProducerConfig.ACKS_CONFIG, "all"), new ByteArraySerializer(), new ByteArraySerializer())) {
            try (ServiceProcess first = ServiceProcess.start(dir.resolve("first.log"), args)) {
                first.awaitReady(WAIT);
                // the low lot and the first units of the faulty station: once the lot's alert is out, kill the service
                // while it holds open lots and a station chart on its way up, then send the rest while it is down
                DriftStreamTest.publish(producer, topics.results(), units.subList(0, 260));
                TopicReader.read(bootstrap, topics.alerts(), 1, WAIT);
                first.kill();
            }
            DriftStreamTest.publish(producer, topics.results(), units.subList(260, units.size()));
            try (ServiceProcess second = ServiceProcess.start(dir.resolve("second.log"), args)) {
                second.awaitReady(WAIT);
                TopicReader.read(bootstrap, topics.alerts(), expected.size(), WAIT);
                Thread.sleep(2000);
                assertThat(second.stop(Duration.ofSeconds(30))).as(second.output()).isIn(0, 143);
            }
        }
        List<String> alerts = TopicReader.readAll(bootstrap, topics.alerts(), WAIT).stream()
                .map(m -> m.key() + "#" + m.value().get("revision").asInt() + "#" + m.value().get("status").asText()).toList();
        assertThat(alerts).containsExactlyInAnyOrderElementsOf(expected);
    }

    private static String id(Alert a) {
        return a.key() + "#" + a.revision() + "#" + a.status().code();
    }
}
