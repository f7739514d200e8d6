package org.qfleet.fit;

/**
 * Whether abscissae are equally spaced (passes then turn their phasors step by step, see
 * {@link PhasorWalk}), and the gains exp(s x_i) of a magnitude slope.
 */
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
        // Four interleaved chains, each multiplied by four steps' ratio per point it fills: the
        // multiplications of one chain wait on each other, those of different chains do not (the
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
