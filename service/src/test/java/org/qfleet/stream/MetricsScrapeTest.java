package org.qfleet.stream;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import io.micrometer.prometheusmetrics.PrometheusMeterRegistry;
import java.io.File;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import java.util.concurrent.TimeUnit;
import java.util.function.Predicate;
import java.util.stream.Collectors;
import org.apache.kafka.clients.producer.KafkaProducer;
import org.apache.kafka.clients.producer.ProducerConfig;
import org.apache.kafka.clients.producer.ProducerRecord;
import org.apache.kafka.common.serialization.ByteArraySerializer;
import org.apache.kafka.streams.KafkaStreams;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.qfleet.app.http.HttpAddress;
import org.qfleet.app.http.HttpEndpoints;
import org.qfleet.app.http.LivenessHandler;
import org.qfleet.app.http.MetricsHandler;
import org.qfleet.app.http.Readiness;
import org.qfleet.app.http.ReadinessHandler;
import org.qfleet.app.metrics.JvmMeters;
import org.qfleet.app.metrics.PrometheusNaming;
import org.qfleet.app.metrics.ReadyGauge;
import org.qfleet.app.metrics.ServiceMetrics;
import org.qfleet.drift.DriftSettings;
import org.qfleet.sweep.SweepLimits;
import org.qfleet.verdict.ProductCatalogue;

/**
 * The service's metrics end to end: simulated sweeps through the topology on a real broker in
 * this JVM, then {@code /metrics} scraped over HTTP as Prometheus would, and checked with
 * Prometheus' own {@code promtool} when it is installed.
 */
class MetricsScrapeTest {

    private static final Duration WAIT = Duration.ofSeconds(60);
    private static final int SWEEPS = 40;

    private static Topics topics;
    private static StreamService service;
    private static PrometheusMeterRegistry registry;
    private static JvmMeters jvm;
    private static HttpEndpoints http;
    private static String scrape;

    @BeforeAll
    static void processSweepsAndScrape() throws Exception {
        String bootstrap = TestBroker.get().bootstrapServers();
        topics = TestBroker.freshTopics(2);
        StreamSettings settings = new StreamSettings(topics, "test-" + UUID.randomUUID(), 1, new SweepLimits(7, 2001),
                500_000, 64 * 1024, Map.of("bootstrap.servers", bootstrap));
        registry = PrometheusNaming.registry();
        jvm = new JvmMeters(registry);
        service = StreamService.start(settings, ProductCatalogue.demoPlant(), DriftSettings.DEFAULT, new ServiceMetrics(registry));
        service.bindMetrics(registry, Duration.ofSeconds(1));
        ReadyGauge.bind(registry, () -> service.state() == KafkaStreams.State.RUNNING);
        http = HttpEndpoints.start(new HttpAddress("localhost", 0))
                .mount(MetricsHandler.PATH, new MetricsHandler(registry))
                .mount(LivenessHandler.PATH, new LivenessHandler())
                .mount(ReadinessHandler.PATH, new ReadinessHandler(
                        () -> new Readiness(service.state() == KafkaStreams.State.RUNNING, "state " + service.state())));
        assertThat(service.awaitRunning(WAIT)).as("the topology is running").isTrue();

        List<StreamSweeps.Message> sweeps = StreamSweeps.mixed(SWEEPS, 5, "metrics-" + UUID.randomUUID());
        try (KafkaProducer<byte[], byte[]> producer = new KafkaProducer<>(Map.of(ProducerConfig.BOOTSTRAP_SERVERS_CONFIG,
                bootstrap, ProducerConfig.ACKS_CONFIG, "all"), new ByteArraySerializer(), new ByteArraySerializer())) {
            for (StreamSweeps.Message m : sweeps) {
                producer.send(new ProducerRecord<>(topics.sweeps(), bytes(m.key()), m.value()));
            }
            producer.send(new ProducerRecord<>(topics.sweeps(), bytes("bad"), bytes("{\"sweepId\": \"oops")));
        }
        String sweepsTopic = "topic=\"" + topics.sweeps() + "\"";
        // The drift stages come after two repartition topics, so their series appear a little later.
        scrape = scrapeUntil(s -> sum(s, "qfleet_sweeps_processed_total") >= SWEEPS + 1
                && s.contains("\nqfleet_lot_units{") && s.contains("\nqfleet_station_cusum{")
                && s.lines().anyMatch(l -> l.startsWith("kafka_consumer_fetch_manager_records_lag_max{") && l.contains(sweepsTopic)));
    }

    @AfterAll
    static void stop() {
        if (http != null) {
            http.close();
        }
        if (service != null) {
            service.close(Duration.ofSeconds(20));
        }
        if (jvm != null) {
            jvm.close();
        }
    }

    @Test
    void everySweepIsCountedOnceByOutcomeAndMethod() {
        assertThat(sum(scrape, "qfleet_sweeps_processed_total")).isEqualTo(SWEEPS + 1);
        assertThat(value(scrape, "qfleet_sweeps_processed_total{method=\"none\",outcome=\"rejected\"}")).isEqualTo(1);
        assertThat(value(scrape, "qfleet_rejects_total{reason=\"invalid-json\"}")).isEqualTo(1);
        assertThat(value(scrape, "qfleet_fit_duration_seconds_count")).isEqualTo(SWEEPS);
        assertThat(value(scrape, "qfleet_fit_duration_seconds_bucket{le=\"+Inf\"}")).isEqualTo(SWEEPS);
        assertThat(scrape).contains("qfleet_sweeps_processed_total{method=\"complex\",outcome=\"pass\"}",
                "qfleet_sweeps_processed_total{method=\"half-power\",outcome=\"unknown-product\"}");
    }

