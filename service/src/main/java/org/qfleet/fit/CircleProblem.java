package org.qfleet.fit;

/**
 * Least squares of the resonance circle with delay on normalized frequency x = (f - fRef) / scale:
 * exp(-j t x) (1 + s x) (B + A g / (g + j (x - x0))).
 * Parameters: [br, bi, ar, ai, x0, g, t] with background, [ar, ai, x0, g, t] without, and s appended
 * when a magnitude tilt is fitted; g is the half width and t = 2 pi tau scale. A real tilt and a
 * delay act on the background in quadrature, so both can be told apart when the background is large
 * (notch, reflection). The model is written in the frame rotated back by the delay, where the
 * rotation cancels from J^T J (|exp(-j t x)| = 1).
 */
final class CircleProblem implements LeastSquaresProblem {

    private final double[] x;
    private final double[] zr;
    private final double[] zi;
    private final boolean background;
    private final boolean tilt;
    private final boolean equallySpaced;
    private final double[] cos;
    private final double[] sin;
    private final double[] d = new double[16];

    CircleProblem(double[] x, double[] zr, double[] zi, boolean background, boolean tilt) {
        this.x = x;
        this.zr = zr;
        this.zi = zi;
        this.background = background;
        this.tilt = tilt;
        this.equallySpaced = Phasors.equallySpaced(x);
        this.cos = new double[x.length];
        this.sin = new double[x.length];
    }

    boolean background() {
        return background;
    }

    boolean tilt() {
        return tilt;
    }

    @Override
    public int parameterCount() {
        return (background ? 7 : 5) + (tilt ? 1 : 0);
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
        double slope = tilt ? p[o + 5] : 0;
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
            double br0 = br + ar * lr - ai * li;
            double bi0 = bi + ar * li + ai * lr;
            double k1 = 1 + slope * x[k];
            double mr = k1 * br0;
            double mi = k1 * bi0;
            double rr = wr - mr;
            double ri = wi - mi;
            cost += rr * rr + ri * ri;
            if (jtj == null) {
                continue;
            }
            double dd2 = dd * dd;
            double qr0 = (g2 - u * u) * dd2;
            double qi0 = -2 * g * u * dd2;
            double qr = k1 * (ar * qr0 - ai * qi0);
            double qi = k1 * (ar * qi0 + ai * qr0);
            int m = 0;
            if (background) {
                d[0] = k1;
                d[1] = 0;
                d[2] = 0;
                d[3] = k1;
                m = 4;
            }
            d[m] = k1 * lr;
            d[m + 1] = k1 * li;
            d[m + 2] = -k1 * li;
            d[m + 3] = k1 * lr;
            d[m + 4] = -g * qi;
            d[m + 5] = g * qr;
            d[m + 6] = -u * qi;
            d[m + 7] = u * qr;
            d[m + 8] = x[k] * mi;
            d[m + 9] = -x[k] * mr;
            if (tilt) {
                d[m + 10] = x[k] * br0;
                d[m + 11] = x[k] * bi0;
            }
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
