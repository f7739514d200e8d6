package org.qfleet.app;

import io.micrometer.core.instrument.MeterRegistry;
import io.micrometer.prometheusmetrics.PrometheusMeterRegistry;
import java.net.BindException;
import java.util.function.Supplier;
import org.qfleet.app.http.HttpAddress;
import org.qfleet.app.http.HttpEndpoints;
import org.qfleet.app.http.HttpStartException;
import org.qfleet.app.http.LivenessHandler;
import org.qfleet.app.http.MetricsHandler;
import org.qfleet.app.http.Readiness;
import org.qfleet.app.http.ReadinessHandler;
import org.qfleet.app.metrics.JvmMeters;
import org.qfleet.app.metrics.PrometheusNaming;
import org.qfleet.app.metrics.ReadyGauge;
import org.qfleet.app.metrics.ServiceMetrics;
import org.qfleet.app.status.FleetView;
import org.qfleet.app.status.StatusPage;
import org.qfleet.stream.ObserverGroup;
import org.qfleet.stream.ServiceObserver;

/**
 * The service's metrics, health and status page, served over HTTP: a Prometheus registry with the
 * JVM's and the service's meters, the endpoints {@code /metrics}, {@code /health/live} and
 * {@code /health/ready}, and the status page at {@code /}; more handlers can be mounted on
 * {@link #http()}.
 */
final class ServiceEndpoints implements AutoCloseable {

    static final String STATUS_PATH = "/";

    private final PrometheusMeterRegistry registry;
    private final JvmMeters jvm;
    private final ServiceObserver observer;
    private final HttpEndpoints http;
    private final String fallbackNote;

    private ServiceEndpoints(PrometheusMeterRegistry registry, JvmMeters jvm, ServiceObserver observer, HttpEndpoints http,
            String fallbackNote) {
        this.registry = registry;
        this.jvm = jvm;
        this.observer = observer;
        this.http = http;
        this.fallbackNote = fallbackNote;
    }

    /**
     * Binds {@code address} and serves the endpoints.
     *
     * @param fallBack when the port is taken, use a free one instead (the demo) rather than fail
     * @throws ServiceException when the address cannot be bound, saying why in one line
     */
    static ServiceEndpoints start(HttpAddress address, boolean fallBack, Supplier<Readiness> readiness)
            throws ServiceException {
        HttpEndpoints http;
        String note = null;
        try {
            http = bind(address, fallBack);
            if (http.port() != address.port() && address.port() != 0) {
                note = "port " + address.port() + " is in use, so a free one was taken";
            }
        } catch (HttpStartException e) {
            throw new ServiceException(e.getMessage(), e);
        }
        PrometheusMeterRegistry registry = PrometheusNaming.registry();
        JvmMeters jvm = new JvmMeters(registry);
        ServiceMetrics metrics = new ServiceMetrics(registry);
        ReadyGauge.bind(registry, () -> readiness.get().ready());
        FleetView fleet = new FleetView();
        http.mount(MetricsHandler.PATH, new MetricsHandler(registry))
                .mount(LivenessHandler.PATH, new LivenessHandler())
                .mount(ReadinessHandler.PATH, new ReadinessHandler(readiness))
                .mount(STATUS_PATH, new StatusPage(fleet));
        return new ServiceEndpoints(registry, jvm, ObserverGroup.of(metrics, fleet), http, note);
    }

    private static HttpEndpoints bind(HttpAddress address, boolean fallBack) throws HttpStartException {
        try {
            return HttpEndpoints.start(address);
        } catch (HttpStartException e) {
            if (fallBack && e.getCause() instanceof BindException && address.port() != 0) {
                return HttpEndpoints.start(new HttpAddress(address.host(), 0));
            }
            throw e;
        }
    }

    /** Feeds the metrics and the status page. */
    ServiceObserver observer() {
        return observer;
    }

    MeterRegistry registry() {
        return registry;
    }

    /** The HTTP server, to mount more handlers on. */
    HttpEndpoints http() {
        return http;
    }

    /** One line saying where the status page, the metrics and the health checks are. */
    String line() {
        String base = http.baseUrl();
        return "status page: " + base + STATUS_PATH + ", metrics: " + base + MetricsHandler.PATH + ", health: " + base + LivenessHandler.PATH + " and "
                + base + ReadinessHandler.PATH + (fallbackNote == null ? "" : " (" + fallbackNote + ")");
    }

    @Override
    public void close() {
        http.close();
        jvm.close();
        registry.close();
    }
}
