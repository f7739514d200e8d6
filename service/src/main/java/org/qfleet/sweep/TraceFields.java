package org.qfleet.sweep;

/**
 * The arrays of one trace object of a sweep message, and the trace their keys make:
 * {@code {re, im}}, {@code {mag, deg}}, {@code {db, deg}} or {@code {db}} (magnitude only).
 */
final class TraceFields {

    static final String FORMS = "{re, im}, {mag, deg}, {db, deg} or {db}";

    /** The keys a trace object may have. */
    enum Key {
        RE, IM, MAG, DEG, DB;

        private static final Key[] ALL = values();

        String wireName() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }

        static Key of(String name) {
            for (Key key : ALL) {
                if (key.wireName().equals(name)) {
                    return key;
                }
            }
            return null;
        }
    }

    private final String field;
    private final double[][] arrays = new double[Key.ALL.length][];

    TraceFields(String field) {
        this.field = field;
    }

    boolean has(Key key) {
        return arrays[key.ordinal()] != null;
    }

    void put(Key key, double[] values) {
        arrays[key.ordinal()] = values;
    }

    /** Checks the key set and the lengths, and converts to a trace (reusing the arrays). */
    Trace toTrace() throws InvalidSweepException {
        if (only(Key.RE, Key.IM)) {
            return Trace.complex(pair(Key.RE, Key.IM), get(Key.IM));
        }
        if (only(Key.MAG, Key.DEG)) {
            return polar(TouchstoneFormat.MA, pair(Key.MAG, Key.DEG), get(Key.DEG));
        }
        if (only(Key.DB, Key.DEG)) {
            return polar(TouchstoneFormat.DB, pair(Key.DB, Key.DEG), get(Key.DEG));
        }
        if (only(Key.DB, null)) {
            double[] magnitude = get(Key.DB);
            for (int i = 0; i < magnitude.length; i++) {
                magnitude[i] = TouchstoneFormat.linearMagnitude(magnitude[i]);
            }
            return Trace.magnitudeOnly(magnitude);
        }
        throw new InvalidSweepException(SweepError.UNKNOWN_TRACE_FORM,
                "'" + field + "' has keys " + keys() + "; expected " + FORMS);
    }

    private static Trace polar(TouchstoneFormat format, double[] first, double[] degrees) {
        double[] reIm = new double[2];
        for (int i = 0; i < first.length; i++) {
            format.toRectangular(first[i], degrees[i], reIm);
            first[i] = reIm[0];
            degrees[i] = reIm[1];
        }
        return Trace.complex(first, degrees);
    }

    private double[] pair(Key a, Key b) throws InvalidSweepException {
        if (get(a).length != get(b).length) {
            throw new InvalidSweepException(SweepError.LENGTH_MISMATCH, field + "." + b.wireName() + " has "
                    + get(b).length + " values but " + field + "." + a.wireName() + " has " + get(a).length);
        }
        return get(a);
    }

    private boolean only(Key a, Key b) {
        int count = 0;
        for (double[] array : arrays) {
            count += array != null ? 1 : 0;
        }
        return has(a) && (b == null ? count == 1 : has(b) && count == 2);
    }

    private double[] get(Key key) {
        return arrays[key.ordinal()];
    }

    private String keys() {
        StringBuilder keys = new StringBuilder("{");
        for (Key key : Key.ALL) {
            if (has(key)) {
                keys.append(keys.length() > 1 ? ", " : "").append(key.wireName());
            }
        }
        return keys.append('}').toString();
    }
}
