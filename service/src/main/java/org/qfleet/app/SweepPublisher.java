package org.qfleet.app;

import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BooleanSupplier;
import org.apache.kafka.clients.producer.KafkaProducer;
import org.apache.kafka.clients.producer.ProducerConfig;
import org.apache.kafka.clients.producer.ProducerRecord;
import org.apache.kafka.common.KafkaException;
import org.apache.kafka.common.serialization.ByteArraySerializer;
import org.qfleet.codec.SweepMessageWriter;
import org.qfleet.codec.TraceForm;
import org.qfleet.sim.DemoPlant;
import org.qfleet.sweep.Sweep;

/**
 * Publishes sweep messages (key: the lot id) at a steady rate, the way a plant's test stations
 * would: the simulated plant's sweeps for {@code simulate} and {@code demo}, or messages made
 * beforehand for {@code bench}.
 */
final class SweepPublisher implements AutoCloseable {

    /** One message to publish: its key (the lot id) and value (the sweep message), as bytes. */
    record Outgoing(byte[] key, byte[] value) {
    }

    /** The messages to publish: the {@code n}-th one (from 0), made when it is due. */
    @FunctionalInterface
    interface Messages {
        Outgoing message(long n);
    }

    private final KafkaProducer<byte[], byte[]> producer;
    private final String topic;
    private final Messages messages;
    private final AtomicLong sent = new AtomicLong();
    private final AtomicLong acknowledged = new AtomicLong();
    private final AtomicReference<Exception> failure = new AtomicReference<>();

    /** The plant's sweeps, written with {@code forms} in turn, one sweep each. */
    SweepPublisher(Map<String, Object> kafka, String topic, DemoPlant plant, List<TraceForm> forms) {
        this(kafka, topic, plantMessages(plant, forms));
    }

    /**
     * @param kafka Kafka client settings, with {@code bootstrap.servers}; they win over the
     *              publisher's defaults (idempotent, acks=all, lz4, one request in flight)
     */
    SweepPublisher(Map<String, Object> kafka, String topic, Messages messages) {
        Map<String, Object> config = new java.util.HashMap<>();
        config.put(ProducerConfig.ACKS_CONFIG, "all");
        config.put(ProducerConfig.ENABLE_IDEMPOTENCE_CONFIG, "true");
        config.put(ProducerConfig.LINGER_MS_CONFIG, "5");
        config.put(ProducerConfig.COMPRESSION_TYPE_CONFIG, "lz4");
        config.put(ProducerConfig.MAX_BLOCK_MS_CONFIG, "30000");
        // One request in flight per broker: right after its topics were created, a broker can refuse
        // the first request (NOT_LEADER_OR_FOLLOWER) and accept the next, after which the idempotent
        // producer retries the first with OUT_OF_ORDER_SEQUENCE_NUMBER until it times out and the
        // sweeps are lost (Apache Kafka issue KAFKA-15591, seen here even after every new partition
        // reported a leader). With one request at a time the refused one is simply retried.
        config.put(ProducerConfig.MAX_IN_FLIGHT_REQUESTS_PER_CONNECTION, "1");
        config.putAll(kafka);
        this.producer = new KafkaProducer<>(config, new ByteArraySerializer(), new ByteArraySerializer());
        this.topic = topic;
        this.messages = messages;
    }

    private static Messages plantMessages(DemoPlant plant, List<TraceForm> forms) {
        List<SweepMessageWriter> writers = forms.stream().map(SweepMessageWriter::new).toList();
        return n -> {
            Sweep sweep = plant.next().sweep();
            return new Outgoing(sweep.info().lot().getBytes(StandardCharsets.UTF_8),
                    writers.get((int) (n % writers.size())).write(sweep));
        };
    }

    /**
     * Publishes up to {@code count} sweeps (0 for no limit) at {@code ratePerSecond} (0 for as fast
     * as possible), until done or {@code stop} says so.
     *
     * @return how many were sent
     */
    long publish(long count, double ratePerSecond, BooleanSupplier stop) throws InterruptedException {
        long start = System.nanoTime();
        long n = 0;
        while ((count == 0 || n < count) && !stop.getAsBoolean() && failure.get() == null) {
            if (ratePerSecond > 0) {
                long due = start + (long) (n * 1e9 / ratePerSecond);
                long wait = due - System.nanoTime();
                if (wait > 0) {
                    Thread.sleep(wait / 1_000_000, (int) (wait % 1_000_000));
                }
            }
            Outgoing message = messages.message(n);
            try {
                producer.send(new ProducerRecord<>(topic, message.key(), message.value()), (metadata, e) -> {
                    if (e == null) {
                        acknowledged.incrementAndGet();
                    } else {
                        failure.compareAndSet(null, e);
                    }
                });
            } catch (KafkaException e) {
                failure.compareAndSet(null, e);
                break;
            }
            n++;
            sent.set(n);
        }
        return n;
    }

    /** Fetches the topic's metadata now, so that the first send does not wait for it. */
    void connect() {
        producer.partitionsFor(topic);
    }

    /** Sweeps handed to the producer so far. */
    long sent() {
        return sent.get();
    }

    /** Sweeps the broker has acknowledged so far. */
    long acknowledged() {
        return acknowledged.get();
    }

    /** The first failure to publish, if any. */
    Exception failure() {
        return failure.get();
    }

    /** Sends what is buffered and closes the producer. */
    @Override
    public void close() {
        producer.close(Duration.ofSeconds(30));
    }
}
