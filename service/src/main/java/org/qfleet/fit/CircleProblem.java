package org.qfleet.fit;

/**
 * Least squares of the resonance circle with delay on normalized frequency x = (f - fRef) / scale.
 * Parameters: [br, bi, ar, ai, x0, g, t] with background, [ar, ai, x0, g, t] without, where
 * g is the half width and t = 2 pi tau scale. The model is written in the frame rotated back by the
 * delay, where the rotation cancels from J^T J (|exp(-j t x)| = 1).
 */
final class CircleProblem implements LeastSquaresProblem {

    private final double[] x;
    private final double[] zr;
    private final double[] zi;
    private final boolean background;
    private final boolean equallySpaced;
    private final double[] cos;
    private final double[] sin;
    private final double[] d = new double[14];

    CircleProblem(double[] x, double[] zr, double[] zi, boolean background) {
        this.x = x;
        this.zr = zr;
        this.zi = zi;
        this.background = background;
        this.equallySpaced = Phasors.equallySpaced(x);
        this.cos = new double[x.length];
        this.sin = new double[x.length];
    }

    boolean background() {
        return background;
    }

    @Override
    public int parameterCount() {
        return background ? 7 : 5;
    }

    @Override
    public int residualCount() {
        return 2 * x.length;
    }

    @Override
    public double cost(double[] p) {
        return normalEquations(p, null, null);
    }

    @Override
    public double normalEquations(double[] p, double[][] jtj, double[] jtr) {
        int o = background ? 2 : 0;
        double br = background ? p[0] : 0;
        double bi = background ? p[1] : 0;
        double ar = p[o];
        double ai = p[o + 1];
        double x0 = p[o + 2];
        double g = p[o + 3];
        double t = p[o + 4];
        int n = parameterCount();
        if (jtj != null) {
            for (int i = 0; i < n; i++) {
                java.util.Arrays.fill(jtj[i], 0);
            }
            java.util.Arrays.fill(jtr, 0);
        }
        Phasors.fill(t, x, equallySpaced, cos, sin);
        double g2 = g * g;
        double cost = 0;
        for (int k = 0; k < x.length; k++) {
            double c = cos[k];
            double s = sin[k];
            double wr = c * zr[k] + s * zi[k];
            double wi = c * zi[k] - s * zr[k];
            double u = x[k] - x0;
            double dd = 1 / (g2 + u * u);
            double lr = g2 * dd;
            double li = -g * u * dd;
            double mr = br + ar * lr - ai * li;
            double mi = bi + ar * li + ai * lr;
            double rr = wr - mr;
            double ri = wi - mi;
            cost += rr * rr + ri * ri;
            if (jtj == null) {
                continue;
            }
            double dd2 = dd * dd;
            double qr0 = (g2 - u * u) * dd2;
            double qi0 = -2 * g * u * dd2;
            double qr = ar * qr0 - ai * qi0;
            double qi = ar * qi0 + ai * qr0;
            int m = 0;
            if (background) {
                d[0] = 1;
                d[1] = 0;
                d[2] = 0;
                d[3] = 1;
                m = 4;
            }
            d[m] = lr;
            d[m + 1] = li;
            d[m + 2] = -li;
            d[m + 3] = lr;
            d[m + 4] = -g * qi;
            d[m + 5] = g * qr;
            d[m + 6] = -u * qi;
            d[m + 7] = u * qr;
            d[m + 8] = x[k] * mi;
            d[m + 9] = -x[k] * mr;
            for (int i = 0; i < n; i++) {
                double di_r = d[2 * i];
                double di_i = d[2 * i + 1];
                jtr[i] += di_r * rr + di_i * ri;
                double[] row = jtj[i];
                for (int j = i; j < n; j++) {
                    row[j] += di_r * d[2 * j] + di_i * d[2 * j + 1];
                }
            }
        }
        return cost;
    }
}
