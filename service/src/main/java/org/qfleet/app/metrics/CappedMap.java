package org.qfleet.app.metrics;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Function;

/**
 * Series sets by key, at most {@code cap} of them: reads are lock-free (the stream threads' path),
 * opening and removing are serialized so the cap holds exactly.
 */
final class CappedMap<K, V> {

    private final Map<K, V> open = new ConcurrentHashMap<>();
    private final int cap;

    CappedMap(int cap) {
        if (cap < 0) {
            throw new IllegalArgumentException("the cap must not be negative, got " + cap);
        }
        this.cap = cap;
    }

    V get(K key) {
        return open.get(key);
    }

    /** The value of {@code key}, created now if there is room; null when the map is full. */
    synchronized V open(K key, Function<K, V> create) {
        V value = open.get(key);
        if (value == null && open.size() < cap) {
            value = create.apply(key);
            open.put(key, value);
        }
        return value;
    }

    synchronized V remove(K key) {
        return open.remove(key);
    }

    int size() {
        return open.size();
    }

    int cap() {
        return cap;
    }
}
