package org.qfleet.stream;

import org.apache.kafka.streams.processor.api.ContextualProcessor;
import org.apache.kafka.streams.processor.api.ProcessorContext;
import org.apache.kafka.streams.processor.api.Record;
import org.apache.kafka.streams.state.KeyValueStore;
import org.qfleet.drift.Alert;
import org.qfleet.drift.LotMonitor;
import org.qfleet.drift.Measurement;
import org.qfleet.drift.ProductState;

/**
 * The lot stage, on measurements keyed by product: {@link LotMonitor} with the product states, the
 * lot states and their units' values in changelogged stores. Forwards alert messages (keyed by alert key) and station
 * inputs (keyed by station), told apart by {@link DriftRecords}.
 */
final class LotStageProcessor extends ContextualProcessor<String, byte[], String, byte[]> {

    /** Products a task keeps decoded; others are decoded from the store when they come back. */
    private static final int DECODED_PRODUCTS = 256;

    private final LotMonitor monitor;
    private final AlertJson alertJson = new AlertJson();
    private final DecodedStates<ProductState> productStates = new DecodedStates<>(ProductState.class, DECODED_PRODUCTS);
    private KeyValueStore<String, byte[]> products;
    private LotStores lots;

    private final ServiceObserver observer;

    LotStageProcessor(LotMonitor monitor, ServiceObserver observer) {
        this.monitor = monitor;
        this.observer = observer;
    }

    @Override
    public void init(ProcessorContext<String, byte[]> context) {
        super.init(context);
        products = context.getStateStore(DriftTopology.PRODUCTS_STORE);
        productStates.clear();
        lots = new LotStores(context.getStateStore(DriftTopology.LOTS_STORE), context.getStateStore(DriftTopology.UNITS_STORE));
    }

    @Override
    public void process(Record<String, byte[]> record) {
        Measurement m = DriftJson.read(record.value(), Measurement.class);
        ProductState before = productStates.read(m.product(), products.get(m.product()));
        LotMonitor.Outcome outcome = monitor.accept(before, m, lots);
        products.put(m.product(), productStates.write(m.product(), outcome.product()));
        for (Alert a : outcome.alerts()) {
            context().forward(record.withKey(a.key()).withValue(DriftRecords.alert(alertJson.write(a))));
            observer.alertPublished(a);
        }
        lots.drainUpdated().forEach(lot -> observer.lotUpdated(lot, outcome.product().baseline()));
        lots.drainClosed().forEach(lot -> observer.lotClosed(m.product(), lot));
        context().forward(record.withKey(m.station()).withValue(DriftRecords.stationInput(DriftJson.write(outcome.forward()))));
    }
}
