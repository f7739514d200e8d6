package org.qfleet.fit;

/**
 * Model-free starting values for the circle fit, on normalized frequency x. Each step is cheap and
 * only has to land the optimizer in the right valley.
 */
final class StartingPoint {

    /** About this many points of the smoothed speed give its level away from the line. */
    private static final int PEDESTAL_POINTS = 100;

    private StartingPoint() {
    }

    /**
     * Resonance position and half width from the speed |dS/dx| along the trace: for
     * A / (1 + j (x - x0) / g) the speed is |A| g / (g^2 + (x - x0)^2), a Lorentzian in x whose full
     * width at half height is 2 g, whatever the background.
     *
     * @param noise standard deviation of the noise per component (the same for a rotated trace)
     * @param equallySpaced whether x is equally spaced: the speed is then taken per step, not per unit of x
     *                      (only its ratios matter)
     * @return {x0, g}
     */
    static double[] speedPeak(double[] x, double[] re, double[] im, double noise, boolean equallySpaced) {
        int n = x.length;
        // Difference over a baseline of 2m points, m doubled until the largest step stands well out of
        // the noise (|dz| of pure noise averages 1.8 sigma): long baselines see through noise, short ones resolve narrow lines.
        int m = 1;
        double threshold = 12 * noise;
        while (4 * m < n / 4 && largestSquaredStep(re, im, m) < threshold * threshold) {
            m *= 2;
        }
        double[] s = smoothedSpeed(x, re, im, m, Math.max(1, m / 2), equallySpaced);
        int k = 0;
        for (int i = 1; i < n; i++) {
            if (s[i] > s[k]) {
                k = i;
            }
        }
        double pedestal = pedestal(s);
        double half = pedestal + 0.5 * (s[k] - pedestal);
        double left = crossing(x, s, k, -1, half);
        double right = crossing(x, s, k, +1, half);
        double x0 = x[k];
        if (k > 0 && k < n - 1) {
            double denom = s[k - 1] - 2 * s[k] + s[k + 1];
            if (denom < 0) {
                double shift = 0.5 * (s[k - 1] - s[k + 1]) / denom;
                x0 = x[k] + Math.max(-1, Math.min(1, shift)) * 0.5 * (x[k + 1] - x[k - 1]);
            }
        }
        double width;
        if (Double.isNaN(left) && Double.isNaN(right)) {
            width = x[n - 1] - x[0];
        } else if (Double.isNaN(left)) {
            width = 2 * (right - x0);
        } else if (Double.isNaN(right)) {
            width = 2 * (x0 - left);
        } else {
            width = right - left;
        }
        double step = (x[n - 1] - x[0]) / (n - 1);
        // The baseline broadens the line by about its own length; take that back out.
        double baseline = 2 * m * step;
        double corrected = Math.sqrt(Math.max(width * width - baseline * baseline, 0.25 * baseline * baseline));
        return new double[] {x0, Math.max(0.5 * corrected, 0.5 * step)};
    }

    /**
     * The speed away from the line: the median of the smoothed speed, taken over about a hundred
     * points spread across the sweep (the line covers well under half of it).
     */
    private static double pedestal(double[] s) {
        int stride = Math.max(1, s.length / PEDESTAL_POINTS);
        double[] spread = new double[(s.length + stride - 1) / stride];
        for (int i = 0, j = 0; i < s.length; i += stride, j++) {
            spread[j] = s[i];
        }
        return Select.median(spread, spread.length);
    }

    /** The largest |z[i + m] - z[i - m]|^2, compared squared so that no root is taken. */
    private static double largestSquaredStep(double[] re, double[] im, int m) {
        double largest = 0;
        for (int i = m; i < re.length - m; i++) {
            double a = re[i + m] - re[i - m];
            double b = im[i + m] - im[i - m];
            largest = Math.max(largest, a * a + b * b);
        }
        return largest;
    }

    private static double crossing(double[] x, double[] s, int k, int direction, double level) {
        for (int i = k + direction; i >= 0 && i < s.length; i += direction) {
            if (s[i] < level) {
                int j = i - direction;
                double fraction = (s[j] - level) / (s[j] - s[i]);
                return x[j] + fraction * (x[i] - x[j]);
            }
        }
        return Double.NaN;
    }

