package org.qfleet.drift;

import java.util.HashMap;
import java.util.Map;
import java.util.TreeMap;

/**
 * A lot's trusted units: Qu count, mean and variance (Welford) over the lot and per station, with
 * f0 and the coupling level per station besides. A retest (the same unit again) replaces the
 * unit's earlier value: the lot's statistics describe its units, each once, as last measured.
 * The units' own values are kept apart ({@link LotMonitor.LotStore#unit}), so this record stays
 * small however large the lot. Immutable.
 *
 * @param qu        Qu over the whole lot
 * @param byStation statistics per station
 */
public record LotStatistics(Welford qu, Map<String, StationShare> byStation) {

    public static final LotStatistics EMPTY = new LotStatistics(Welford.EMPTY, Map.of());

    public LotStatistics {
        byStation = Map.copyOf(byStation);
    }

    public long count() {
        return qu.n();
    }

    public double mean() {
        return qu.mean();
    }

    public double variance() {
        return qu.variance();
    }

    /** With the trusted value {@code now} in, replacing {@code earlier}, the unit's earlier value, if not null. */
    public LotStatistics plus(UnitValue now, UnitValue earlier) {
        Map<String, StationShare> stations = new HashMap<>(byStation);
        Welford total = qu;
        if (earlier != null) {
            total = total.minus(earlier.qUnloaded());
            StationShare share = stations.get(earlier.station()).minus(earlier);
            if (share.qu().n() == 0) {
                stations.remove(earlier.station());
            } else {
                stations.put(earlier.station(), share);
            }
        }
        stations.put(now.station(), stations.getOrDefault(now.station(), StationShare.EMPTY).plus(now));
        return new LotStatistics(total.plus(now.qUnloaded()), stations);
    }

    /** The lot's units measured on every station but {@code station}. */
    public StationShare others(String station) {
        StationShare rest = StationShare.EMPTY;
        for (Map.Entry<String, StationShare> e : byStation.entrySet()) {
            if (!e.getKey().equals(station)) {
                rest = rest.combine(e.getValue());
            }
        }
        return rest;
    }

    /** Station with the lowest mean Qu, or null for an empty lot. */
    public String lowestStation() {
        return new TreeMap<>(byStation).entrySet().stream()
                .min((a, b) -> Double.compare(a.getValue().qu().mean(), b.getValue().qu().mean()))
                .map(Map.Entry::getKey).orElse(null);
    }
}
