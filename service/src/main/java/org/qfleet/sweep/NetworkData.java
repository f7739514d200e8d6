package org.qfleet.sweep;

import java.util.EnumMap;
import java.util.Map;

/**
 * Collects the network data of a Touchstone file: one record per frequency (the frequency, then
 * one pair of numbers per S-parameter), which may be spread over several lines but always starts
 * on a new line. Converts frequencies to hertz and pairs to complex values as it goes.
 */
final class NetworkData {

    private final SParameter[] order;
    private final TouchstoneOptions options;
    private final int recordSize;
    private final int maxPoints;
    private final int declaredFrequencies;
    private final boolean noiseMayFollow;
    private final double[] record;
    private final double[] reIm = new double[2];
    private final DoubleBuffer frequencies;
    private final DoubleBuffer[] re;
    private final DoubleBuffer[] im;
    private int pending;
    private int recordLine;
    private double previousFrequency;

    /**
     * @param order               the S-parameter of each pair in a record
     * @param declaredFrequencies the count a 2.0 header declares, or -1
     * @param noiseMayFollow      true for 1.1 two-port files, where noise data starts at the first
     *                            frequency not above the previous one
     */
    NetworkData(SParameter[] order, TouchstoneOptions options, int maxPoints, int declaredFrequencies,
            boolean noiseMayFollow) {
        this.order = order;
        this.options = options;
        this.recordSize = 1 + 2 * order.length;
        this.maxPoints = maxPoints;
        this.declaredFrequencies = declaredFrequencies;
        this.noiseMayFollow = noiseMayFollow;
        this.record = new double[recordSize];
        this.frequencies = new DoubleBuffer(maxPoints);
        this.re = new DoubleBuffer[order.length];
        this.im = new DoubleBuffer[order.length];
        for (int k = 0; k < order.length; k++) {
            re[k] = new DoubleBuffer(maxPoints);
            im[k] = new DoubleBuffer(maxPoints);
        }
    }

    /** Takes the numbers of one line; false, taking nothing, when the line starts 1.1 noise data. */
    boolean add(double[] values, int count, int lineNumber) throws InvalidSweepException {
        if (pending == 0) {
            double frequency = values[0];
            if (frequencies.size() > 0 && frequency <= previousFrequency) {
                if (noiseMayFollow) {
                    return false;
                }
                throw new InvalidSweepException(SweepError.NOT_ASCENDING, "line " + lineNumber + ": frequency "
                        + frequency + " " + options.unit().symbol() + " is not above the previous one ("
                        + previousFrequency + " " + options.unit().symbol() + ")");
            }
            if (frequency <= 0) {
                throw new InvalidSweepException(SweepError.NOT_ASCENDING, "line " + lineNumber + ": frequency "
                        + frequency + " " + options.unit().symbol() + " is not positive");
            }
            recordLine = lineNumber;
        }
        if (pending + count > recordSize) {
            throw wrongCount(pending == 0 ? count : pending);
        }
        if (pending == 0 && count == recordSize) {
            emit(values); // the usual case: a whole record on one line
            return true;
        }
        System.arraycopy(values, 0, record, pending, count);
        pending += count;
        if (pending == recordSize) {
            emit(record);
            pending = 0;
        }
        return true;
    }

    /** Checks that the last record is complete. */
    void finish() throws InvalidSweepException {
        if (pending != 0) {
            throw wrongCount(pending);
        }
    }

    int count() {
        return frequencies.size();
    }

    double[] frequencyHz() {
        return frequencies.toArray();
    }

    Map<SParameter, Trace> traces() {
        Map<SParameter, Trace> traces = new EnumMap<>(SParameter.class);
        for (int k = 0; k < order.length; k++) {
            traces.put(order[k], Trace.complex(re[k].toArray(), im[k].toArray()));
        }
        return traces;
    }

    private void emit(double[] numbers) throws InvalidSweepException {
        if (frequencies.size() == declaredFrequencies) {
            throw new InvalidSweepException(SweepError.TOUCHSTONE_SYNTAX, "line " + recordLine
                    + ": more frequencies than the " + declaredFrequencies + " declared by [Number of Frequencies]");
        }
        if (!frequencies.add(numbers[0] * options.unit().hertz())) {
            throw new InvalidSweepException(SweepError.TOO_MANY_POINTS,
                    "line " + recordLine + ": more than " + maxPoints + " frequencies");
        }
        previousFrequency = numbers[0];
        TouchstoneFormat format = options.format();
        for (int k = 0; k < order.length; k++) {
            if (format == TouchstoneFormat.RI) {
                re[k].add(numbers[1 + 2 * k]);
                im[k].add(numbers[2 + 2 * k]);
            } else {
                format.toRectangular(numbers[1 + 2 * k], numbers[2 + 2 * k], reIm);
                re[k].add(reIm[0]);
                im[k].add(reIm[1]);
            }
        }
    }

    private InvalidSweepException wrongCount(int found) {
        return new InvalidSweepException(SweepError.TOUCHSTONE_SYNTAX, "line " + recordLine + ": expected "
                + recordSize + " numbers per frequency, found " + found);
    }
}
