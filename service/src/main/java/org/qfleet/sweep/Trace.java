package org.qfleet.sweep;

/**
 * One measured S-parameter as complex samples, one per sweep frequency. Magnitude-only data
 * ({@code phaseKnown == false}) keeps the linear magnitude in {@code re} and zeros in {@code im}.
 * The arrays are owned by the trace: readers hand them over and nobody writes to them afterwards.
 */
public record Trace(double[] re, double[] im, boolean phaseKnown) {

    public Trace {
        if (re.length != im.length) {
            throw new IllegalArgumentException("re and im differ in length");
        }
    }

    public static Trace complex(double[] re, double[] im) {
        return new Trace(re, im, true);
    }

    public static Trace magnitudeOnly(double[] linearMagnitude) {
        return new Trace(linearMagnitude, new double[linearMagnitude.length], false);
    }

    public int size() {
        return re.length;
    }

    public double magnitude(int i) {
        return Math.hypot(re[i], im[i]);
    }

    public double magnitudeSquared(int i) {
        return re[i] * re[i] + im[i] * im[i];
    }
}
