package org.qfleet.stream;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.networknt.schema.JsonSchema;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Base64;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import java.util.concurrent.Future;
import org.apache.kafka.clients.producer.KafkaProducer;
import org.apache.kafka.clients.producer.ProducerConfig;
import org.apache.kafka.clients.producer.ProducerRecord;
import org.apache.kafka.clients.producer.RecordMetadata;
import org.apache.kafka.common.serialization.ByteArraySerializer;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.qfleet.codec.ResultJson;
import org.qfleet.fit.ResonanceAnalyzer;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.schema.Schemas;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepJsonReader;
import org.qfleet.sweep.SweepLimits;
import org.qfleet.verdict.ProductCatalogue;

/**
 * The topology against a real broker in this JVM: sweeps in every trace form give results equal to
 * the offline fit of the same bytes, read back with {@code read_committed}; bad messages mixed in
 * each give one reject with the right reason and coordinates while the good ones around them go on.
 */
class SweepStreamTest {

    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final SweepLimits LIMITS = new SweepLimits(7, 2001);
    private static final int MAX_SWEEP_BYTES = 500_000;
    private static final int MAX_REJECT_PAYLOAD = 64 * 1024;
    private static final Duration WAIT = Duration.ofSeconds(60);

    private static String bootstrap;
    private static Topics topics;
    private static StreamService service;
    private static KafkaProducer<byte[], byte[]> producer;

    @BeforeAll
    static void start() throws Exception {
        bootstrap = TestBroker.get().bootstrapServers();
        topics = TestBroker.freshTopics(3);
        StreamSettings settings = new StreamSettings(topics, "test-" + UUID.randomUUID(), 2, LIMITS, MAX_SWEEP_BYTES,
                MAX_REJECT_PAYLOAD, Map.of("bootstrap.servers", bootstrap));
        service = StreamService.start(settings, ProductCatalogue.demoPlant());
        assertThat(service.awaitRunning(WAIT)).as("the topology is running").isTrue();
        producer = new KafkaProducer<>(Map.of(ProducerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap,
                ProducerConfig.ACKS_CONFIG, "all", ProducerConfig.LINGER_MS_CONFIG, "5"),
                new ByteArraySerializer(), new ByteArraySerializer());
    }

    @AfterAll
    static void stop() {
        if (producer != null) {
            producer.close();
        }
        if (service != null) {
            service.close(Duration.ofSeconds(20));
        }
    }

    @Test
    void everySweepGivesTheResultOfTheOfflineFitOfTheSameBytes() throws Exception {
        List<StreamSweeps.Message> sweeps = StreamSweeps.mixed(200, 3, "good-" + UUID.randomUUID());
        for (StreamSweeps.Message m : sweeps) {
            producer.send(new ProducerRecord<>(topics.sweeps(), bytes(m.key()), m.value()));
        }
        producer.flush();

        Map<String, TopicReader.Message> results = resultsOf(sweeps);

        assertThat(results).hasSize(sweeps.size());
        ResonanceAnalyzer analyzer = new ResonanceAnalyzer();
        ResultJson json = new ResultJson();
        ProductCatalogue catalogue = ProductCatalogue.demoPlant();
        JsonSchema resultSchema = Schemas.load("result-message.schema.json");
        Map<String, Integer> verdicts = new HashMap<>();
        for (StreamSweeps.Message m : sweeps) {
            Sweep offline = new SweepJsonReader(LIMITS).read("offline", m.value());
            ResonanceResult expected = analyzer.analyze(offline);
            TopicReader.Message actual = results.get(m.sweepId());
            assertThat(actual.key()).isEqualTo(m.key());
            ObjectNode value = (ObjectNode) actual.value().deepCopy();
            String source = value.remove("source").asText();
            JsonNode verdict = value.remove("verdict");
            ObjectNode offlineLine = (ObjectNode) MAPPER.readTree(json.resultLine(offline, expected));
            offlineLine.remove("source");
            assertThat(value).as("result of %s", m.sweepId()).isEqualTo(offlineLine);
            assertThat(Schemas.errors(resultSchema, actual.value().toString())).as("schema errors").isEmpty();
            assertThat(source).matches(java.util.regex.Pattern.quote(topics.sweeps()) + "/\\d+@\\d+");
            String status = catalogue.judge(offline.info().product(), offline.topology(), expected).status().code();
            assertThat(verdict.get("status").asText()).isEqualTo(status);
            verdicts.merge(status, 1, Integer::sum);
        }
        assertThat(verdicts).containsKeys("pass", "unknown-product");
    }

