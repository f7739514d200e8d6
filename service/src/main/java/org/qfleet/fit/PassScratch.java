package org.qfleet.fit;

/**
 * The gain array of the passes over the data with a magnitude tilt, one per thread, reused from
 * pass to pass and fit to fit. A pass fills it and reads it before it returns and nothing keeps it
 * across passes, so every problem on a thread can share it and a fit allocates none.
 */
final class PassScratch {

    private static final ThreadLocal<PassScratch> PER_THREAD = ThreadLocal.withInitial(PassScratch::new);

    private double[] gain = new double[0];

    private PassScratch() {
    }

    /** This thread's gain array, at least {@code n} long (only the first n entries are meaningful). */
    static double[] gain(int n) {
        PassScratch scratch = PER_THREAD.get();
        if (scratch.gain.length < n) {
            scratch.gain = new double[n];
        }
        return scratch.gain;
    }
}
