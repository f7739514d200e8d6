package org.qfleet.app.metrics;

import io.micrometer.core.instrument.Meter;
import io.micrometer.core.instrument.config.MeterFilter;
import io.micrometer.core.instrument.config.MeterFilterReply;
import io.micrometer.prometheusmetrics.PrometheusConfig;
import io.micrometer.prometheusmetrics.PrometheusMeterRegistry;
import java.util.Arrays;
import java.util.List;

/**
 * Keeps the scrape within Prometheus's naming conventions, as {@code promtool check metrics}
 * checks them (Prometheus documentation, "Metric and label naming"), for meters whose names qfleet
 * does not choose: Kafka's client and Streams metrics and two of Micrometer's JVM meters.
 * <ul>
 *   <li>a name or base unit with an abbreviated unit, {@code ns}, {@code us} or {@code ms} (Kafka's
 *       {@code io-time-ns-total} and {@code start-time-ms}, the JVM's {@code process.cpu.time} in
 *       nanoseconds) is left out: its value cannot be rescaled here, and the same quantity is
 *       there as a ratio or in seconds ({@code io-ratio}, {@code process_cpu_usage},
 *       {@code process_uptime_seconds});</li>
 *   <li>a gauge named {@code ... .count} (Kafka's {@code connection-count}, {@code system.cpu.count})
 *       is renamed to the plural ({@code connections}, {@code system.cpus}), as {@code _count} is
 *       reserved for histograms and summaries;</li>
 *   <li>a meter without a description gets one naming its source, since every metric needs help
 *       text.</li>
 * </ul>
 */
public final class PrometheusNaming implements MeterFilter {

    /** A Prometheus registry that applies this naming to every meter bound to it. */
    public static PrometheusMeterRegistry registry() {
        PrometheusMeterRegistry registry = new PrometheusMeterRegistry(PrometheusConfig.DEFAULT);
        registry.config().meterFilter(new PrometheusNaming());
        return registry;
    }

    /** Abbreviated units that promtool refuses in a name. */
    private static final List<String> ABBREVIATED = List.of("ns", "ms", "us");

    @Override
    public MeterFilterReply accept(Meter.Id id) {
        boolean abbreviated = Arrays.stream(id.getName().split("[._-]")).anyMatch(ABBREVIATED::contains)
                || (id.getBaseUnit() != null && ABBREVIATED.contains(id.getBaseUnit()));
        return abbreviated ? MeterFilterReply.DENY : MeterFilterReply.NEUTRAL;
    }

    @Override
    public Meter.Id map(Meter.Id id) {
        Meter.Id mapped = id;
        if (id.getType() == Meter.Type.GAUGE && id.getName().endsWith(".count")) {
            String base = id.getName().substring(0, id.getName().length() - ".count".length());
            mapped = mapped.withName(base + "s");
        }
        if (mapped.getDescription() == null || mapped.getDescription().isBlank()) {
            mapped = new Meter.Id(mapped.getName(), io.micrometer.core.instrument.Tags.of(mapped.getTagsAsIterable()),
                    mapped.getBaseUnit(), "Kafka or JVM metric " + id.getName() + " (no description given by its source)",
                    mapped.getType());
        }
        return mapped;
    }
}
