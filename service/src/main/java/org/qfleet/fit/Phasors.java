package org.qfleet.fit;

/** Fills exp(-j t x_i) for a set of abscissae, by rotation when they are equally spaced. */
final class Phasors {

    private Phasors() {
    }

    static boolean equallySpaced(double[] x) {
        int n = x.length;
        if (n < 3) {
            return true;
        }
        double step = (x[n - 1] - x[0]) / (n - 1);
        for (int i = 1; i < n; i++) {
            if (Math.abs(x[i] - x[0] - i * step) > 1e-9 * Math.abs(step) * n) {
                return false;
            }
        }
        return true;
    }

    static void fill(double t, double[] x, boolean equallySpaced, double[] cos, double[] sin) {
        int n = x.length;
        if (t == 0) {
            java.util.Arrays.fill(cos, 0, n, 1.0);
            java.util.Arrays.fill(sin, 0, n, 0.0);
            return;
        }
        if (!equallySpaced || n < 3) {
            for (int i = 0; i < n; i++) {
                cos[i] = Math.cos(t * x[i]);
                sin[i] = -Math.sin(t * x[i]);
            }
            return;
        }
        double step = (x[n - 1] - x[0]) / (n - 1);
        // Two interleaved rotations by twice the step halve the chain of dependent multiplications;
        // both restart from the library functions every 64 points so rounding cannot accumulate.
        double rc = Math.cos(2 * t * step);
        double rs = -Math.sin(2 * t * step);
        double ca = 0;
        double sa = 0;
        double cb = 0;
        double sb = 0;
        for (int i = 0; i < n; i += 2) {
            if ((i & 63) == 0) {
                ca = Math.cos(t * (x[0] + i * step));
                sa = -Math.sin(t * (x[0] + i * step));
                cb = Math.cos(t * (x[0] + (i + 1) * step));
                sb = -Math.sin(t * (x[0] + (i + 1) * step));
            }
            cos[i] = ca;
            sin[i] = sa;
            if (i + 1 < n) {
                cos[i + 1] = cb;
                sin[i + 1] = sb;
            }
            double na = ca * rc - sa * rs;
            sa = ca * rs + sa * rc;
            ca = na;
            double nb = cb * rc - sb * rs;
            sb = cb * rs + sb * rc;
            cb = nb;
        }
    }

    /** Fills exp(s x_i), a magnitude slope linear in decibels, by repeated multiplication when equally spaced. */
    static void fillGain(double s, double[] x, boolean equallySpaced, double[] gain) {
        int n = x.length;
        if (s == 0) {
            java.util.Arrays.fill(gain, 0, n, 1.0);
            return;
        }
        if (!equallySpaced || n < 3) {
            for (int i = 0; i < n; i++) {
                gain[i] = Math.exp(s * x[i]);
            }
            return;
        }
        double step = (x[n - 1] - x[0]) / (n - 1);
        double ratio = Math.exp(s * step);
        double value = 0;
        for (int i = 0; i < n; i++) {
            if ((i & 63) == 0) {
                value = Math.exp(s * (x[0] + i * step));
            }
            gain[i] = value;
            value *= ratio;
        }
    }
}
