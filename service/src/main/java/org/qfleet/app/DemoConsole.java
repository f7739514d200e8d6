package org.qfleet.app;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.UUID;
import org.apache.kafka.clients.consumer.ConsumerConfig;
import org.apache.kafka.clients.consumer.ConsumerRecord;
import org.apache.kafka.clients.consumer.KafkaConsumer;
import org.apache.kafka.common.errors.WakeupException;
import org.apache.kafka.common.serialization.ByteArrayDeserializer;

/**
 * The demo's view of its own output: reads the results, rejects and alerts topics as any client
 * would ({@code read_committed}), prints each alert as it comes, and sums the rest up for a person
 * every few seconds: rates, counts,
 * end-to-end latency (from the sweep's publication to its committed result), open lots, verdicts
 * and the latest unit of each station.
 */
final class DemoConsole implements Runnable, AutoCloseable {

    private static final ObjectMapper MAPPER = new ObjectMapper();
    /** A lot counts as open while its units keep coming; common practice for a dashboard, not a plant rule. */
    private static final long LOT_QUIET_MILLIS = 5_000;

    private final KafkaConsumer<byte[], byte[]> consumer;
    private final String resultsTopic;
    private final String alertsTopic;
    private final PrintWriter alertsOut;
    private final LatencyRecorder recentLatency = new LatencyRecorder();
    private final LatencyRecorder allLatency = new LatencyRecorder();
    private final Map<String, String> latestByStation = new TreeMap<>();
    private final Map<String, Long> lotLastSeen = new HashMap<>();
    private final Map<String, Long> verdicts = new TreeMap<>();
    private long results;
    private long rejects;

    /** @param alertsOut where each alert is printed as it arrives */
    DemoConsole(Map<String, Object> kafka, String resultsTopic, String rejectsTopic, String alertsTopic, PrintWriter alertsOut) {
        Map<String, Object> config = new HashMap<>(kafka);
        config.put(ConsumerConfig.GROUP_ID_CONFIG, "qfleet-demo-console-" + UUID.randomUUID());
        config.put(ConsumerConfig.AUTO_OFFSET_RESET_CONFIG, "latest");
        config.put(ConsumerConfig.ISOLATION_LEVEL_CONFIG, "read_committed");
        config.put(ConsumerConfig.ENABLE_AUTO_COMMIT_CONFIG, "false");
        this.consumer = new KafkaConsumer<>(config, new ByteArrayDeserializer(), new ByteArrayDeserializer());
        this.resultsTopic = resultsTopic;
        this.alertsTopic = alertsTopic;
        this.alertsOut = alertsOut;
        consumer.subscribe(List.of(resultsTopic, rejectsTopic, alertsTopic));
    }

    /** Waits until the consumer has its partitions, so nothing published afterwards is missed. */
    void awaitAssignment(Duration timeout) {
        long deadline = System.nanoTime() + timeout.toNanos();
        while (consumer.assignment().isEmpty() && System.nanoTime() < deadline) {
            poll();
        }
    }

    @Override
    public void run() {
        try {
            while (!Thread.currentThread().isInterrupted()) {
                poll();
            }
        } catch (WakeupException e) {
            // Closing.
        } finally {
            consumer.close(Duration.ofSeconds(5));
        }
    }

    private void poll() {
        List<ConsumerRecord<byte[], byte[]>> batch = new ArrayList<>();
        consumer.poll(Duration.ofMillis(200)).forEach(batch::add);
        long now = System.currentTimeMillis();
        synchronized (this) {
            for (ConsumerRecord<byte[], byte[]> r : batch) {
                if (r.topic().equals(alertsTopic)) {
                    alert(r.value());
                    continue;
                }
                recentLatency.add(now - r.timestamp());
                allLatency.add(now - r.timestamp());
                if (r.topic().equals(resultsTopic)) {
                    results++;
                    result(r.value(), now);
                } else {
                    rejects++;
                }
            }
        }
    }

