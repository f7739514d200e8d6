package org.qfleet.app.metrics;

import io.micrometer.core.instrument.Gauge;
import io.micrometer.core.instrument.MeterRegistry;
import io.micrometer.core.instrument.Tags;
import java.util.function.ToDoubleFunction;
import org.qfleet.drift.StationState;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Gauges of each station's charts, with labels {@code product} and {@code station}:
 * {@code qfleet_station_qu_ewma} (the EWMA statistic z of the standardized Qu deviation) and its
 * limit {@code qfleet_station_qu_ewma_limit}; {@code qfleet_station_cusum} with {@code chart}
 * ({@code f0}, {@code coupling}) and {@code side} ({@code upper}, {@code lower}), and its decision
 * interval h, {@code qfleet_station_cusum_limit}. All in units of the standardized deviation.
 * At most {@code cap} stations are exported (the first ones seen); the rest is said once in the log.
 */
final class StationGauges {

    static final String EWMA = "qfleet.station.qu.ewma";
    static final String EWMA_LIMIT = "qfleet.station.qu.ewma.limit";
    static final String CUSUM = "qfleet.station.cusum";
    static final String CUSUM_LIMIT = "qfleet.station.cusum.limit";
    private static final Logger LOG = LoggerFactory.getLogger(StationGauges.class);

    private final MeterRegistry registry;
    private final CappedMap<String, Holder> stations;
    private volatile boolean saidFull;

    StationGauges(MeterRegistry registry, int cap) {
        this.registry = registry;
        this.stations = new CappedMap<>(cap);
    }

    void updated(StationState station) {
        String key = station.product() + "/" + station.station();
        Holder holder = stations.get(key);
        if (holder == null) {
            holder = stations.open(key, k -> register(station));
        }
        if (holder != null) {
            holder.state = station;
        } else if (!saidFull) {
            saidFull = true;
            LOG.warn("more than {} stations: the charts of station {} ({}) and of further new ones are not exported",
                    stations.cap(), station.station(), station.product());
        }
    }

    int exported() {
        return stations.size();
    }

    private Holder register(StationState first) {
        Holder h = new Holder(first);
        Tags tags = Tags.of("product", first.product(), "station", first.station());
        gauge(EWMA, "EWMA statistic z of the station's standardized Qu deviation", tags, h, s -> s.qu().z());
        gauge(EWMA_LIMIT, "Limit of the station's Qu EWMA (both sides)", tags, h, s -> s.qu().limit());
        gauge(CUSUM, "Tabular CUSUM of the station's standardized deviation", tags.and("chart", "f0", "side", "upper"), h,
                s -> s.f0().upper());
        gauge(CUSUM, "Tabular CUSUM of the station's standardized deviation", tags.and("chart", "f0", "side", "lower"), h,
                s -> s.f0().lower());
        gauge(CUSUM, "Tabular CUSUM of the station's standardized deviation", tags.and("chart", "coupling", "side", "upper"), h,
                s -> s.level().upper());
        gauge(CUSUM, "Tabular CUSUM of the station's standardized deviation", tags.and("chart", "coupling", "side", "lower"), h,
                s -> s.level().lower());
        gauge(CUSUM_LIMIT, "Decision interval h of the station's CUSUMs", tags, h, s -> s.f0().h());
        return h;
    }

    private void gauge(String name, String description, Tags tags, Holder holder, ToDoubleFunction<StationState> value) {
        Gauge.builder(name, holder, h -> value.applyAsDouble(h.state)).tags(tags).description(description)
                .strongReference(true).register(registry);
    }

    /** The latest state of one station, written by a stream thread, read by the scrape. */
    private static final class Holder {
        volatile StationState state;

        Holder(StationState state) {
            this.state = state;
        }
    }
}