    /**
     * The speed |z[i + m] - z[i - m]| / (x[i + m] - x[i - m]) (held at its last value over the m points
     * at either end) averaged over 2 halfWindow + 1 points, through its running sums.
     */
    private static double[] smoothedSpeed(double[] x, double[] re, double[] im, int m, int halfWindow,
                                          boolean equallySpaced) {
        int n = x.length;
        double[] prefix = new double[n + 1];
        double first = speed(x, re, im, m, m, equallySpaced);
        double running = 0;
        for (int i = 0; i < m; i++) {
            running += first;
            prefix[i + 1] = running;
        }
        for (int i = m; i < n - m; i++) {
            double a = re[i + m] - re[i - m];
            double b = im[i + m] - im[i - m];
            running += equallySpaced ? Math.sqrt(a * a + b * b) : Math.sqrt(a * a + b * b) / (x[i + m] - x[i - m]);
            prefix[i + 1] = running;
        }
        double last = speed(x, re, im, n - 1 - m, m, equallySpaced);
        for (int i = Math.max(m, n - m); i < n; i++) {
            running += last;
            prefix[i + 1] = running;
        }
        double[] s = new double[n];
        // The window (at most a sixteenth of the sweep) is cut short by the ends only for its first and last points.
        int h = halfWindow;
        for (int i = 0; i < h; i++) {
            s[i] = prefix[i + halfWindow + 1] / (i + halfWindow + 1);
            s[n - 1 - i] = (prefix[n] - prefix[n - 1 - i - halfWindow]) / (i + halfWindow + 1);
        }
        double perWindow = 1.0 / (2 * halfWindow + 1);
        for (int i = h; i < n - h; i++) {
            s[i] = (prefix[i + halfWindow + 1] - prefix[i - halfWindow]) * perWindow;
        }
        return s;
    }

    private static double speed(double[] x, double[] re, double[] im, int i, int m, boolean equallySpaced) {
        double a = re[i + m] - re[i - m];
        double b = im[i + m] - im[i - m];
        double step = Math.sqrt(a * a + b * b);
        return equallySpaced ? step : step / (x[i + m] - x[i - m]);
    }

    /**
     * Delay from the phase slope alone, weighted by |S|^2 dx^2: right where a large background
     * dominates the trace, whose phase turns only with the delay.
     *
     * @return t = 2 pi tau scale
     */
    static double backgroundDelay(double[] x, double[] re, double[] im) {
        double sw = 0;
        double sws = 0;
        for (int i = 0; i < x.length - 1; i++) {
            double cr = re[i + 1] * re[i] + im[i + 1] * im[i];
            double ci = im[i + 1] * re[i] - re[i + 1] * im[i];
            double dx = x[i + 1] - x[i];
            double w = Math.sqrt(cr * cr + ci * ci) * dx * dx;
            sw += w;
            sws += w * Angles.atan2(ci, cr) / dx;
        }
        return sw > 0 ? -sws / sw : 0;
    }

    /** The trace with the delay t taken out, as {re, im}. */
    static double[][] rotated(double[] x, double[] re, double[] im, double t, boolean equallySpaced) {
        int n = x.length;
        PhasorWalk phasor = PhasorWalk.of(t, x, equallySpaced);
        double[][] out = new double[2][n];
        for (int i = 0; i < n; i++) {
            phasor.stepTo(i);
            out[0][i] = phasor.c * re[i] + phasor.s * im[i];
            out[1][i] = phasor.c * im[i] - phasor.s * re[i];
        }
        return out;
    }

    static double[] speedPeak(double[] x, double[][] reIm, double noise, boolean equallySpaced) {
        return speedPeak(x, reIm[0], reIm[1], noise, equallySpaced);
    }

    /**
     * Delay from the phase slope: between neighbouring points the slope is -t plus the resonance's
     * own contribution, shaped like g / (g^2 + (x - x0)^2) for a transmission peak. A weighted
     * regression on both (weights |S|^2 dx^2, the inverse variance of a phase slope) separates them.
     *
     * @return t = 2 pi tau scale
     */
    static double delay(double[] x, double[] re, double[] im, double x0, double g) {
        double sw = 0, swh = 0, swhh = 0, sws = 0, swhs = 0;
        for (int i = 0; i < x.length - 1; i++) {
            double cr = re[i + 1] * re[i] + im[i + 1] * im[i];
            double ci = im[i + 1] * re[i] - re[i + 1] * im[i];
            double dx = x[i + 1] - x[i];
            double slope = Angles.atan2(ci, cr) / dx;
            double xm = 0.5 * (x[i] + x[i + 1]) - x0;
            double h = g / (g * g + xm * xm);
            double w = Math.sqrt(cr * cr + ci * ci) * dx * dx;
            sw += w;
            swh += w * h;
            swhh += w * h * h;
            sws += w * slope;
            swhs += w * h * slope;
        }
        double det = sw * swhh - swh * swh;
        if (!(Math.abs(det) > 1e-30 * sw * swhh) || sw == 0) {
            return sw == 0 ? 0 : -sws / sw;
        }
        double intercept = (swhh * sws - swh * swhs) / det;
        return -intercept;
    }
}
