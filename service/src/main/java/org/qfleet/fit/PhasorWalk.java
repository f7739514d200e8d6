package org.qfleet.fit;

/**
 * exp(-j t x_k) point by point, for a pass that needs each phasor once and in order: on equally
 * spaced points by turning the last one by a fixed step, inside the pass's own loop (no arrays to
 * fill, store and read back); otherwise from arrays filled by {@link Phasors#fill}. Rounding grows
 * by about one unit in the last place per step (2e-12 after 20 000 points), far below any data.
 * Made and used within one pass; the compiler keeps its fields in registers.
 */
final class PhasorWalk {

    private final boolean turn;
    private final double[] cosines;
    private final double[] sines;
    private final double turnC;
    private final double turnS;
    private double nextC;
    private double nextS;
    /** The phasor of the point last stepped to. */
    double c;
    double s;

    private PhasorWalk(boolean turn, double[] cosines, double[] sines, double turnC, double turnS, double firstC, double firstS) {
        this.turn = turn;
        this.cosines = cosines;
        this.sines = sines;
        this.turnC = turnC;
        this.turnS = turnS;
        this.nextC = firstC;
        this.nextS = firstS;
    }

    static PhasorWalk of(double t, double[] x, boolean equallySpaced) {
        int n = x.length;
        if (equallySpaced && n >= 3) {
            double step = (x[n - 1] - x[0]) / (n - 1);
            return new PhasorWalk(true, null, null, Math.cos(t * step), -Math.sin(t * step),
                    Math.cos(t * x[0]), -Math.sin(t * x[0]));
        }
        PassScratch scratch = PassScratch.of(n);
        Phasors.fill(t, x, equallySpaced, scratch.cos(), scratch.sin());
        return new PhasorWalk(false, scratch.cos(), scratch.sin(), 1, 0, 1, 0);
    }

    /** Steps to point k (called for k = 0, 1, 2, ... in turn): {@link #c} and {@link #s} are then its phasor. */
    void stepTo(int k) {
        if (turn) {
            c = nextC;
            s = nextS;
            nextC = c * turnC - s * turnS;
            nextS = c * turnS + s * turnC;
        } else {
            c = cosines[k];
            s = sines[k];
        }
    }
}
