package org.qfleet.drift;

/**
 * Two-sided EWMA chart of standardized values (in-control mean 0, standard deviation 1):
 * z_i = lambda x_i + (1 - lambda) z_(i-1), signal when |z| exceeds the asymptotic limit
 * L sqrt(lambda / (2 - lambda)) (Lucas & Saccucci, Technometrics 32(1), 1, 1990; lambda = 0.2 with
 * L = 2.962 gives an in-control average run length of 500). After a signal the chart stays
 * signalled until |z| is back inside half the limit, so a chart hovering at its limit does not
 * raise and clear by turns. Immutable.
 */
public record Ewma(double lambda, double width, double z, long samples, boolean signalled) {

    public static final double DEFAULT_LAMBDA = 0.2;
    public static final double DEFAULT_WIDTH = 2.962;

    public static Ewma start(double lambda, double width) {
        if (!(lambda > 0 && lambda <= 1) || !(width > 0)) {
            throw new IllegalArgumentException("EWMA needs 0 < lambda <= 1 and L > 0, got " + lambda + " and " + width);
        }
        return new Ewma(lambda, width, 0, 0, false);
    }

    public double limit() {
        return width * Math.sqrt(lambda / (2 - lambda));
    }

    public Ewma plus(double x) {
        double next = lambda * x + (1 - lambda) * z;
        boolean out = Math.abs(next) > limit();
        boolean stillOut = signalled && Math.abs(next) > limit() / 2;
        return new Ewma(lambda, width, next, samples + 1, out || stillOut);
    }

    /** Whether this value took the chart beyond its limit (a signal, not only a signalled state). */
    public boolean beyondLimit() {
        return Math.abs(z) > limit();
    }
}
