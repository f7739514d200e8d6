package org.qfleet.app.http;

import com.sun.net.httpserver.HttpExchange;
import com.sun.net.httpserver.HttpHandler;
import io.micrometer.prometheusmetrics.PrometheusMeterRegistry;
import java.io.IOException;

/** {@code /metrics}: every meter of the registry in the Prometheus text format. */
public final class MetricsHandler implements HttpHandler {

    public static final String PATH = "/metrics";
    /** The Prometheus text exposition format, version 0.0.4 (Prometheus documentation, "Exposition formats"). */
    static final String CONTENT_TYPE = "text/plain; version=0.0.4; charset=utf-8";

    private final PrometheusMeterRegistry registry;

    public MetricsHandler(PrometheusMeterRegistry registry) {
        this.registry = registry;
    }

    @Override
    public void handle(HttpExchange exchange) throws IOException {
        if (!TextResponse.refused(exchange, PATH)) {
            TextResponse.send(exchange, 200, CONTENT_TYPE, registry.scrape());
        }
    }
}