    private void result(byte[] value, long now) {
        try {
            JsonNode n = MAPPER.readTree(value);
            String verdict = n.path("verdict").path("status").asText("?");
            verdicts.merge(verdict, 1L, Long::sum);
            lotLastSeen.put(n.path("lot").asText(), now);
            latestByStation.put(n.path("stationId").asText(), String.format(Locale.ROOT, "%s %s Qu %.0f %s",
                    n.path("stationId").asText(), n.path("unit").asText(), n.path("qUnloaded").asDouble(), verdict));
        } catch (IOException e) {
            verdicts.merge("unreadable", 1L, Long::sum);
        }
    }

    private void alert(byte[] value) {
        String line;
        try {
            JsonNode a = MAPPER.readTree(value);
            List<String> rules = new ArrayList<>();
            a.path("rules").forEach(r -> rules.add(r.asText()));
            JsonNode f = a.path("figures");
            String status = a.path("status").asText() + (a.path("revision").asInt() > 1 && "raised".equals(a.path("status").asText())
                    ? " (updated)" : "");
            line = String.format(Locale.ROOT, "ALERT %s %s %s: %s, %s, n %d%s%s", a.path("kind").asText().toUpperCase(Locale.ROOT),
                    a.path("subject").asText(), status, a.path("severity").asText(), String.join(" + ", rules),
                    f.path("n").asLong(), f.hasNonNull("mean") ? String.format(Locale.ROOT, ", lot mean Qu %.0f", f.path("mean").asDouble()) : "",
                    a.hasNonNull("clearedBy") ? ", " + a.path("clearedBy").asText() : "");
        } catch (IOException e) {
            line = "ALERT (unreadable)";
        }
        alertsOut.println("qfleet demo: " + line + "   [key " + keyOf(value) + "]");
        alertsOut.flush();
    }

    private static String keyOf(byte[] value) {
        try {
            return MAPPER.readTree(value).path("key").asText("?");
        } catch (IOException e) {
            return "?";
        }
    }

    synchronized long processed() {
        return results + rejects;
    }

    /** Lines for one summary; resets the window of recent latencies. */
    synchronized List<String> summary(long published, double seconds, long resultsBefore, double windowSeconds) {
        long now = System.currentTimeMillis();
        lotLastSeen.values().removeIf(t -> now - t > LOT_QUIET_MILLIS);
        List<String> lines = new ArrayList<>();
        lines.add(String.format(Locale.ROOT,
                "%4.0f s: published %d (%.1f/s), results %d (%.1f/s), rejects %d, latency p50 %s p99 %s, open lots %d, verdicts %s",
                seconds, published, published / Math.max(seconds, 1e-9), results,
                (results - resultsBefore) / Math.max(windowSeconds, 1e-9), rejects,
                millis(recentLatency.percentile(50)), millis(recentLatency.percentile(99)), lotLastSeen.size(), verdicts));
        List<String> stations = new ArrayList<>(latestByStation.values());
        for (int i = 0; i < stations.size(); i += 4) {
            lines.add("        " + String.join(" | ", stations.subList(i, Math.min(stations.size(), i + 4))));
        }
        recentLatency.clear();
        return lines;
    }

    synchronized long results() {
        return results;
    }

    synchronized long rejects() {
        return rejects;
    }

    /** Latency percentile over the whole run, in milliseconds; -1 without data. */
    synchronized long overallLatency(double percentile) {
        return allLatency.percentile(percentile);
    }

    static String millis(long value) {
        return value < 0 ? "-" : value + " ms";
    }

    void print(PrintWriter err, List<String> lines) {
        for (String line : lines) {
            err.println("qfleet demo: " + line);
        }
        err.flush();
    }

    /** Ends the reading thread's poll; it closes the consumer. */
    @Override
    public void close() {
        consumer.wakeup();
    }
}
