package org.qfleet.drift;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Both monitors in memory, one unit at a time: the drift library for a single JVM pipeline, and
 * the reference the streaming topology is tested against. Not thread-safe.
 */
public final class DriftEngine implements LotMonitor.LotStore {

    private final LotMonitor lots;
    private final StationMonitor stations;
    private final Map<String, ProductState> products = new HashMap<>();
    private final Map<String, LotState> lotStates = new HashMap<>();
    private final Map<String, Map<String, UnitValue>> unitValues = new HashMap<>();
    private final Map<String, StationState> stationStates = new HashMap<>();
    private final Map<String, StationAlerts> stationAlerts = new HashMap<>();
    private final List<LotState> updated = new ArrayList<>();
    private final List<String> closed = new ArrayList<>();

    public DriftEngine(DriftSettings settings) {
        this.lots = new LotMonitor(settings);
        this.stations = new StationMonitor(settings);
    }

    /**
     * What one unit changed, in the order the stream's stages see it.
     *
     * @param lotAlerts   alert messages of the lot side
     * @param lotsUpdated lots whose statistics changed (the unit's own, when open)
     * @param lotsClosed  lots closed by the quiet period or the units that followed them
     * @param baseline    the product's baseline, null while being learned
     * @param station     the charts of the unit's product on its station
     * @param stationAlert the station's alert message, if any
     */
    public record Update(List<Alert> lotAlerts, List<LotState> lotsUpdated, List<String> lotsClosed, Baseline baseline,
            StationState station, Optional<Alert> stationAlert) {

        /** Every alert message, lot side first. */
        public List<Alert> alerts() {
            List<Alert> all = new ArrayList<>(lotAlerts);
            stationAlert.ifPresent(all::add);
            return all;
        }
    }

    /** Takes one unit; returns the alert messages it caused, lot side first. */
    public List<Alert> accept(Measurement m) {
        return update(m).alerts();
    }

    /** Takes one unit; returns all it changed. */
    public Update update(Measurement m) {
        updated.clear();
        closed.clear();
        LotMonitor.Outcome outcome = lots.accept(products.get(m.product()), m, this);
        products.put(m.product(), outcome.product());
        StationInput in = outcome.forward();
        String key = in.product() + "/" + in.station();
        StationMonitor.Step step = stations.accept(stationStates.get(key), stationAlerts.get(in.station()), in);
        stationStates.put(key, step.state());
        stationAlerts.put(in.station(), step.alerts());
        return new Update(outcome.alerts(), List.copyOf(updated), List.copyOf(closed), outcome.product().baseline(), step.state(),
                step.message());
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
        updated.add(state);
    }

    @Override
    public void delete(String product, String lot) {
        lotStates.remove(product + "/" + lot);
        unitValues.remove(product + "/" + lot);
        closed.add(lot);
    }

    @Override
    public UnitValue unit(String product, String lot, String unit) {
        return unitValues.getOrDefault(product + "/" + lot, Map.of()).get(unit);
    }

    @Override
    public void putUnit(String product, String lot, String unit, UnitValue value) {
        unitValues.computeIfAbsent(product + "/" + lot, k -> new HashMap<>()).put(unit, value);
    }
}
