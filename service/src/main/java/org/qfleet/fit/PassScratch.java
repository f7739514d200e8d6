package org.qfleet.fit;

/**
 * The phasor and gain arrays of the passes over the data, one set per thread, reused from pass to
 * pass and fit to fit. Each pass fills them and reads them before it returns and nothing keeps them
 * across passes, so every problem and search on a thread can share one set: a fit then allocates
 * none of them (they were a third of its allocation, and zeroing fresh memory is not free).
 */
final class PassScratch {

    private static final ThreadLocal<PassScratch> PER_THREAD = ThreadLocal.withInitial(PassScratch::new);

    private double[] cos = new double[0];
    private double[] sin = new double[0];
    private double[] gain = new double[0];

    private PassScratch() {
    }

    /** This thread's arrays, each at least {@code n} long (only the first n entries are meaningful). */
    static PassScratch of(int n) {
        PassScratch scratch = PER_THREAD.get();
        if (scratch.cos.length < n) {
            scratch.cos = new double[n];
            scratch.sin = new double[n];
            scratch.gain = new double[n];
        }
        return scratch;
    }

    double[] cos() {
        return cos;
    }

    double[] sin() {
        return sin;
    }

    double[] gain() {
        return gain;
    }
}
