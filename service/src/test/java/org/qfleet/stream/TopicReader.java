package org.qfleet.stream;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import java.util.function.Predicate;
import org.apache.kafka.clients.consumer.ConsumerConfig;
import org.apache.kafka.clients.consumer.ConsumerRecord;
import org.apache.kafka.clients.consumer.KafkaConsumer;
import org.apache.kafka.common.serialization.ByteArrayDeserializer;

/** Reads a topic from the start with {@code read_committed}, as an independent consumer would. */
final class TopicReader {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    private TopicReader() {
    }

    /** A committed record as read back: its coordinates and its value as JSON. */
    record Message(String key, int partition, long offset, long timestamp, JsonNode value) {
    }

    /** Reads until at least {@code count} records have come, or fails after {@code timeout}. */
    static List<Message> read(String bootstrap, String topic, int count, Duration timeout) {
        return readUntil(bootstrap, topic, m -> m.size() >= count, timeout, "at least " + count + " records");
    }

    /** Reads until {@code enough} holds for what was read, or fails after {@code timeout}. */
    static List<Message> readUntil(String bootstrap, String topic, Predicate<List<Message>> enough, Duration timeout,
            String expectation) {
        List<Message> messages = new ArrayList<>();
        try (KafkaConsumer<byte[], byte[]> consumer = new KafkaConsumer<>(Map.of(
                ConsumerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap,
                ConsumerConfig.GROUP_ID_CONFIG, "reader-" + UUID.randomUUID(),
                ConsumerConfig.AUTO_OFFSET_RESET_CONFIG, "earliest",
                ConsumerConfig.ISOLATION_LEVEL_CONFIG, "read_committed",
                ConsumerConfig.ENABLE_AUTO_COMMIT_CONFIG, "false"),
                new ByteArrayDeserializer(), new ByteArrayDeserializer())) {
            consumer.subscribe(List.of(topic));
            long deadline = System.nanoTime() + timeout.toNanos();
            while (!enough.test(messages) && System.nanoTime() < deadline) {
                for (ConsumerRecord<byte[], byte[]> r : consumer.poll(Duration.ofMillis(200))) {
                    messages.add(new Message(r.key() == null ? null : new String(r.key(), java.nio.charset.StandardCharsets.UTF_8),
                            r.partition(), r.offset(), r.timestamp(), json(r.value())));
                }
            }
        }
        if (!enough.test(messages)) {
            throw new AssertionError("read " + messages.size() + " records from " + topic + " within " + timeout
                    + ", expected " + expectation);
        }
        return messages;
    }

    /** Every committed record of the topic, up to its end as it is when called. */
    static List<Message> readAll(String bootstrap, String topic, Duration timeout) {
        List<Message> messages = new ArrayList<>();
        try (KafkaConsumer<byte[], byte[]> consumer = new KafkaConsumer<>(Map.of(
                ConsumerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap,
                ConsumerConfig.ISOLATION_LEVEL_CONFIG, "read_committed",
                ConsumerConfig.ENABLE_AUTO_COMMIT_CONFIG, "false"),
                new ByteArrayDeserializer(), new ByteArrayDeserializer())) {
            List<org.apache.kafka.common.TopicPartition> partitions = consumer.partitionsFor(topic).stream()
                    .map(p -> new org.apache.kafka.common.TopicPartition(topic, p.partition())).toList();
            consumer.assign(partitions);
            consumer.seekToBeginning(partitions);
            Map<org.apache.kafka.common.TopicPartition, Long> end = consumer.endOffsets(partitions);
            long deadline = System.nanoTime() + timeout.toNanos();
            while (partitions.stream().anyMatch(p -> consumer.position(p) < end.get(p))) {
                if (System.nanoTime() > deadline) {
                    throw new AssertionError("could not read " + topic + " to its end within " + timeout);
                }
                for (ConsumerRecord<byte[], byte[]> r : consumer.poll(Duration.ofMillis(200))) {
                    messages.add(new Message(r.key() == null ? null : new String(r.key(), java.nio.charset.StandardCharsets.UTF_8),
                            r.partition(), r.offset(), r.timestamp(), json(r.value())));
                }
            }
        }
        return messages;
    }

    private static JsonNode json(byte[] value) {
        try {
            return MAPPER.readTree(value);
        } catch (IOException e) {
            throw new UncheckedIOException("a record that is not JSON", e);
        }
    }
}
