package org.qfleet.stream;

import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The drift states a stage last wrote or read, decoded, by store key: a state is decoded again
 * only when the store holds other bytes than those it was decoded from (after a restore, for
 * example), so the store stays the only source of truth. Decoding the lot and product states for
 * every unit was once the stage's largest cost. Holds at most {@code capacity} states,
 * dropping the least recently used. Not thread-safe: one per processor.
 */
final class DecodedStates<T> {

    private record Entry<T>(byte[] bytes, T value) {
    }

    private final Class<T> type;
    private final Map<String, Entry<T>> entries;

    DecodedStates(Class<T> type, int capacity) {
        this.type = type;
        this.entries = new LinkedHashMap<>(16, 0.75f, true) {
            @Override
            protected boolean removeEldestEntry(Map.Entry<String, Entry<T>> eldest) {
                return size() > capacity;
            }
        };
    }

    /** The state held as {@code bytes} under {@code key}; null for null. */
    T read(String key, byte[] bytes) {
        if (bytes == null) {
            entries.remove(key);
            return null;
        }
        Entry<T> entry = entries.get(key);
        if (entry != null && Arrays.equals(entry.bytes(), bytes)) {
            return entry.value();
        }
        T value = DriftJson.read(bytes, type);
        entries.put(key, new Entry<>(bytes, value));
        return value;
    }

    /** The bytes to store for {@code value} under {@code key}. */
    byte[] write(String key, T value) {
        byte[] bytes = DriftJson.write(value);
        entries.put(key, new Entry<>(bytes, value));
        return bytes;
    }

    void remove(String key) {
        entries.remove(key);
    }

    void clear() {
        entries.clear();
    }
}
