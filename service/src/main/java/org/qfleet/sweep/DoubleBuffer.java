package org.qfleet.sweep;

import java.util.Arrays;

/** A growable array of primitive doubles that refuses to grow past a fixed bound. */
final class DoubleBuffer {

    private static final int INITIAL_CAPACITY = 64;

    private final int limit;
    private double[] values;
    private int size;

    DoubleBuffer(int limit) {
        this(limit, INITIAL_CAPACITY);
    }

    /** A buffer that starts with room for {@code expected} values (at most {@code limit}). */
    DoubleBuffer(int limit, int expected) {
        this.limit = limit;
        this.values = new double[Math.max(1, Math.min(limit, expected))];
    }

    /** Appends a value; false (and nothing appended) when the buffer already holds {@code limit} values. */
    boolean add(double value) {
        if (size == values.length) {
            if (size >= limit) {
                return false;
            }
            values = Arrays.copyOf(values, (int) Math.min(limit, 2L * size));
        }
        values[size++] = value;
        return true;
    }

    int size() {
        return size;
    }

    /** The values as an array of exactly {@link #size()} elements; call once, when done adding. */
    double[] toArray() {
        return size == values.length ? values : Arrays.copyOf(values, size);
    }
}
