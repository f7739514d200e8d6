package org.qfleet.stream;

import org.apache.kafka.streams.processor.api.ContextualProcessor;
import org.apache.kafka.streams.processor.api.ProcessorContext;
import org.apache.kafka.streams.processor.api.Record;
import org.apache.kafka.streams.state.KeyValueStore;
import org.qfleet.drift.StationAlerts;
import org.qfleet.drift.StationInput;
import org.qfleet.drift.StationMonitor;
import org.qfleet.drift.StationState;

/**
 * The station stage, on station inputs keyed by station: {@link StationMonitor} with the charts of
 * each product on the station (store key product/station) and the station's shared alert state
 * (store key station) in changelogged stores.
 */
final class StationStageProcessor extends ContextualProcessor<String, byte[], String, byte[]> {

    /** Charts (product and station) and stations a task keeps decoded; others are decoded from the store. */
    private static final int DECODED_CHARTS = 1024;
    private static final int DECODED_STATIONS = 512;

    private final StationMonitor monitor;
    private final AlertJson alertJson = new AlertJson();
    private final DecodedStates<StationState> charts = new DecodedStates<>(StationState.class, DECODED_CHARTS);
    private final DecodedStates<StationAlerts> alerts = new DecodedStates<>(StationAlerts.class, DECODED_STATIONS);
    private KeyValueStore<String, byte[]> stations;
    private KeyValueStore<String, byte[]> stationAlerts;

    private final ServiceObserver observer;

    StationStageProcessor(StationMonitor monitor, ServiceObserver observer) {
        this.monitor = monitor;
        this.observer = observer;
    }

    @Override
    public void init(ProcessorContext<String, byte[]> context) {
        super.init(context);
        stations = context.getStateStore(DriftTopology.STATIONS_STORE);
        stationAlerts = context.getStateStore(DriftTopology.STATION_ALERTS_STORE);
        charts.clear();
        alerts.clear();
    }

    @Override
    public void process(Record<String, byte[]> record) {
        StationInput in = DriftJson.read(record.value(), StationInput.class);
        String chartsKey = in.product() + "/" + in.station();
        StationMonitor.Step step = monitor.accept(charts.read(chartsKey, stations.get(chartsKey)),
                alerts.read(in.station(), stationAlerts.get(in.station())), in);
        stations.put(chartsKey, charts.write(chartsKey, step.state()));
        stationAlerts.put(in.station(), alerts.write(in.station(), step.alerts()));
        observer.stationUpdated(step.state());
        step.message().ifPresent(a -> {
            context().forward(record.withKey(a.key()).withValue(alertJson.write(a)));
            observer.alertPublished(a);
        });
    }
}
