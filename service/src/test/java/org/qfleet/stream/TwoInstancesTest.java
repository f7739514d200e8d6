package org.qfleet.stream;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Duration;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.UUID;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.qfleet.sweep.SweepLimits;
import org.qfleet.verdict.ProductCatalogue;

/**
 * Two instances with one application id share the sweeps' partitions; one stops in the middle of
 * the work, the other takes its partitions over and finishes: nothing lost, nothing twice.
 */
class TwoInstancesTest {

    private static final int SWEEPS = 300;
    private static final Duration WAIT = Duration.ofSeconds(90);
    /**
     * Tasks of the topology on six-partition topics: fitting, reading the results back, the lot
     * stage and the station stage, six each (the repartition topics take the results' partitions).
     */
    private static final int TASKS = 4 * 6;

    @Test
    void theRemainingInstanceFinishesTheWorkOfTheOneThatStopped() throws Exception {
        String bootstrap = TestBroker.get().bootstrapServers();
        Topics topics = TestBroker.freshTopics(6);
        StreamSettings settings = new StreamSettings(topics, "pair-" + UUID.randomUUID(), 1, SweepLimits.DEFAULT,
                StreamSettings.DEFAULT_MAX_SWEEP_BYTES, StreamSettings.DEFAULT_MAX_REJECT_PAYLOAD_BYTES,
                Map.of("bootstrap.servers", bootstrap, "session.timeout.ms", "6000", "heartbeat.interval.ms", "1000"));
        List<StreamSweeps.Message> sweeps = StreamSweeps.mixed(SWEEPS, 33, "pair-" + UUID.randomUUID());
        Set<String> ids = sweeps.stream().map(StreamSweeps.Message::sweepId).collect(Collectors.toSet());

        try (StreamService one = StreamService.start(withStateDir(settings, "one"), ProductCatalogue.demoPlant());
             StreamService two = StreamService.start(withStateDir(settings, "two"), ProductCatalogue.demoPlant())) {
            awaitShared(one, two);
            assertThat(one.activeTasks() + two.activeTasks()).isEqualTo(TASKS);

            CrashRecoveryTest.publish(bootstrap, topics.sweeps(), sweeps);
            TopicReader.read(bootstrap, topics.results(), SWEEPS / 10, WAIT);
            one.close(Duration.ofSeconds(30));

            TopicReader.readUntil(bootstrap, topics.results(),
                    m -> m.stream().map(r -> r.value().get("sweepId").asText()).collect(Collectors.toSet()).containsAll(ids),
                    WAIT, "a result for each of " + SWEEPS + " sweeps");
            // stateful drift tasks move once their state is restored, possibly after the results are complete
            long deadline = System.nanoTime() + WAIT.toNanos();
            while (two.activeTasks() < TASKS && System.nanoTime() < deadline) {
                Thread.sleep(100);
            }
            assertThat(two.activeTasks()).isEqualTo(TASKS);
        }
        Map<String, Integer> resultsPerSweep = new HashMap<>();
        for (TopicReader.Message m : TopicReader.readAll(bootstrap, topics.results(), WAIT)) {
            resultsPerSweep.merge(m.value().get("sweepId").asText(), 1, Integer::sum);
        }
        assertThat(resultsPerSweep.keySet()).isEqualTo(ids);
        assertThat(resultsPerSweep.values()).allMatch(n -> n == 1);
    }

    /** Each instance keeps its drift state in a folder of its own, as two machines would. */
    private static StreamSettings withStateDir(StreamSettings settings, String name) throws java.io.IOException {
        Map<String, String> kafka = new HashMap<>(settings.kafka());
        kafka.put("state.dir", java.nio.file.Files.createTempDirectory(java.nio.file.Files.createDirectories(
                java.nio.file.Paths.get("target", "test-state")), name + "-").toString());
        return settings.withKafka(kafka);
    }

    /** Waits until both instances run and each has some of the partitions. */
    private static void awaitShared(StreamService one, StreamService two) throws InterruptedException {
        long deadline = System.nanoTime() + WAIT.toNanos();
        while (System.nanoTime() < deadline) {
            if (one.awaitRunning(Duration.ofMillis(100)) && two.awaitRunning(Duration.ofMillis(100))
                    && one.activeTasks() > 0 && two.activeTasks() > 0 && one.activeTasks() + two.activeTasks() == TASKS) {
                return;
            }
            Thread.sleep(100);
        }
        throw new AssertionError("the two instances did not share the partitions within " + WAIT
                + ": " + one.activeTasks() + " and " + two.activeTasks() + " tasks");
    }
}
