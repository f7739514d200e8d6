package org.qfleet.app;

import java.time.Duration;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.BooleanSupplier;
import org.apache.kafka.clients.consumer.ConsumerConfig;
import org.apache.kafka.clients.consumer.ConsumerRecord;
import org.apache.kafka.clients.consumer.ConsumerRecords;
import org.apache.kafka.clients.consumer.KafkaConsumer;
import org.apache.kafka.common.TopicPartition;
import org.apache.kafka.common.serialization.ByteArrayDeserializer;
import org.qfleet.sweep.InvalidSweepException;
import org.qfleet.sweep.SweepJsonReader;
import org.qfleet.sweep.SweepLimits;

/**
 * The raw ceiling of {@code bench}: one plain consumer ({@code read_committed}) that reads the
 * sweeps topic from its start and decodes every message with the service's own reader, and does
 * nothing else. What the service can at best approach on the same machine.
 */
final class RawCeiling {

    private final Map<String, Object> kafka;
    private final String topic;
    private final SweepLimits limits;
    private final AtomicLong read = new AtomicLong();

    RawCeiling(Map<String, Object> kafka, String topic, SweepLimits limits) {
        this.kafka = kafka;
        this.topic = topic;
        this.limits = limits;
    }

    /** Messages read so far, for progress lines. */
    long read() {
        return read.get();
    }

    /**
     * Reads until {@code expected} messages have come, nothing has come for {@code stallTimeout},
     * or {@code stop} says so.
     */
    Result run(long expected, Duration stallTimeout, BooleanSupplier stop) {
        Map<String, Object> config = new HashMap<>(kafka);
        config.put(ConsumerConfig.ISOLATION_LEVEL_CONFIG, "read_committed");
        config.put(ConsumerConfig.ENABLE_AUTO_COMMIT_CONFIG, "false");
        SweepJsonReader reader = new SweepJsonReader(limits);
        long failures = 0;
        long count = 0;
        long firstNanos = -1;
        long firstBatch = 0;
        long lastNanos = -1;
        long startNanos;
        try (KafkaConsumer<byte[], byte[]> consumer = new KafkaConsumer<>(config, new ByteArrayDeserializer(), new ByteArrayDeserializer())) {
            List<TopicPartition> partitions = new ArrayList<>();
            consumer.partitionsFor(topic).forEach(p -> partitions.add(new TopicPartition(topic, p.partition())));
            consumer.assign(partitions);
            consumer.seekToBeginning(partitions);
            startNanos = System.nanoTime();
            long lastProgress = startNanos;
            while (count < expected && !stop.getAsBoolean() && System.nanoTime() - lastProgress < stallTimeout.toNanos()) {
                ConsumerRecords<byte[], byte[]> records = consumer.poll(Duration.ofMillis(200));
                if (records.isEmpty()) {
                    continue;
                }
                for (ConsumerRecord<byte[], byte[]> r : records) {
                    try {
                        reader.read(r.topic() + "/" + r.partition() + "@" + r.offset(), r.value());
                    } catch (InvalidSweepException e) {
                        failures++;
                    }
                }
                count += records.count();
                read.set(count);
                lastProgress = System.nanoTime();
                if (firstNanos < 0) {
                    firstNanos = lastProgress;
                    firstBatch = records.count();
                }
                lastNanos = lastProgress;
            }
        }
        return new Result(count, failures, startNanos, firstNanos, firstBatch, lastNanos);
    }

    /**
     * @param read           messages read
     * @param decodeFailures messages the reader refused
     * @param startNanos     when reading began; the others are when a batch had been decoded
     */
    record Result(long read, long decodeFailures, long startNanos, long firstNanos, long firstBatch, long lastNanos) {
    }
}
