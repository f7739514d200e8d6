package org.qfleet.fit;

/** Fills exp(-j t x_i) for a set of abscissae, by rotation when they are equally spaced. */
final class Phasors {

    private static final int CHAINS = 4;

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
        // Four interleaved chains, each turned by four steps per point it fills: the multiplications of
        // one chain wait on each other, those of different chains do not. Rounding grows by about one
        // unit in the last place per step (1e-13 after a few thousand points), far below any data.
        // The chains start one step apart, and turn by four steps: powers of one step's rotation.
        double ec = Math.cos(t * step);
        double es = -Math.sin(t * step);
        double c0 = Math.cos(t * x[0]);
        double s0 = -Math.sin(t * x[0]);
        double c1 = c0 * ec - s0 * es;
        double s1 = c0 * es + s0 * ec;
        double c2 = c1 * ec - s1 * es;
        double s2 = c1 * es + s1 * ec;
        double c3 = c2 * ec - s2 * es;
        double s3 = c2 * es + s2 * ec;
        double e2c = ec * ec - es * es;
        double e2s = 2 * ec * es;
        double rc = e2c * e2c - e2s * e2s;
        double rs = 2 * e2c * e2s;
        int i = 0;
        for (; i + CHAINS <= n; i += CHAINS) {
            cos[i] = c0;
            sin[i] = s0;
            cos[i + 1] = c1;
            sin[i + 1] = s1;
            cos[i + 2] = c2;
            sin[i + 2] = s2;
            cos[i + 3] = c3;
            sin[i + 3] = s3;
            double n0 = c0 * rc - s0 * rs;
            s0 = c0 * rs + s0 * rc;
            c0 = n0;
            double n1 = c1 * rc - s1 * rs;
            s1 = c1 * rs + s1 * rc;
            c1 = n1;
            double n2 = c2 * rc - s2 * rs;
            s2 = c2 * rs + s2 * rc;
            c2 = n2;
            double n3 = c3 * rc - s3 * rs;
            s3 = c3 * rs + s3 * rc;
            c3 = n3;
        }
        // At most three points are left, each where its chain stands.
        if (i < n) {
            cos[i] = c0;
            sin[i] = s0;
        }
        if (i + 1 < n) {
            cos[i + 1] = c1;
            sin[i + 1] = s1;
        }
        if (i + 2 < n) {
            cos[i + 2] = c2;
            sin[i + 2] = s2;
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
        // Four chains as for the phasors, each multiplied by four steps' ratio per point it fills (the
        // relative rounding grows by about one unit in the last place per step: 1e-12 after 20 000 points).
        double ratio = Math.exp(s * step);
        double g0 = Math.exp(s * x[0]);
        double g1 = g0 * ratio;
        double g2 = g1 * ratio;
        double g3 = g2 * ratio;
        double ratio2 = ratio * ratio;
        double ratio4 = ratio2 * ratio2;
        int i = 0;
        for (; i + CHAINS <= n; i += CHAINS) {
            gain[i] = g0;
            gain[i + 1] = g1;
            gain[i + 2] = g2;
            gain[i + 3] = g3;
            g0 *= ratio4;
            g1 *= ratio4;
            g2 *= ratio4;
            g3 *= ratio4;
        }
        if (i < n) {
            gain[i] = g0;
        }
        if (i + 1 < n) {
            gain[i + 1] = g1;
        }
        if (i + 2 < n) {
            gain[i + 2] = g2;
        }
    }
}
