package org.qfleet.app;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.time.Duration;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicLongArray;
import org.apache.kafka.clients.consumer.ConsumerConfig;
import org.apache.kafka.clients.consumer.ConsumerRecord;
import org.apache.kafka.clients.consumer.KafkaConsumer;
import org.apache.kafka.common.TopicPartition;
import org.apache.kafka.common.errors.WakeupException;
import org.apache.kafka.common.serialization.ByteArrayDeserializer;

/**
 * Reads the results and rejects topics of a {@code bench} run from their start as an outside
 * client would ({@code read_committed}), and accounts for every published sweep by its id: when
 * it became visible, whether it came twice, and, for sweeps whose send time is known, the
 * end-to-end latency from send to visible.
 */
final class BenchResultWatcher implements Runnable, AutoCloseable {

    private static final JsonFactory JSON = new JsonFactory();

    private final KafkaConsumer<byte[], byte[]> consumer;
    private final String rejectsTopic;
    private final BenchSweeps sweeps;
    private final BitSet seen = new BitSet();
    private final AtomicLongArray sendNanos;
    private final LatencyRecorder latencyMicros = new LatencyRecorder();
    private long results;
    private long rejects;
    private long duplicates;
    private long foreign;
    private long firstNanos = -1;
    private long firstBatch;
    private long lastNanos = -1;
    private long lateAfterNanos = Long.MAX_VALUE;
    private long late;

    /** @param capacity how many sweeps the run publishes in all */
    BenchResultWatcher(Map<String, Object> kafka, String resultsTopic, String rejectsTopic, BenchSweeps sweeps, int capacity) {
        Map<String, Object> config = new HashMap<>(kafka);
        config.put(ConsumerConfig.ISOLATION_LEVEL_CONFIG, "read_committed");
        config.put(ConsumerConfig.ENABLE_AUTO_COMMIT_CONFIG, "false");
        // Returns as soon as a commit makes results visible, and at least every 50 ms when idle.
        config.put(ConsumerConfig.FETCH_MAX_WAIT_MS_CONFIG, "50");
        this.consumer = new KafkaConsumer<>(config, new ByteArrayDeserializer(), new ByteArrayDeserializer());
        this.rejectsTopic = rejectsTopic;
        this.sweeps = sweeps;
        this.sendNanos = new AtomicLongArray(capacity);
        List<TopicPartition> partitions = new ArrayList<>();
        for (String topic : List.of(resultsTopic, rejectsTopic)) {
            consumer.partitionsFor(topic).forEach(p -> partitions.add(new TopicPartition(topic, p.partition())));
        }
        consumer.assign(partitions);
        consumer.seekToBeginning(partitions);
    }

    /** Notes that the sweep with this sequence number is being sent now; its latency will be recorded. */
    void sending(long sequence) {
        sendNanos.set((int) sequence, System.nanoTime());
    }

    /** Results later than this (from send to visible) count as late. */
    synchronized void lateAfter(Duration bound) {
        lateAfterNanos = bound.toNanos();
    }

    @Override
    public void run() {
        try {
            while (!Thread.currentThread().isInterrupted()) {
                List<ConsumerRecord<byte[], byte[]>> batch = new ArrayList<>();
                consumer.poll(Duration.ofMillis(200)).forEach(batch::add);
                long now = System.nanoTime();
                if (!batch.isEmpty()) {
                    account(batch, now);
                }
            }
        } catch (WakeupException e) {
            // Closing.
        } finally {
            consumer.close(Duration.ofSeconds(5));
        }
    }

    private synchronized void account(List<ConsumerRecord<byte[], byte[]>> batch, long now) {
        long before = results + rejects;
        for (ConsumerRecord<byte[], byte[]> r : batch) {
            long sequence = sweeps.sequenceOf(sweepId(r.value()));
            if (sequence < 0 || sequence >= sendNanos.length()) {
                foreign++;
                continue;
            }
            int n = (int) sequence;
            if (seen.get(n)) {
                duplicates++;
                continue;
            }
            seen.set(n);
            if (r.topic().equals(rejectsTopic)) {
                rejects++;
            } else {
                results++;
            }
            lastNanos = now;
            long sent = sendNanos.get(n);
            if (sent != 0) {
                long latency = now - sent;
                latencyMicros.add(latency / 1000);
                if (latency > lateAfterNanos) {
                    late++;
                }
            }
        }
        if (firstNanos < 0 && results + rejects > before) {
            firstNanos = now;
            firstBatch = results + rejects - before;
        }
    }

    /** The top-level {@code sweepId} of a result or reject, or null. */
    static String sweepId(byte[] value) {
        if (value == null) {
            return null;
        }
        try (JsonParser p = JSON.createParser(value)) {
            if (p.nextToken() != JsonToken.START_OBJECT) {
                return null;
            }
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String name = p.currentName();
                JsonToken t = p.nextToken();
                if ("sweepId".equals(name)) {
                    return t == JsonToken.VALUE_STRING ? p.getText() : null;
                }
                p.skipChildren();
            }
            return null;
        } catch (IOException e) {
            return null;
        }
    }

    /** Sweeps with sequence numbers in [from, to) that came out, as a result or a reject. */
    synchronized long accounted(long from, long to) {
        return seen.get((int) from, (int) to).cardinality();
    }

    /** What came out so far, and the latencies recorded since the last {@link #startWindow()}. */
    synchronized Snapshot snapshot() {
        return new Snapshot(results, rejects, duplicates, foreign, firstNanos, firstBatch, lastNanos, late,
                latencyMicros.count(), latencyMicros.percentile(50), latencyMicros.percentile(90),
                latencyMicros.percentile(99), latencyMicros.percentile(99.9), latencyMicros.max(), latencyMicros.mean());
    }

    /** Starts a new window of first/last arrival, lateness and latencies. */
    synchronized void startWindow() {
        firstNanos = -1;
        firstBatch = 0;
        lastNanos = -1;
        late = 0;
        latencyMicros.clear();
    }

    /**
     * What the watcher has seen; arrival times are {@link System#nanoTime()} values, -1 before
     * the first, and {@code firstBatch} sweeps became visible at the first; latencies in
     * microseconds, -1 without any.
     */
    record Snapshot(long results, long rejects, long duplicates, long foreign, long firstNanos, long firstBatch, long lastNanos, long late,
            long latencies, long p50Micros, long p90Micros, long p99Micros, long p999Micros, long maxMicros, double meanMicros) {
    }

    /** Ends the reading thread's poll; it closes the consumer. */
    @Override
    public void close() {
        consumer.wakeup();
    }
}
