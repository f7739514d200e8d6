package org.qfleet.app.http;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.micrometer.core.instrument.Counter;
import io.micrometer.prometheusmetrics.PrometheusConfig;
import io.micrometer.prometheusmetrics.PrometheusMeterRegistry;
import java.net.BindException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.util.concurrent.atomic.AtomicReference;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

/** The endpoints over real HTTP on a free localhost port. */
class HttpEndpointsTest {

    private final HttpClient client = HttpClient.newHttpClient();
    private final PrometheusMeterRegistry registry = new PrometheusMeterRegistry(PrometheusConfig.DEFAULT);
    private final AtomicReference<Readiness> readiness = new AtomicReference<>(new Readiness(false, "starting"));
    private HttpEndpoints endpoints;

    @BeforeEach
    void start() throws Exception {
        endpoints = HttpEndpoints.start(new HttpAddress("localhost", 0))
                .mount(MetricsHandler.PATH, new MetricsHandler(registry))
                .mount(LivenessHandler.PATH, new LivenessHandler())
                .mount(ReadinessHandler.PATH, new ReadinessHandler(readiness::get));
    }

    @AfterEach
    void stop() {
        endpoints.close();
        registry.close();
    }

    @Test
    void portZeroGivesAFreePortThatIsReported() {
        assertThat(endpoints.port()).isPositive();
        assertThat(endpoints.baseUrl()).isEqualTo("http://localhost:" + endpoints.port());
    }

    @Test
    void metricsAreServedInThePrometheusTextFormat() throws Exception {
        Counter.builder("qfleet.test.things").register(registry).increment(3);
        HttpResponse<String> r = get("/metrics");
        assertThat(r.statusCode()).isEqualTo(200);
        assertThat(r.headers().firstValue("Content-Type")).contains("text/plain; version=0.0.4; charset=utf-8");
        assertThat(r.body()).contains("# TYPE qfleet_test_things_total counter").contains("qfleet_test_things_total 3.0");
    }

    @Test
    void livenessIsAlways200() throws Exception {
        assertThat(get("/health/live").statusCode()).isEqualTo(200);
    }

    @Test
    void readinessFollowsTheStateAndSaysItInOneLine() throws Exception {
        HttpResponse<String> notReady = get("/health/ready");
        assertThat(notReady.statusCode()).isEqualTo(503);
        assertThat(notReady.body()).isEqualTo("not ready: starting\n");

        readiness.set(new Readiness(true, "Kafka Streams state RUNNING"));
        HttpResponse<String> ready = get("/health/ready");
        assertThat(ready.statusCode()).isEqualTo(200);
        assertThat(ready.body()).isEqualTo("ready: Kafka Streams state RUNNING\n");
    }

    @Test
    void otherPathsAndMethodsAreRefused() throws Exception {
        assertThat(get("/metrics/extra").statusCode()).isEqualTo(404);
        assertThat(get("/nothing-here").statusCode()).isEqualTo(404);
        HttpResponse<String> post = client.send(HttpRequest.newBuilder(uri("/metrics"))
                .POST(HttpRequest.BodyPublishers.ofString("x")).build(), HttpResponse.BodyHandlers.ofString());
        assertThat(post.statusCode()).isEqualTo(405);
        assertThat(post.headers().firstValue("Allow")).contains("GET, HEAD");
    }

    @Test
    void moreHandlersCanBeMountedLaterAndTheRootTakesWhatNoOtherDoes() throws Exception {
        endpoints.mount("/", exchange -> TextResponse.send(exchange, 200, TextResponse.PLAIN, "status page\n"));
        assertThat(get("/").body()).isEqualTo("status page\n");
        assertThat(get("/anything").body()).isEqualTo("status page\n");
        assertThat(get("/health/live").body()).isEqualTo("live\n");
    }

    @Test
    void aPortInUseIsAClearErrorNotAStackTrace() {
        HttpAddress taken = new HttpAddress("localhost", endpoints.port());
        assertThatThrownBy(() -> HttpEndpoints.start(taken))
                .isInstanceOf(HttpStartException.class)
                .hasCauseInstanceOf(BindException.class)
                .hasMessageStartingWith("cannot listen for HTTP on localhost:" + endpoints.port() + ": the port is in use")
                .hasMessageContaining("--http-address");
    }

    private HttpResponse<String> get(String path) throws Exception {
        return client.send(HttpRequest.newBuilder(uri(path)).GET().build(), HttpResponse.BodyHandlers.ofString());
    }

    private URI uri(String path) {
        return URI.create(endpoints.baseUrl() + path);
    }
}
