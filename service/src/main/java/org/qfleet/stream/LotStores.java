package org.qfleet.stream;

import java.util.ArrayList;
import java.util.List;
import org.apache.kafka.common.serialization.StringSerializer;
import org.apache.kafka.streams.KeyValue;
import org.apache.kafka.streams.state.KeyValueIterator;
import org.apache.kafka.streams.state.KeyValueStore;
import org.qfleet.drift.LotMonitor;
import org.qfleet.drift.LotState;
import org.qfleet.drift.UnitValue;

/**
 * The lot stage's lots on Kafka Streams stores: one entry per lot (its statistics, small whatever
 * its size) and one per unit (the value a retest replaces), deleted together when the lot closes.
 * Remembers which lots one unit updated and closed, for the observer.
 */
final class LotStores implements LotMonitor.LotStore {

    private static final char SEPARATOR = '\u001f';
    /** Lots a task keeps decoded (open lots, in practice); others are decoded from the store when they come back. */
    private static final int DECODED_LOTS = 256;

    private final KeyValueStore<String, byte[]> lots;
    private final KeyValueStore<String, byte[]> units;
    private final List<LotState> updated = new ArrayList<>();
    private final List<String> closed = new ArrayList<>();
    private final DecodedStates<LotState> decoded = new DecodedStates<>(LotState.class, DECODED_LOTS);

    LotStores(KeyValueStore<String, byte[]> lots, KeyValueStore<String, byte[]> units) {
        this.lots = lots;
        this.units = units;
    }

    @Override
    public LotState get(String product, String lot) {
        String key = lotKey(product, lot);
        return decoded.read(key, lots.get(key));
    }

    @Override
    public void put(LotState state) {
        String key = lotKey(state.product(), state.lot());
        lots.put(key, decoded.write(key, state));
        updated.add(state);
    }

    @Override
    public void delete(String product, String lot) {
        lots.delete(lotKey(product, lot));
        decoded.remove(lotKey(product, lot));
        List<String> keys = new ArrayList<>();
        try (KeyValueIterator<String, byte[]> it = units.prefixScan(unitPrefix(product, lot), new StringSerializer())) {
            while (it.hasNext()) {
                KeyValue<String, byte[]> entry = it.next();
                keys.add(entry.key);
            }
        }
        keys.forEach(units::delete);
        closed.add(lot);
    }

    @Override
    public UnitValue unit(String product, String lot, String unit) {
        return DriftJson.read(units.get(unitPrefix(product, lot) + unit), UnitValue.class);
    }

    @Override
    public void putUnit(String product, String lot, String unit, UnitValue value) {
        units.put(unitPrefix(product, lot) + unit, DriftJson.write(value));
    }

    /** Lots the last unit updated, in order; cleared by reading. */
    List<LotState> drainUpdated() {
        List<LotState> out = List.copyOf(updated);
        updated.clear();
        return out;
    }

    /** Lots the last unit closed, in order; cleared by reading. */
    List<String> drainClosed() {
        List<String> out = List.copyOf(closed);
        closed.clear();
        return out;
    }

    private static String lotKey(String product, String lot) {
        return product + "/" + lot;
    }

    private static String unitPrefix(String product, String lot) {
        return product + SEPARATOR + lot + SEPARATOR;
    }
}
