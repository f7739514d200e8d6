package org.qfleet.app.metrics;

import io.micrometer.core.instrument.MeterRegistry;
import io.micrometer.core.instrument.binder.jvm.ClassLoaderMetrics;
import io.micrometer.core.instrument.binder.jvm.JvmGcMetrics;
import io.micrometer.core.instrument.binder.jvm.JvmMemoryMetrics;
import io.micrometer.core.instrument.binder.jvm.JvmThreadMetrics;
import io.micrometer.core.instrument.binder.system.ProcessorMetrics;
import io.micrometer.core.instrument.binder.system.UptimeMetrics;

/** The JVM's meters: memory, garbage collection, threads, class loading, processor, uptime. */
public final class JvmMeters implements AutoCloseable {

    private final JvmGcMetrics gc = new JvmGcMetrics();

    public JvmMeters(MeterRegistry registry) {
        new JvmMemoryMetrics().bindTo(registry);
        gc.bindTo(registry);
        new JvmThreadMetrics().bindTo(registry);
        new ClassLoaderMetrics().bindTo(registry);
        new ProcessorMetrics().bindTo(registry);
        new UptimeMetrics().bindTo(registry);
    }

    @Override
    public void close() {
        gc.close();
    }
}