    @Test
    void quLotsStationsAlertsAndReadinessAreExported() {
        assertThat(value(scrape, "qfleet_unloaded_q_count{product=\"cav-x104\"}")
                + value(scrape, "qfleet_unloaded_q_count{product=\"coax-s36\"}")).isPositive();
        assertThat(scrape).contains("qfleet_unloaded_q_bucket{product=\"cav-x104\",le=\"10000.0\"}",
                "qfleet_unloaded_q_sum{product=\"cav-x104\"}");
        assertThat(families(scrape)).contains("qfleet_lot_mean_unloaded_q", "qfleet_lot_units", "qfleet_lot_series_dropped_total",
                "qfleet_station_qu_ewma", "qfleet_station_qu_ewma_limit", "qfleet_station_cusum", "qfleet_station_cusum_limit",
                "qfleet_alerts_active", "qfleet_alerts_raised_total", "qfleet_ready");
        assertThat(families(scrape)).as("no lower limit before the product baselines are learned (200 units)")
                .doesNotContain("qfleet_lot_lower_limit_unloaded_q");
        assertThat(scrape).contains("qfleet_station_cusum{chart=\"coupling\",product=\"cav-x104\",side=\"lower\",station=\"st-01\"}");
        assertThat(value(scrape, "qfleet_ready")).isEqualTo(1);
    }

    @Test
    void jvmAndKafkaMetricsAreExported() {
        assertThat(families(scrape)).contains("jvm_memory_used_bytes", "jvm_threads_live_threads", "jvm_classes_loaded_classes",
                "process_uptime_seconds", "system_cpus", "kafka_consumer_fetch_manager_records_lag",
                "kafka_consumer_fetch_manager_records_lag_max", "kafka_stream_alive_stream_threads");
    }

    @Test
    void healthEndpointsAnswer() throws Exception {
        assertThat(get(LivenessHandler.PATH).statusCode()).isEqualTo(200);
        HttpResponse<String> ready = get(ReadinessHandler.PATH);
        assertThat(ready.statusCode()).isEqualTo(200);
        assertThat(ready.body()).isEqualTo("ready: state RUNNING\n");
    }

    /** promtool (Prometheus' own checker) finds nothing to say about our metrics, and can read the whole scrape. */
    @Test
    void promtoolFindsTheScrapeClean() throws Exception {
        assumeTrue(onPath("promtool"), "promtool is not installed (Debian package prometheus)");
        String ours = scrape.lines().filter(l -> l.matches("(# (HELP|TYPE) )?qfleet_.*")).collect(Collectors.joining("\n", "", "\n"));
        assertThat(promtool(ours)).as("promtool on the qfleet_* metrics").isEqualTo(new Promtool(0, ""));
        // the whole scrape too: Kafka's and the JVM's meters pass through PrometheusNaming
        assertThat(promtool(scrape)).as("promtool on the whole scrape").isEqualTo(new Promtool(0, ""));
    }

    private record Promtool(int exitCode, String output) {
    }

    private static Promtool promtool(String text) throws Exception {
        Path in = Files.createTempFile("scrape-", ".txt");
        try {
            Files.writeString(in, text);
            Process p = new ProcessBuilder("promtool", "check", "metrics").redirectErrorStream(true)
                    .redirectInput(in.toFile()).start();
            String output = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            assertThat(p.waitFor(60, TimeUnit.SECONDS)).as("promtool ends").isTrue();
            return new Promtool(p.exitValue(), output);
        } finally {
            Files.deleteIfExists(in);
        }
    }

    private static boolean onPath(String program) {
        String path = System.getenv("PATH");
        return path != null && Arrays.stream(path.split(File.pathSeparator)).anyMatch(d -> Files.isExecutable(Path.of(d, program)));
    }

    private static String scrapeUntil(Predicate<String> done) throws Exception {
        long deadline = System.nanoTime() + WAIT.toNanos();
        String last = "";
        while (System.nanoTime() < deadline) {
            HttpResponse<String> r = get(MetricsHandler.PATH);
            assertThat(r.statusCode()).isEqualTo(200);
            last = r.body();
            if (done.test(last)) {
                return last;
            }
            Thread.sleep(200);
        }
        throw new AssertionError("the scrape did not show every sweep, lots, stations and the consumer lag within " + WAIT + "; last one:\n"
                + last.lines().filter(l -> l.startsWith("qfleet_")).collect(Collectors.joining("\n")));
    }

    private static HttpResponse<String> get(String path) throws Exception {
        return HttpClient.newHttpClient().send(HttpRequest.newBuilder(URI.create(http.baseUrl() + path)).GET().build(),
                HttpResponse.BodyHandlers.ofString());
    }

    /** Sum of every sample of a family (all label sets). */
    private static double sum(String text, String family) {
        return text.lines().filter(l -> l.startsWith(family + "{") || l.startsWith(family + " "))
                .mapToDouble(l -> Double.parseDouble(l.substring(l.lastIndexOf(' ') + 1))).sum();
    }

    /** The value of the one sample written exactly so (name and labels in the scrape's order). */
    private static double value(String text, String sample) {
        return text.lines().filter(l -> l.startsWith(sample + " ")).mapToDouble(l -> Double.parseDouble(l.substring(sample.length() + 1)))
                .findFirst().orElseThrow(() -> new AssertionError("no sample " + sample));
    }

    private static List<String> families(String text) {
        return text.lines().filter(l -> l.startsWith("# TYPE ")).map(l -> l.split(" ")[2]).toList();
    }

    private static byte[] bytes(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }
}
