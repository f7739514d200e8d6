package org.qfleet.stream;

import java.util.ArrayList;
import java.util.List;
import org.apache.kafka.streams.processor.api.ContextualProcessor;
import org.apache.kafka.streams.processor.api.ProcessorContext;
import org.apache.kafka.streams.processor.api.Record;
import org.apache.kafka.streams.state.KeyValueStore;
import org.qfleet.drift.Alert;
import org.qfleet.drift.LotMonitor;
import org.qfleet.drift.LotState;
import org.qfleet.drift.Measurement;
import org.qfleet.drift.ProductState;

/**
 * The lot stage, on measurements keyed by product: {@link LotMonitor} with the product states and
 * the lot states in changelogged stores. Forwards alert messages (keyed by alert key) and station
 * inputs (keyed by product/station), told apart by {@link DriftRecords}.
 */
final class LotStageProcessor extends ContextualProcessor<String, byte[], String, byte[]> {

    /** Lots a task keeps decoded (open lots, in practice); others are decoded from the store when they come back. */
    private static final int DECODED_LOTS = 256;
    private static final int DECODED_PRODUCTS = 256;

    private final LotMonitor monitor;
    private final AlertJson alertJson = new AlertJson();
    private final DecodedStates<ProductState> productStates = new DecodedStates<>(ProductState.class, DECODED_PRODUCTS);
    private final DecodedStates<LotState> lotStates = new DecodedStates<>(LotState.class, DECODED_LOTS);
    private KeyValueStore<String, byte[]> products;
    private KeyValueStore<String, byte[]> lots;

    private final ServiceObserver observer;

    LotStageProcessor(LotMonitor monitor, ServiceObserver observer) {
        this.monitor = monitor;
        this.observer = observer;
    }

    @Override
    public void init(ProcessorContext<String, byte[]> context) {
        super.init(context);
        products = context.getStateStore(DriftTopology.PRODUCTS_STORE);
        lots = context.getStateStore(DriftTopology.LOTS_STORE);
        productStates.clear();
        lotStates.clear();
    }

    @Override
    public void process(Record<String, byte[]> record) {
        Measurement m = DriftJson.read(record.value(), Measurement.class);
        ProductState before = productStates.read(m.product(), products.get(m.product()));
        List<LotState> updated = new ArrayList<>();
        List<String> closed = new ArrayList<>();
        LotMonitor.Outcome outcome = monitor.accept(before, m, new LotMonitor.LotStore() {
            @Override
            public LotState get(String product, String lot) {
                String key = product + "/" + lot;
                return lotStates.read(key, lots.get(key));
            }

            @Override
            public void put(LotState state) {
                String key = state.product() + "/" + state.lot();
                lots.put(key, lotStates.write(key, state));
                updated.add(state);
            }

            @Override
            public void delete(String product, String lot) {
                String key = product + "/" + lot;
                lots.delete(key);
                lotStates.remove(key);
                closed.add(lot);
            }
        });
        products.put(m.product(), productStates.write(m.product(), outcome.product()));
        for (Alert a : outcome.alerts()) {
            context().forward(record.withKey(a.key()).withValue(DriftRecords.alert(alertJson.write(a))));
            observer.alertPublished(a);
        }
        updated.forEach(lot -> observer.lotUpdated(lot, outcome.product().baseline()));
        closed.forEach(lot -> observer.lotClosed(m.product(), lot));
        String stationKey = m.product() + "/" + m.station();
        context().forward(record.withKey(stationKey).withValue(DriftRecords.stationInput(DriftJson.write(outcome.forward()))));
    }
}
