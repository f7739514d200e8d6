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
     * Walks downhill in the residual over a grid of delays around the estimate, then refines the
     * best by a parabola, and with {@code precise} by a second, narrow one (worth its two passes when no
     * coarse solution follows). For fixed position, width and delay the best A and B follow by linear
     * least squares, so each grid point costs one pass over the data (variable projection, Golub and
     * Pereyra 1973); one more pass gives them for the delay returned.
     */
    static Start refine(double[] x, double[] re, double[] im, double x0, double g, double t, boolean background,
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
        // Steps of 0.8 rad of twist over the half span, downhill from the estimate for at most four
        // steps either way, then a parabola through the best and its two neighbours, whose costs the
        // walk has already taken. Within that reach the cost has a single valley (even for a background
        // across the whole span, whose first side lobe lies 4.5 rad away), so the walk ends where a
        // full grid would.
        double step = 0.8;
        int reach = 4;
        double best = t;
        double bestCost = projected.at(t);
        double above = projected.at(t + step);
        double direction = above < bestCost ? step : -step;
        double behind = above;
        double next = above < bestCost ? above : projected.at(t - step);
        for (int k = 0; k < reach && next < bestCost; k++) {
            best += direction;
            behind = bestCost;
            bestCost = next;
            next = projected.at(best + direction);
        }
        double estimate = vertex(best, direction, behind, bestCost, next);
        // The cost is a parabola in the delay only close to its minimum: a second, narrow one there.
        double delay = precise ? parabola(projected, estimate, projected.at(estimate), FINAL_STEP) : estimate;
        return new Start(delay, projected.amplitudes(delay));
    }

    /**
     * The refined delay t and, for it, the best background B and resonance A as {br, bi, ar, ai}
     * (B = 0 without background).
     */
    record Start(double delay, double[] amplitudes) {
    }

    /** The minimum of the parabola through the costs at t - h, t and t + h, kept within t -+ h. */
    private static double parabola(ProjectedCost projected, double t, double cost, double h) {
        return vertex(t, h, projected.at(t - h), cost, projected.at(t + h));
    }

    /** The minimum of the parabola through the costs at t - h, t and t + h, kept within t -+ h (h may be negative). */
    private static double vertex(double t, double h, double below, double cost, double above) {
        double denom = below - 2 * cost + above;
        if (denom > 0) {
            double shift = 0.5 * (below - above) / denom;
            return t + Math.max(-1, Math.min(1, shift)) * h;
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
        private double y0r;
        private double y0i;
        private double y1r;
        private double y1i;

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
        }

        /** The cost at delay t. */
        double at(double t) {
            project(t);
            int n = x.length;
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

        /** B and A by linear least squares at delay t, G^-1 [Y0 Y1], as {br, bi, ar, ai}. */
        double[] amplitudes(double t) {
            project(t);
            if (!background) {
                return new double[] {0, 0, y1r / s2, y1i / s2};
            }
            int n = x.length;
            double det = n * s2 - (s1r * s1r + s1i * s1i);
            double br = (s2 * y0r - (s1r * y1r - s1i * y1i)) / det;
            double bi = (s2 * y0i - (s1r * y1i + s1i * y1r)) / det;
            double ar = (n * y1r - (s1r * y0r + s1i * y0i)) / det;
            double ai = (n * y1i - (s1r * y0i - s1i * y0r)) / det;
            return new double[] {br, bi, ar, ai};
        }

        /** Y0 = sum w and Y1 = sum conj(L) w of the trace w rotated back by delay t, into the fields. */
        private void project(double t) {
            int n = x.length;
            double sumR = 0;
            double sumI = 0;
            double lSumR = 0;
            double lSumI = 0;
            PassScratch scratch = PassScratch.of(n);
            double[] cos = scratch.cos();
            double[] sin = scratch.sin();
            Phasors.fill(t, x, uniform, cos, sin);
            for (int i = 0; i < n; i++) {
                double wr = cos[i] * re[i] + sin[i] * im[i];
                double wi = cos[i] * im[i] - sin[i] * re[i];
                sumR += wr;
                sumI += wi;
                lSumR += lr[i] * wr + li[i] * wi;
                lSumI += lr[i] * wi - li[i] * wr;
            }
            y0r = sumR;
            y0i = sumI;
            y1r = lSumR;
            y1i = lSumI;
        }
    }
}
