package org.qfleet.drift;

/**
 * Two-sided EWMA chart of standardized values (in-control mean 0, standard deviation 1):
 * z_i = lambda x_i + (1 - lambda) z_(i-1), signal when |z| exceeds the asymptotic limit
 * L sqrt(lambda / (2 - lambda)) (Lucas & Saccucci, Technometrics 32(1), 1, 1990; lambda = 0.2 with
 * L = 2.962 gives an in-control average run length of 500).
 *
 * <p>After a signal the chart stays signalled until the process is back: |z| inside its limit
 * and a slow EWMA of the same values (lambda 0.05, whose in-control standard deviation is 0.16)
 * within +-{@link #RECOVERED_WITHIN}, three of its standard deviations. The fast chart alone
 * would drop back inside its limit now and then during a shift of about one sigma, raising and
 * clearing by turns; the slow one does not (common practice: recovery judged on a longer window
 * than detection). Immutable.
 */
public record Ewma(double lambda, double width, double z, double slow, long samples, boolean signalled) {

    public static final double DEFAULT_LAMBDA = 0.2;
    public static final double DEFAULT_WIDTH = 2.962;
    static final double SLOW_LAMBDA = 0.05;
    static final double RECOVERED_WITHIN = 0.5;

    public static Ewma start(double lambda, double width) {
        if (!(lambda > 0 && lambda <= 1) || !(width > 0)) {
            throw new IllegalArgumentException("EWMA needs 0 < lambda <= 1 and L > 0, got " + lambda + " and " + width);
        }
        return new Ewma(lambda, width, 0, 0, 0, false);
    }

    public double limit() {
        return width * Math.sqrt(lambda / (2 - lambda));
    }

    public Ewma plus(double x) {
        double next = lambda * x + (1 - lambda) * z;
        double nextSlow = SLOW_LAMBDA * x + (1 - SLOW_LAMBDA) * slow;
        boolean out = Math.abs(next) > limit();
        boolean stillOut = signalled && Math.abs(nextSlow) > RECOVERED_WITHIN;
        return new Ewma(lambda, width, next, nextSlow, samples + 1, out || stillOut);
    }

    /** Whether this value took the chart beyond its limit (a signal, not only a signalled state). */
    public boolean beyondLimit() {
        return Math.abs(z) > limit();
    }

    /** The chart started afresh after a signal that waits for confirmation; the slow EWMA goes on. */
    public Ewma restarted() {
        return new Ewma(lambda, width, 0, slow, samples, false);
    }

    /**
     * Whether the slow EWMA is outside its recovery band too: a signal that the longer window does
     * not back is a brief excursion that would clear at once, not a shift worth an alert.
     */
    public boolean sustained() {
        return Math.abs(slow) > RECOVERED_WITHIN;
    }
}
