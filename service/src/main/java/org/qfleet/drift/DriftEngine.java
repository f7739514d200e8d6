package org.qfleet.drift;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Both monitors in memory, one unit at a time: the drift library for a single JVM pipeline, and
 * the reference the streaming topology is tested against. Not thread-safe.
 */
public final class DriftEngine implements LotMonitor.LotStore {

    private final LotMonitor lots;
    private final StationMonitor stations;
    private final Map<String, ProductState> products = new HashMap<>();
    private final Map<String, LotState> lotStates = new HashMap<>();
    private final Map<String, StationState> stationStates = new HashMap<>();
    private final Map<String, StationAlerts> stationAlerts = new HashMap<>();

    public DriftEngine(DriftSettings settings) {
        this.lots = new LotMonitor(settings);
        this.stations = new StationMonitor(settings);
    }

    /** Takes one unit; returns the alert messages it caused, lot side first. */
    public List<Alert> accept(Measurement m) {
        LotMonitor.Outcome outcome = lots.accept(products.get(m.product()), m, this);
        products.put(m.product(), outcome.product());
        List<Alert> alerts = new ArrayList<>(outcome.alerts());
        StationInput in = outcome.forward();
        String key = in.product() + "/" + in.station();
        StationMonitor.Step step = stations.accept(stationStates.get(key), stationAlerts.get(in.station()), in);
        stationStates.put(key, step.state());
        stationAlerts.put(in.station(), step.alerts());
        step.message().ifPresent(alerts::add);
        return alerts;
    }

    public ProductState product(String product) {
        return products.get(product);
    }

    public int openLots() {
        return lotStates.size();
    }

    @Override
    public LotState get(String product, String lot) {
        return lotStates.get(product + "/" + lot);
    }

    @Override
    public void put(LotState state) {
        lotStates.put(state.product() + "/" + state.lot(), state);
    }

    @Override
    public void delete(String product, String lot) {
        lotStates.remove(product + "/" + lot);
    }
}
