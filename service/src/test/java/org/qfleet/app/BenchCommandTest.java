package org.qfleet.app;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import org.apache.kafka.clients.admin.Admin;
import org.apache.kafka.clients.admin.AdminClientConfig;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.qfleet.stream.TestBroker;
import org.qfleet.sweep.SweepLimits;

/** {@code qfleet bench} with tiny numbers against the test broker: every phase measured, every sweep accounted for. */
class BenchCommandTest {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    @TempDir
    Path dir;

    @Test
    void measuresEveryPhaseAndAccountsForEverySweep() throws Exception {
        String bootstrap = TestBroker.get().bootstrapServers();
        Path json = dir.resolve("bench.json");

        CommandRun run = CommandRun.of("bench", "--bootstrap-servers", bootstrap, "--sweeps", 200, "--warm-up", 60, "--rate", 50,
                "--rate-duration", "2s", "--partitions", 2, "--output", json);

        assertThat(run.exitCode()).as(run.stderr()).isZero();
        JsonNode figures = MAPPER.readTree(json.toFile());
        JsonNode phases = figures.get("phases");
        assertThat(phases.fieldNames()).toIterable().containsExactly("publish", "raw", "service", "latency");
        for (JsonNode phase : phases) {
            assertThat(phase.get("sweepsPerSecond").asDouble()).isPositive();
            assertThat(phase.get("cpuMillisPerSweep").asDouble()).isPositive();
            assertThat(phase.get("heapAfterGcBytes").asLong()).isPositive();
            assertThat(phase.get("heapMaxUsedBytes").asLong()).isGreaterThanOrEqualTo(phase.get("heapAfterGcBytes").asLong() / 2);
        }
        assertThat(phases.at("/raw/sweeps").asLong()).isEqualTo(200);
        assertThat(phases.at("/raw/decodeFailures").asLong()).isZero();
        JsonNode service = phases.get("service");
        assertThat(service.get("results").asLong() + service.get("rejects").asLong()).isEqualTo(200);
        assertThat(service.get("lost").asLong()).isZero();
        assertThat(service.get("duplicates").asLong()).isZero();
        JsonNode latency = phases.get("latency");
        // 50 sweeps/s for 2 s.
        assertThat(latency.get("sweeps").asLong()).isEqualTo(100);
        assertThat(latency.get("results").asLong() + latency.get("rejects").asLong()).isEqualTo(100);
        assertThat(latency.get("lost").asLong()).isZero();
        JsonNode millis = latency.get("latencyMillis");
        assertThat(millis.get("count").asLong()).isEqualTo(100);
        assertThat(millis.get("p50").asDouble()).isPositive()
                .isLessThanOrEqualTo(millis.get("p99").asDouble());
        assertThat(millis.get("p99").asDouble()).isLessThanOrEqualTo(millis.get("max").asDouble());
        assertThat(figures.get("serviceToRawRatio").asDouble()).isPositive();
        assertThat(figures.get("allAccounted").asBoolean()).isTrue();
        assertThat(figures.at("/machine/cores").asInt()).isEqualTo(Runtime.getRuntime().availableProcessors());
        assertThat(figures.at("/settings/points").asInt()).isEqualTo(401);
        assertThat(figures.at("/settings/warmUpSweeps").asLong()).isEqualTo(60);
        // the warm-up ran first, through every phase, and is not among the measured ones
        assertThat(run.stderr()).contains("warming up on 60 sweeps", "warm-up service");
        assertThat(run.stdout()).contains("service / raw:", "publish", "latency");
        // On a given cluster the run leaves no topics behind.
        try (Admin admin = Admin.create(Map.of(AdminClientConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrap))) {
            Set<String> topics = admin.listTopics().names().get(30, TimeUnit.SECONDS);
            assertThat(topics).noneMatch(t -> t.startsWith("qfleet-bench-"));
        }
    }

    @Test
    void badOptionsAreUsageErrorsThatNameTheOption() {
        Map<List<Object>, String> cases = Map.of(
                List.of("--sweeps", 0), "--sweeps",
                List.of("--warm-up", -1), "--warm-up",
                List.of("--rate", -5), "--rate",
                List.of("--points", 3), "--points",
                List.of("--partitions", 0), "--partitions",
                List.of("--rate-duration", "soon"), "--rate-duration",
                List.of("--form", "polar"), "re-im, mag-deg, db-deg, db",
                List.of("--output", dir.resolve("missing").resolve("bench.json")), "does not exist",
                List.of("--output", dir), "is a folder");
        cases.forEach((options, expected) -> {
            Object[] args = new Object[options.size() + 1];
            args[0] = "bench";
            for (int i = 0; i < options.size(); i++) {
                args[i + 1] = options.get(i);
            }
            CommandRun run = CommandRun.of(args);
            assertThat(run.exitCode()).as(options + ": " + run.stderr()).isEqualTo(2);
            assertThat(run.stderr()).as(options.toString()).contains(expected).doesNotContain("\tat ");
            assertThat(run.stdout()).as(options.toString()).isEmpty();
        });
    }

    @Test
    void theSmallestSweepIsTheOneTheServiceAccepts() {
        assertThat(BenchCommand.MIN_POINTS).isEqualTo(SweepLimits.DEFAULT.minPoints());
    }

    @Test
    void anUnreachableClusterIsSaidInOneLine() throws Exception {
        int closedPort;
        try (java.net.ServerSocket s = new java.net.ServerSocket(0)) {
            closedPort = s.getLocalPort();
        }
        CommandRun run = CommandRun.of("bench", "--bootstrap-servers", "localhost:" + closedPort, "--sweeps", 10,
                "--output", dir.resolve("b.json"));

        assertThat(run.exitCode()).isEqualTo(1);
        assertThat(run.stderr()).contains("cannot reach Kafka at localhost:" + closedPort).doesNotContain("\tat ");
        assertThat(Files.exists(dir.resolve("b.json"))).isFalse();
    }
}
