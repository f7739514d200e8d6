package org.qfleet.stream;

import org.apache.kafka.streams.processor.api.ContextualProcessor;
import org.apache.kafka.streams.processor.api.ProcessorContext;
import org.apache.kafka.streams.processor.api.Record;
import org.apache.kafka.streams.state.KeyValueStore;
import org.qfleet.drift.StationInput;
import org.qfleet.drift.StationMonitor;
import org.qfleet.drift.StationState;

/** The station stage, on station inputs keyed by product/station: {@link StationMonitor} with a changelogged store. */
final class StationStageProcessor extends ContextualProcessor<String, byte[], String, byte[]> {

    private final StationMonitor monitor;
    private final AlertJson alertJson = new AlertJson();
    private KeyValueStore<String, byte[]> stations;

    private final ServiceObserver observer;

    StationStageProcessor(StationMonitor monitor, ServiceObserver observer) {
        this.monitor = monitor;
        this.observer = observer;
    }

    @Override
    public void init(ProcessorContext<String, byte[]> context) {
        super.init(context);
        stations = context.getStateStore(DriftTopology.STATIONS_STORE);
    }

    @Override
    public void process(Record<String, byte[]> record) {
        StationInput in = DriftJson.read(record.value(), StationInput.class);
        StationMonitor.Step step = monitor.accept(DriftJson.read(stations.get(record.key()), StationState.class), in);
        stations.put(record.key(), DriftJson.write(step.state()));
        observer.stationUpdated(step.state());
        step.message().ifPresent(a -> {
            context().forward(record.withKey(a.key()).withValue(alertJson.write(a)));
            observer.alertPublished(a);
        });
    }
}
