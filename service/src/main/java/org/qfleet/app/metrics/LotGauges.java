package org.qfleet.app.metrics;

import io.micrometer.core.instrument.Counter;
import io.micrometer.core.instrument.Gauge;
import io.micrometer.core.instrument.Meter;
import io.micrometer.core.instrument.MeterRegistry;
import io.micrometer.core.instrument.Tags;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import org.qfleet.drift.Baseline;
import org.qfleet.drift.LotState;
import org.qfleet.drift.LotStatistics;

/**
 * Gauges of the open lots, {@code qfleet_lot_mean_unloaded_q}, {@code qfleet_lot_units} and
 * {@code qfleet_lot_lower_limit_unloaded_q} with labels {@code product} and {@code lot}: created
 * at a lot's first unit, removed when it closes, and at most {@code cap} lots at a time. A lot
 * opened while the cap is reached is not exported at all and counted once in
 * {@code qfleet_lot_series_dropped_total}.
 */
final class LotGauges {

    static final String MEAN = "qfleet.lot.mean.unloaded.q";
    static final String UNITS = "qfleet.lot.units";
    static final String LOWER_LIMIT = "qfleet.lot.lower.limit.unloaded.q";
    static final String DROPPED = "qfleet.lot.series.dropped";
    /** Dropped lots remembered (so each is counted once) while they are open; beyond, memory wins over exactness. */
    private static final int DROPPED_REMEMBERED = 100_000;

    private final MeterRegistry registry;
    private final CappedMap<LotKey, LotSeries> open;
    private final Set<LotKey> dropped = ConcurrentHashMap.newKeySet();
    private final Counter droppedCounter;

    LotGauges(MeterRegistry registry, int cap) {
        this.registry = registry;
        this.open = new CappedMap<>(cap);
        this.droppedCounter = Counter.builder(DROPPED)
                .description("Open lots not exported because " + cap + " lots were exported already")
                .register(registry);
    }

    void updated(LotState lot, Baseline baseline) {
        LotKey key = new LotKey(lot.product(), lot.lot());
        LotSeries series = open.get(key);
        if (series == null) {
            series = open.open(key, this::register);
            if (series == null) {
                if (firstDrop(key)) {
                    droppedCounter.increment();
                }
                return;
            }
        }
        series.set(lot.stats(), baseline);
    }

    private boolean firstDrop(LotKey key) {
        if (dropped.contains(key)) {
            return false;
        }
        if (dropped.size() < DROPPED_REMEMBERED) {
            dropped.add(key);
        }
        return true;
    }

    void closed(String product, String lot) {
        LotKey key = new LotKey(product, lot);
        dropped.remove(key);
        LotSeries series = open.remove(key);
        if (series != null) {
            series.meters().forEach(registry::remove);
        }
    }

    /** Lots exported now. */
    int exported() {
        return open.size();
    }

    private LotSeries register(LotKey key) {
        return new LotSeries(registry, Tags.of("product", key.product(), "lot", key.lot()));
    }

    private record LotKey(String product, String lot) {
    }

    /** The values behind one lot's gauges, written by a stream thread, read by the scrape. */
    private static final class LotSeries {

        private final MeterRegistry registry;
        private final Tags tags;
        private final List<Meter> meters = new ArrayList<>();
        private volatile double mean = Double.NaN;
        private volatile double units;
        private volatile double lowerLimit = Double.NaN;
        private boolean hasLimit;

        LotSeries(MeterRegistry registry, Tags tags) {
            this.registry = registry;
            this.tags = tags;
            meters.add(Gauge.builder(MEAN, this, s -> s.mean).tags(tags).strongReference(true)
                    .description("Mean fitted Qu of the open lot's trusted units").register(registry));
            meters.add(Gauge.builder(UNITS, this, s -> s.units).tags(tags).strongReference(true)
                    .description("Trusted units in the open lot's statistics").register(registry));
        }

        synchronized void set(LotStatistics stats, Baseline baseline) {
            long n = stats.count();
            units = n;
            mean = n > 0 ? stats.mean() : Double.NaN;
            if (baseline == null) {
                return;
            }
            lowerLimit = bindingLimit(baseline, n);
            if (!hasLimit) {
                hasLimit = true;
                meters.add(Gauge.builder(LOWER_LIMIT, this, s -> s.lowerLimit).tags(tags).strongReference(true)
                        .description("The binding lower limit of the open lot's mean Qu: the higher of the X-bar limit"
                                + " and the product's lot limit")
                        .register(registry));
            }
        }

        synchronized List<Meter> meters() {
            return List.copyOf(meters);
        }
    }

    /**
     * The higher of the X-bar lower limit mu0 - 3 sigma0 / sqrt(n) and the product's lot limit
     * (NaN when neither applies).
     */
    static double bindingLimit(Baseline baseline, long n) {
        double xbar = n > 0 ? baseline.xbarLowerLimit(n) : Double.NaN;
        double lot = baseline.lotLimit();
        if (Double.isNaN(xbar)) {
            return lot;
        }
        return Double.isNaN(lot) ? xbar : Math.max(xbar, lot);
    }
}
