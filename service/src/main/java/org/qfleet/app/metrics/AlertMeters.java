package org.qfleet.app.metrics;

import io.micrometer.core.instrument.Counter;
import io.micrometer.core.instrument.Gauge;
import io.micrometer.core.instrument.MeterRegistry;
import java.util.EnumMap;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import org.qfleet.drift.Alert;
import org.qfleet.drift.AlertKind;
import org.qfleet.drift.AlertStatus;

/**
 * {@code qfleet_alerts_active{kind}}: alerts raised and not yet cleared, tracked by alert key, so
 * an update or a message seen twice changes nothing; {@code qfleet_alerts_raised_total{kind}}:
 * new episodes (revision 1). Alerts raised before this process started are not known to it.
 */
final class AlertMeters {

    static final String ACTIVE = "qfleet.alerts.active";
    static final String RAISED = "qfleet.alerts.raised";

    private final Map<AlertKind, Set<String>> active = new EnumMap<>(AlertKind.class);
    private final Map<AlertKind, Counter> raised = new EnumMap<>(AlertKind.class);

    AlertMeters(MeterRegistry registry) {
        for (AlertKind kind : AlertKind.values()) {
            Set<String> keys = ConcurrentHashMap.newKeySet();
            active.put(kind, keys);
            Gauge.builder(ACTIVE, keys, Set::size).tag("kind", kind.code()).strongReference(true)
                    .description("Drift alerts raised and not cleared").register(registry);
            raised.put(kind, Counter.builder(RAISED).tag("kind", kind.code())
                    .description("Drift alert episodes raised").register(registry));
        }
    }

    void published(Alert alert) {
        Set<String> keys = active.get(alert.kind());
        if (alert.status() == AlertStatus.CLEARED) {
            keys.remove(alert.key());
            return;
        }
        keys.add(alert.key());
        if (alert.revision() == 1) {
            raised.get(alert.kind()).increment();
        }
    }

    int active(AlertKind kind) {
        return active.get(kind).size();
    }
}
