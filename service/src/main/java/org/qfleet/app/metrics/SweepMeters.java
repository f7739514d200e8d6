package org.qfleet.app.metrics;

import io.micrometer.core.instrument.Counter;
import io.micrometer.core.instrument.MeterRegistry;
import io.micrometer.core.instrument.Timer;
import java.time.Duration;
import java.util.EnumMap;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.TimeUnit;
import org.qfleet.fit.Method;
import org.qfleet.verdict.VerdictStatus;

/**
 * What happened to each sweep: {@code qfleet_sweeps_processed_total{outcome,method}},
 * {@code qfleet_fit_duration_seconds} and {@code qfleet_rejects_total{reason}}. Every label value
 * comes from a closed set, and the series exist from the start at zero, so rates work at once.
 */
final class SweepMeters {

    static final String PROCESSED = "qfleet.sweeps.processed";
    static final String FIT_DURATION = "qfleet.fit.duration";
    static final String REJECTS = "qfleet.rejects";
    static final String REJECTED = "rejected";
    static final String NO_METHOD = "none";

    /** Bucket bounds of the fit time: 10 us to 1 s, 1-2-5 per decade. */
    static final Duration[] FIT_BUCKETS = {micros(10), micros(20), micros(50), micros(100), micros(200), micros(500),
        millis(1), millis(2), millis(5), millis(10), millis(20), millis(50), millis(100), millis(200), millis(500),
        Duration.ofSeconds(1)};

    private final MeterRegistry registry;
    private final Map<VerdictStatus, Map<Method, Counter>> processed = new EnumMap<>(VerdictStatus.class);
    private final Counter rejectedSweeps;
    private final Timer fitDuration;
    private final Map<String, Counter> rejects = new ConcurrentHashMap<>();

    SweepMeters(MeterRegistry registry, Iterable<String> rejectCodes) {
        this.registry = registry;
        for (VerdictStatus status : VerdictStatus.values()) {
            Map<Method, Counter> byMethod = new EnumMap<>(Method.class);
            for (Method method : Method.values()) {
                byMethod.put(method, processedCounter(status.code(), methodLabel(method)));
            }
            processed.put(status, byMethod);
        }
        rejectedSweeps = processedCounter(REJECTED, NO_METHOD);
        fitDuration = Timer.builder(FIT_DURATION)
                .description("Time to fit one sweep (estimator, coupling correction, uncertainty, flags)")
                .serviceLevelObjectives(FIT_BUCKETS)
                .register(registry);
        rejectCodes.forEach(this::rejectCounter);
    }

    /** The {@code method} label of an estimator. */
    static String methodLabel(Method method) {
        return switch (method) {
            case COMPLEX_CIRCLE -> "complex";
            case LORENTZIAN -> "lorentzian";
            case HALF_POWER -> "half-power";
        };
    }

    void fitted(VerdictStatus status, Method method, long fitNanos) {
        processed.get(status).get(method).increment();
        fitDuration.record(fitNanos, TimeUnit.NANOSECONDS);
    }

    void rejected(String code) {
        rejectedSweeps.increment();
        Counter c = rejects.get(code);
        (c != null ? c : rejectCounter(code)).increment();
    }

    private Counter processedCounter(String outcome, String method) {
        return Counter.builder(PROCESSED)
                .description("Sweep messages processed, by verdict (or rejected) and estimator")
                .tag("outcome", outcome)
                .tag("method", method)
                .register(registry);
    }

    /** Reject codes are a closed set; one not known at the start still gets its series. */
    private Counter rejectCounter(String code) {
        return rejects.computeIfAbsent(code, c -> Counter.builder(REJECTS)
                .description("Sweep messages rejected, by reason code")
                .tag("reason", c)
                .register(registry));
    }

    private static Duration micros(long n) {
        return Duration.ofNanos(n * 1000);
    }

    private static Duration millis(long n) {
        return Duration.ofMillis(n);
    }
}
