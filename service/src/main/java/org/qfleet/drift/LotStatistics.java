package org.qfleet.drift;

import java.util.HashMap;
import java.util.Map;
import java.util.TreeMap;

/**
 * A lot's trusted units: Qu count, mean and variance (Welford) over the lot and per station, with
 * f0 and the coupling level per station besides. A retest (the same unit again) replaces the
 * unit's earlier value: the lot's statistics describe its units, each once, as last measured.
 * Immutable.
 *
 * @param qu        Qu over the whole lot
 * @param byStation statistics per station
 * @param units     each unit's value in the statistics
 */
public record LotStatistics(Welford qu, Map<String, StationShare> byStation, Map<String, UnitValue> units) {

    public static final LotStatistics EMPTY = new LotStatistics(Welford.EMPTY, Map.of(), Map.of());

    public LotStatistics {
        byStation = Map.copyOf(byStation);
        units = Map.copyOf(units);
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

    /** With the trusted measurement {@code m} in, replacing the unit's earlier value if it had one. */
    public LotStatistics plus(Measurement m) {
        Map<String, StationShare> stations = new HashMap<>(byStation);
        Map<String, UnitValue> values = new HashMap<>(units);
        Welford total = qu;
        UnitValue earlier = values.get(m.unit());
        if (earlier != null) {
            total = total.minus(earlier.qUnloaded());
            StationShare share = stations.get(earlier.station()).minus(earlier);
            if (share.qu().n() == 0) {
                stations.remove(earlier.station());
            } else {
                stations.put(earlier.station(), share);
            }
        }
        UnitValue now = UnitValue.of(m);
        values.put(m.unit(), now);
        stations.put(m.station(), stations.getOrDefault(m.station(), StationShare.EMPTY).plus(now));
        return new LotStatistics(total.plus(m.qUnloaded()), stations, values);
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
