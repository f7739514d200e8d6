package org.qfleet.fit;

/**
 * exp(-j t x_k) point by point, for a pass that needs each phasor once and in order: on equally
 * spaced points by turning the last one by a fixed step, inside the pass's own loop (no arrays to
 * fill, store and read back); otherwise from the sine and cosine of each point. Rounding grows by
 * about one unit in the last place per step (2e-12 after 20 000 points), far below any data. Made
 * and used within one pass; the compiler keeps its fields in registers.
 */
final class PhasorWalk {

    private final double t;
    private final double[] x;
    private final boolean turn;
    private final double turnC;
    private final double turnS;
    private double nextC;
    private double nextS;
    /** The phasor of the point last stepped to. */
    double c;
    double s;

    private PhasorWalk(double t, double[] x, boolean turn) {
        this.t = t;
        this.x = x;
        this.turn = turn;
        int n = x.length;
        double step = turn ? (x[n - 1] - x[0]) / (n - 1) : 0;
        this.turnC = Math.cos(t * step);
        this.turnS = -Math.sin(t * step);
        this.nextC = turn ? Math.cos(t * x[0]) : 1;
        this.nextS = turn ? -Math.sin(t * x[0]) : 0;
    }

    /** @param equallySpaced whether x is equally spaced ({@link Phasors#equallySpaced}) */
    static PhasorWalk of(double t, double[] x, boolean equallySpaced) {
        return new PhasorWalk(t, x, equallySpaced && x.length >= 3);
    }

    /** Steps to point k (called for k = 0, 1, 2, ... in turn): {@link #c} and {@link #s} are then its phasor. */
    void stepTo(int k) {
        if (turn) {
            c = nextC;
            s = nextS;
            nextC = c * turnC - s * turnS;
            nextS = c * turnS + s * turnC;
        } else {
            c = Math.cos(t * x[k]);
            s = -Math.sin(t * x[k]);
        }
    }
}
