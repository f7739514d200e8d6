package org.qfleet.app.plot;

/** The smallest and largest finite values seen; empty until a finite value arrives. */
record Range(double min, double max) {

    static final Range EMPTY = new Range(Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY);

    static Range of(double[] values) {
        Range r = EMPTY;
        for (double v : values) {
            r = r.with(v);
        }
        return r;
    }

    Range with(double value) {
        if (!Double.isFinite(value) || (value >= min && value <= max)) {
            return this;
        }
        return new Range(Math.min(min, value), Math.max(max, value));
    }

    /** The union of both ranges. */
    Range with(Range other) {
        return other.isEmpty() ? this : with(other.min).with(other.max);
    }

    boolean isEmpty() {
        return min > max;
    }

    double span() {
        return isEmpty() ? 0 : max - min;
    }

    double center() {
        return isEmpty() ? 0 : (min + max) / 2;
    }

    /** Widened by {@code fraction} of the span on each side, and by at least {@code minimum}. */
    Range padded(double fraction, double minimum) {
        if (isEmpty()) {
            return new Range(-minimum, minimum);
        }
        double pad = Math.max(span() * fraction, minimum);
        return new Range(min - pad, max + pad);
    }
}
