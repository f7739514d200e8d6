package org.qfleet.app.metrics;

import io.micrometer.core.instrument.Gauge;
import io.micrometer.core.instrument.MeterRegistry;
import java.util.function.BooleanSupplier;

/** {@code qfleet_ready}: 1 while the service processes its input (as {@code /health/ready} says), else 0. */
public final class ReadyGauge {

    static final String NAME = "qfleet.ready";

    private ReadyGauge() {
    }

    public static void bind(MeterRegistry registry, BooleanSupplier ready) {
        Gauge.builder(NAME, ready, r -> r.getAsBoolean() ? 1 : 0).strongReference(true)
                .description("1 while the service processes its input, else 0").register(registry);
    }
}
