package org.qfleet.fit;

/**
 * Refines a rough delay by the residual it leaves: for a fixed position, width and delay the best
 * resonance A (and background B) follow by linear least squares, so each trial delay costs one pass
 * over the data (variable projection, Golub and Pereyra, SIAM J. Numer. Anal. 10, 413, 1973).
 */
final class DelaySearch {

    /** Half width (rad of twist over the half span) of the last parabola. */
    private static final double FINAL_STEP = 0.05;

    private DelaySearch() {
    }

    /**
     * Picks the delay with the smallest residual on a grid around the estimate, then refines it by
     * a parabola, and with {@code precise} by a second, narrow one (worth its two passes when no
     * coarse solution follows). For fixed position, width and delay the best A and B follow by linear
     * least squares, so each grid point costs one pass over the data (variable projection, Golub and
     * Pereyra 1973).
     */
    static double refine(double[] x, double[] re, double[] im, double x0, double g, double t, boolean background,
                         boolean equallySpaced, boolean precise) {
        int n = x.length;
        double[] lr = new double[n];
        double[] li = new double[n];
        double s1r = 0;
        double s1i = 0;
        double s2 = 0;
        double energy = 0;
        for (int i = 0; i < n; i++) {
            double u = x[i] - x0;
            double d = 1 / (g * g + u * u);
            double a = g * g * d;
            double b = -g * u * d;
            lr[i] = a;
            li[i] = b;
            s1r += a;
            s1i += b;
            s2 += a * a + b * b;
            energy += re[i] * re[i] + im[i] * im[i];
        }
        ProjectedCost projected = new ProjectedCost(x, re, im, lr, li, s1r, s1i, s2, energy, background, equallySpaced);
        // A coarse grid of twists 0.8 rad apart over the half span, then the neighbours of the best
        // at half that step, and a parabola through the three.
        double step = 0.8;
        int half = 4;
        double best = t;
        double bestCost = Double.POSITIVE_INFINITY;
        for (int k = -half; k <= half; k++) {
            double c = projected.at(t + k * step);
            if (c < bestCost) {
                bestCost = c;
                best = t + k * step;
            }
        }
        double estimate = parabola(projected, best, bestCost, step / 2);
        // The cost is a parabola in the delay only close to its minimum: a second, narrow one there.
        return precise ? parabola(projected, estimate, projected.at(estimate), FINAL_STEP) : estimate;
    }

    /** The minimum of the parabola through the costs at t - h, t and t + h, kept within t -+ h. */
    private static double parabola(ProjectedCost projected, double t, double cost, double h) {
        double below = projected.at(t - h);
        double above = projected.at(t + h);
        double denom = below - 2 * cost + above;
        if (denom > 0) {
            double shift = 0.5 * h * (below - above) / denom;
            return t + Math.max(-h, Math.min(h, shift));
        }
        return below < above ? t - h : t + h;
    }

    /** The least-squares cost left after the best A (and B) for a given delay, one pass per delay. */
    private static final class ProjectedCost {
        private final double[] x;
        private final double[] re;
        private final double[] im;
        private final double[] lr;
        private final double[] li;
        private final double s1r;
        private final double s1i;
        private final double s2;
        private final double energy;
        private final boolean background;
        private final boolean uniform;
        private final double[] cos;
        private final double[] sin;

        ProjectedCost(double[] x, double[] re, double[] im, double[] lr, double[] li,
                      double s1r, double s1i, double s2, double energy, boolean background, boolean uniform) {
            this.x = x;
            this.re = re;
            this.im = im;
            this.lr = lr;
            this.li = li;
            this.s1r = s1r;
            this.s1i = s1i;
            this.s2 = s2;
            this.energy = energy;
            this.background = background;
            this.uniform = uniform;
            this.cos = new double[x.length];
            this.sin = new double[x.length];
        }

        double at(double t) {
            int n = x.length;
            double y0r = 0;
            double y0i = 0;
            double y1r = 0;
            double y1i = 0;
            Phasors.fill(t, x, uniform, cos, sin);
            for (int i = 0; i < n; i++) {
                double wr = cos[i] * re[i] + sin[i] * im[i];
                double wi = cos[i] * im[i] - sin[i] * re[i];
                y0r += wr;
                y0i += wi;
                y1r += lr[i] * wr + li[i] * wi;
                y1i += lr[i] * wi - li[i] * wr;
            }
            double explained;
            if (background) {
                // [Y0 Y1]^H G^-1 [Y0 Y1] with G = [[n, S1], [conj S1, S2]].
                double det = n * s2 - (s1r * s1r + s1i * s1i);
                double cross = s1r * (y0r * y1r + y0i * y1i) + s1i * (y0r * y1i - y0i * y1r);
                explained = (s2 * (y0r * y0r + y0i * y0i) + n * (y1r * y1r + y1i * y1i) - 2 * cross) / det;
            } else {
                explained = (y1r * y1r + y1i * y1i) / s2;
            }
            return energy - explained;
        }
    }
}
