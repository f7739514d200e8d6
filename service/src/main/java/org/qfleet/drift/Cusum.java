package org.qfleet.drift;

/**
 * Two-sided tabular CUSUM of standardized values (in-control mean 0, standard deviation 1):
 * C+ = max(0, x - k + C+), C- = max(0, -x - k + C-), signal when either exceeds h (Montgomery,
 * Introduction to Statistical Quality Control, the tabular CUSUM, as recalled from memory; k = 0.5
 * and h = 5 give an in-control average run length near 465). After a signal the sums are capped at
 * 2h and the chart stays signalled until both are back to h/2 or less. Immutable.
 */
public record Cusum(double k, double h, double upper, double lower, long samples, boolean signalled) {

    public static final double DEFAULT_K = 0.5;
    public static final double DEFAULT_H = 5;

    public static Cusum start(double k, double h) {
        if (!(k >= 0) || !(h > 0)) {
            throw new IllegalArgumentException("CUSUM needs k >= 0 and h > 0, got " + k + " and " + h);
        }
        return new Cusum(k, h, 0, 0, 0, false);
    }

    public Cusum plus(double x) {
        double up = Math.min(2 * h, Math.max(0, x - k + upper));
        double down = Math.min(2 * h, Math.max(0, -x - k + lower));
        boolean out = up > h || down > h;
        boolean stillOut = signalled && (up > h / 2 || down > h / 2);
        return new Cusum(k, h, up, down, samples + 1, out || stillOut);
    }

    public boolean beyondLimit() {
        return upper > h || lower > h;
    }

    /** The chart started afresh (after a signal that waits for confirmation). */
    public Cusum restarted() {
        return start(k, h);
    }
}
