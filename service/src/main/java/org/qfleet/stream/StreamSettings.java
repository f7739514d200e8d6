package org.qfleet.stream;

import java.util.Map;
import java.util.Objects;
import java.util.Properties;
import org.apache.kafka.clients.consumer.ConsumerConfig;
import org.apache.kafka.clients.producer.ProducerConfig;
import org.apache.kafka.common.serialization.Serdes;
import org.apache.kafka.streams.StreamsConfig;
import org.apache.kafka.streams.errors.LogAndContinueExceptionHandler;
import org.qfleet.sweep.SweepLimits;

/**
 * Everything the streaming service is told.
 *
 * @param topics                the four topics
 * @param applicationId         Kafka Streams application id: instances with the same id share the work
 * @param threads               stream threads in this instance
 * @param limits                bounds on the points of a sweep
 * @param maxSweepBytes         larger messages are rejected as oversized without being decoded
 * @param maxRejectPayloadBytes most bytes of a bad message copied into its reject
 * @param kafka                 Kafka client and Streams settings, passed through as they are
 *                              ({@code bootstrap.servers}, {@code security.protocol}, ...); they
 *                              win over the service's own defaults
 */
public record StreamSettings(
        Topics topics,
        String applicationId,
        int threads,
        SweepLimits limits,
        int maxSweepBytes,
        int maxRejectPayloadBytes,
        Map<String, String> kafka) {

    public static final String DEFAULT_APPLICATION_ID = "qfleet";
    public static final int DEFAULT_THREADS = 2;
    /** A 100 001-point sweep with three complex traces as text is about 10 MB. */
    public static final int DEFAULT_MAX_SWEEP_BYTES = 16 * 1024 * 1024;
    public static final int DEFAULT_MAX_REJECT_PAYLOAD_BYTES = 64 * 1024;
    /**
     * Producer batches of up to 256 KiB: drift state records (a lot's units as JSON) reach tens of
     * kilobytes, more than the client's default of 16 KiB, which would send each alone.
     */
    static final int PRODUCER_BATCH_BYTES = 256 * 1024;
    /** Up to 4 MiB per partition and fetch: about 80 sweep messages of 401 points instead of 20. */
    static final int FETCH_PARTITION_BYTES = 4 * 1024 * 1024;
    /**
     * A transaction every 100 ms per stream thread, Kafka Streams' own default under exactly-once:
     * results become visible only when their transaction commits, so this interval sets the
     * latency floor. Measured with {@code bench} on 2 quiet cores (broker in the same JVM), first
     * cold: 100 ms gave p99 175 ms at 200 sweeps/s and 946 sweeps/s saturated, 250 ms p99 287 ms and
     * 1104 sweeps/s; later, warmed up and with the faster fit and decoder, 100 ms gave p99 127-135 ms
     * and 3500-4400 sweeps/s, and 200 ms about a fifth more throughput (one run). Raise it
     * ({@code --kafka commit.interval.ms=250}) where throughput matters more than latency.
     */
    static final int COMMIT_INTERVAL_MS = 100;

    /**
     * How long the group waits for a member that stopped heartbeating (Kafka's default is 45 s):
     * after a crash or kill -9 the restarted instance gets its partitions back only once the dead
     * member is dropped, so 15 s (heartbeats every 5 s, a third of it, as Kafka requires) brings a
     * restarted service back within about 20 s. Heartbeats come from their own thread, so a busy
     * stream thread does not miss them.
     */
    static final int SESSION_TIMEOUT_MS = 15_000;
    static final int HEARTBEAT_INTERVAL_MS = 5_000;

    /** Settings read by the exception handlers from the Streams configuration. */
    static final String REJECTS_TOPIC_CONFIG = "qfleet.rejects.topic";
    static final String REJECT_PAYLOAD_CONFIG = "qfleet.rejects.payload.max.bytes";

    public StreamSettings {
        Objects.requireNonNull(topics, "topics");
        Objects.requireNonNull(limits, "limits");
        if (applicationId == null || applicationId.isBlank()) {
            throw new IllegalArgumentException("the application id is blank");
        }
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, got " + threads);
        }
        if (maxSweepBytes < 1) {
            throw new IllegalArgumentException("the largest sweep message must be at least 1 byte, got " + maxSweepBytes);
        }
        if (maxRejectPayloadBytes < 0) {
            throw new IllegalArgumentException("the reject payload bound must not be negative, got " + maxRejectPayloadBytes);
        }
        kafka = Map.copyOf(kafka);
    }

    /** The defaults, connecting to {@code bootstrapServers}. */
    public static StreamSettings defaults(String bootstrapServers) {
        return new StreamSettings(Topics.DEFAULT, DEFAULT_APPLICATION_ID, DEFAULT_THREADS, SweepLimits.DEFAULT,
                DEFAULT_MAX_SWEEP_BYTES, DEFAULT_MAX_REJECT_PAYLOAD_BYTES,
                Map.of(StreamsConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrapServers));
    }

    public String bootstrapServers() {
        return kafka.get(StreamsConfig.BOOTSTRAP_SERVERS_CONFIG);
    }

    public StreamSettings withKafka(Map<String, String> newKafka) {
        return new StreamSettings(topics, applicationId, threads, limits, maxSweepBytes, maxRejectPayloadBytes, newKafka);
    }

    public StreamSettings withTopics(Topics newTopics) {
        return new StreamSettings(newTopics, applicationId, threads, limits, maxSweepBytes, maxRejectPayloadBytes, kafka);
    }

    public StreamSettings withApplicationId(String id) {
        return new StreamSettings(topics, id, threads, limits, maxSweepBytes, maxRejectPayloadBytes, kafka);
    }

    public StreamSettings withLimits(SweepLimits newLimits) {
        return new StreamSettings(topics, applicationId, threads, newLimits, maxSweepBytes, maxRejectPayloadBytes, kafka);
    }

    /**
     * The Kafka Streams configuration: exactly-once (v2), byte-array serdes, reading from the
     * earliest offset when the application id is new, bad records turned into rejects, a commit
     * (transaction) every 100 ms, a 15 s session timeout, lz4 compression and larger batches and fetches for the producers
     * and consumers of every topic (results, rejects, alerts, repartition and changelog topics:
     * JSON compresses several times); then the pass-through settings, which override any of these.
     */
    public Properties streamsProperties() {
        Properties p = new Properties();
        p.put(StreamsConfig.APPLICATION_ID_CONFIG, applicationId);
        p.put(StreamsConfig.PROCESSING_GUARANTEE_CONFIG, StreamsConfig.EXACTLY_ONCE_V2);
        p.put(StreamsConfig.NUM_STREAM_THREADS_CONFIG, Integer.toString(threads));
        p.put(StreamsConfig.COMMIT_INTERVAL_MS_CONFIG, Integer.toString(COMMIT_INTERVAL_MS));
        p.put(StreamsConfig.DEFAULT_KEY_SERDE_CLASS_CONFIG, Serdes.ByteArraySerde.class.getName());
        p.put(StreamsConfig.DEFAULT_VALUE_SERDE_CLASS_CONFIG, Serdes.ByteArraySerde.class.getName());
        p.put(StreamsConfig.consumerPrefix(ConsumerConfig.AUTO_OFFSET_RESET_CONFIG), "earliest");
        p.put(StreamsConfig.consumerPrefix(ConsumerConfig.SESSION_TIMEOUT_MS_CONFIG), Integer.toString(SESSION_TIMEOUT_MS));
        p.put(StreamsConfig.consumerPrefix(ConsumerConfig.HEARTBEAT_INTERVAL_MS_CONFIG), Integer.toString(HEARTBEAT_INTERVAL_MS));
        p.put(StreamsConfig.consumerPrefix(ConsumerConfig.MAX_PARTITION_FETCH_BYTES_CONFIG), Integer.toString(FETCH_PARTITION_BYTES));
        p.put(StreamsConfig.producerPrefix(ProducerConfig.COMPRESSION_TYPE_CONFIG), "lz4");
        p.put(StreamsConfig.producerPrefix(ProducerConfig.BATCH_SIZE_CONFIG), Integer.toString(PRODUCER_BATCH_BYTES));
        p.put(StreamsConfig.DESERIALIZATION_EXCEPTION_HANDLER_CLASS_CONFIG, LogAndContinueExceptionHandler.class.getName());
        p.put(StreamsConfig.PRODUCTION_EXCEPTION_HANDLER_CLASS_CONFIG, OversizedResultHandler.class.getName());
        p.put(StreamsConfig.PROCESSING_EXCEPTION_HANDLER_CLASS_CONFIG, UnexpectedFailureHandler.class.getName());
        p.put(StreamsConfig.PROCESSING_EXCEPTION_HANDLER_GLOBAL_ENABLED_CONFIG, "true");
        p.put(REJECTS_TOPIC_CONFIG, topics.rejects());
        p.put(REJECT_PAYLOAD_CONFIG, Integer.toString(maxRejectPayloadBytes));
        p.putAll(kafka);
        return p;
    }

    /** Settings for an admin or plain client: the pass-through settings that are not Streams' own. */
    public Map<String, Object> clientProperties() {
        return Map.copyOf(kafka);
    }
}
