package org.qfleet.app.status;

import java.util.ArrayList;
import java.util.List;

/**
 * A series of chart points that never holds more than its capacity: when full, every second point
 * is dropped (the first and the newest are always kept) before the next one goes in, so the whole
 * history stays drawn, older stretches more thinly than recent ones. Not thread-safe.
 */
final class ThinnedSeries<T> {

    static final int MIN_CAPACITY = 4;

    private final int capacity;
    private final ArrayList<T> points;

    ThinnedSeries(int capacity) {
        if (capacity < MIN_CAPACITY) {
            throw new IllegalArgumentException("a chart series needs room for at least " + MIN_CAPACITY
                    + " points, got " + capacity);
        }
        this.capacity = capacity;
        this.points = new ArrayList<>(capacity);
    }

    void add(T point) {
        if (points.size() >= capacity) {
            thin();
        }
        points.add(point);
    }

    /** The newest point, or null when empty. */
    T last() {
        return points.isEmpty() ? null : points.get(points.size() - 1);
    }

    void removeLast() {
        points.remove(points.size() - 1);
    }

    int size() {
        return points.size();
    }

    List<T> toList() {
        return List.copyOf(points);
    }

    private void thin() {
        int last = points.size() - 1;
        int kept = 0;
        for (int i = 0; i <= last; i += 2) {
            points.set(kept++, points.get(i));
        }
        if (last % 2 != 0) {
            points.set(kept++, points.get(last));
        }
        points.subList(kept, points.size()).clear();
    }
}
