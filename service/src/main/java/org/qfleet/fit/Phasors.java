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
        double rc = Math.cos(t * step);
        double rs = -Math.sin(t * step);
        double c = Math.cos(t * x[0]);
        double s = -Math.sin(t * x[0]);
        for (int i = 0; i < n; i++) {
            if ((i & 63) == 0) {
                c = Math.cos(t * (x[0] + i * step));
                s = -Math.sin(t * (x[0] + i * step));
            }
            cos[i] = c;
            sin[i] = s;
            double nc = c * rc - s * rs;
            s = c * rs + s * rc;
            c = nc;
        }
    }
}