    @Test
    void badMessagesBecomeOneRejectEachAndTheGoodOnesAroundThemGoOn() throws Exception {
        String run = UUID.randomUUID().toString().substring(0, 8);
        String valid = StreamSweeps.validText("bad-" + run);
        List<Bad> bad = List.of(
                new Bad("invalid-json", null, "{\"sweepId\": \"oops".getBytes(StandardCharsets.UTF_8)),
                new Bad("invalid-json", "nan-" + run, with(valid, "nan-" + run).replaceFirst("\"frequencyHz\":\\[[^,]*,",
                        "\"frequencyHz\":[NaN,").getBytes(StandardCharsets.UTF_8)),
                new Bad("missing-field", "nostation-" + run, with(valid, "nostation-" + run)
                        .replaceFirst("\"stationId\":\"[^\"]*\",", "").getBytes(StandardCharsets.UTF_8)),
                new Bad("unknown-topology", "sideways-" + run, with(valid, "sideways-" + run)
                        .replace("\"topology\":\"transmission\"", "\"topology\":\"sideways\"").getBytes(StandardCharsets.UTF_8)),
                new Bad("too-many-points", "long-" + run, StreamSweeps.longSweep("long-" + run, LIMITS.maxPoints() + 100)),
                new Bad("oversized", null, padded(valid, MAX_SWEEP_BYTES + 5000)),
                new Bad("invalid-json", null, null));
        List<StreamSweeps.Message> good = StreamSweeps.mixed(bad.size() + 1, 5, "around-" + run);

        List<Future<RecordMetadata>> badSent = new ArrayList<>();
        for (int i = 0; i < bad.size(); i++) {
            send(good.get(i));
            badSent.add(producer.send(new ProducerRecord<>(topics.sweeps(), bytes("LOT-BAD"), bad.get(i).value())));
        }
        send(good.get(bad.size()));
        producer.flush();

        List<TopicReader.Message> rejects = TopicReader.read(bootstrap, topics.rejects(), bad.size(), WAIT);
        JsonSchema rejectSchema = Schemas.load("reject.schema.json");
        Map<Long, JsonNode> byOffset = new HashMap<>();
        for (TopicReader.Message r : rejects) {
            byOffset.put(r.value().get("offset").asLong() * 10 + r.value().get("partition").asInt(), r.value());
        }
        for (int i = 0; i < bad.size(); i++) {
            RecordMetadata at = badSent.get(i).get();
            JsonNode reject = byOffset.get(at.offset() * 10 + at.partition());
            Bad b = bad.get(i);
            assertThat(reject).as("reject of bad message %d (%s)", i, b.code()).isNotNull();
            assertThat(reject.get("code").asText()).isEqualTo(b.code());
            assertThat(Schemas.errors(rejectSchema, reject.toString())).as("schema errors").isEmpty();
            assertThat(reject.get("error").asText()).isNotBlank();
            assertThat(reject.get("topic").asText()).isEqualTo(topics.sweeps());
            assertThat(reject.get("key").asText()).isEqualTo("LOT-BAD");
            if (b.sweepId() == null) {
                assertThat(reject.has("sweepId")).isFalse();
            } else {
                assertThat(reject.get("sweepId").asText()).isEqualTo(b.sweepId());
            }
            if (b.value() == null) {
                assertThat(reject.get("payloadBase64").isNull()).isTrue();
            } else {
                byte[] kept = Base64.getDecoder().decode(reject.get("payloadBase64").asText());
                int expectedLength = Math.min(b.value().length, MAX_REJECT_PAYLOAD);
                assertThat(kept).isEqualTo(java.util.Arrays.copyOf(b.value(), expectedLength));
                assertThat(reject.get("payloadBytes").asInt()).isEqualTo(b.value().length);
                assertThat(reject.get("payloadTruncated").asBoolean()).isEqualTo(b.value().length > MAX_REJECT_PAYLOAD);
            }
        }
        assertThat(rejects).hasSize(bad.size());

        assertThat(resultsOf(good)).hasSize(good.size());
    }

    private record Bad(String code, String sweepId, byte[] value) {
    }

    private static void send(StreamSweeps.Message m) {
        producer.send(new ProducerRecord<>(topics.sweeps(), bytes(m.key()), m.value()));
    }

    private static String with(String message, String sweepId) {
        return message.replaceFirst("\"sweepId\":\"[^\"]*\"", "\"sweepId\":\"" + sweepId + "\"");
    }

    /** A valid message made larger than {@code size} bytes by an unknown field, which readers skip. */
    private static byte[] padded(String message, int size) {
        return ("{\"note\":\"" + "x".repeat(size) + "\"," + message.substring(1)).getBytes(StandardCharsets.UTF_8);
    }

    private static byte[] bytes(String text) {
        return text.getBytes(StandardCharsets.UTF_8);
    }

    /** The results of the sweeps sent, by sweep id, once all have come; fails on a duplicate. */
    private static Map<String, TopicReader.Message> resultsOf(List<StreamSweeps.Message> sent) {
        java.util.Set<String> ids = new java.util.HashSet<>();
        sent.forEach(m -> ids.add(m.sweepId()));
        List<TopicReader.Message> read = TopicReader.readUntil(bootstrap, topics.results(),
                messages -> messages.stream().filter(m -> ids.contains(m.value().get("sweepId").asText())).count() >= ids.size(),
                WAIT, "a result for each of " + ids.size() + " sweeps");
        Map<String, TopicReader.Message> byId = new HashMap<>();
        for (TopicReader.Message m : read) {
            String id = m.value().get("sweepId").asText();
            if (ids.contains(id)) {
                assertThat(byId.put(id, m)).as("one result per sweep, %s", id).isNull();
            }
        }
        return byId;
    }
}
