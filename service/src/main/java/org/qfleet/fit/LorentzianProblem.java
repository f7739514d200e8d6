package org.qfleet.fit;

/**
 * Least squares of |S| = sqrt(P) with the Lorentzian-with-background power model
 * P(x) = b0 + (a + c v) / (1 + v^2), v = (x - x0) / g, on normalized frequency. This is exactly
 * |B + A / (1 + j v)|^2 for a constant complex background (the c term is its interference with the
 * resonance, which makes the line asymmetric); Petersan & Anlage (J. Appl. Phys. 84, 3392, 1998)
 * fit the same shape to |S21|^2. Fitting the magnitude keeps the noise equal on every point.
 * Parameters: [b0, a, c, x0, g] with background, [a, x0, g] without.
 */
final class LorentzianProblem implements LeastSquaresProblem {

    private final double[] x;
    private final double[] y;
    private final boolean background;
    private final double[] d = new double[5];

    LorentzianProblem(double[] x, double[] magnitude, boolean background) {
        this.x = x;
        this.y = magnitude;
        this.background = background;
    }

    boolean background() {
        return background;
    }

    @Override
    public int parameterCount() {
        return background ? 5 : 3;
    }

    @Override
    public int residualCount() {
        return x.length;
    }

    @Override
    public double cost(double[] p) {
        return normalEquations(p, null, null);
    }

    @Override
    public double normalEquations(double[] p, double[][] jtj, double[] jtr) {
        int o = background ? 2 : 0;
        double b0 = background ? p[0] : 0;
        double a = background ? p[1] : p[0];
        double c = background ? p[2] : 0;
        double x0 = p[o + 1];
        double g = p[o + 2];
        int n = parameterCount();
        if (jtj != null) {
            for (int i = 0; i < n; i++) {
                java.util.Arrays.fill(jtj[i], 0);
            }
            java.util.Arrays.fill(jtr, 0);
        }
        double cost = 0;
        for (int k = 0; k < x.length; k++) {
            double v = (x[k] - x0) / g;
            double q = 1 / (1 + v * v);
            double power = b0 + (a + c * v) * q;
            double m = Math.sqrt(Math.max(power, 1e-300));
            double r = y[k] - m;
            cost += r * r;
            if (jtj == null) {
                continue;
            }
            double half = 0.5 / m;
            double dpdv = (c * (1 + v * v) - (a + c * v) * 2 * v) * q * q;
            int i = 0;
            if (background) {
                d[i++] = half;
                d[i++] = half * q;
                d[i++] = half * v * q;
            } else {
                d[i++] = half * q;
            }
            d[i++] = -half * dpdv / g;
            d[i] = -half * dpdv * v / g;
            for (int s = 0; s < n; s++) {
                jtr[s] += d[s] * r;
                for (int t = s; t < n; t++) {
                    jtj[s][t] += d[s] * d[t];
                }
            }
        }
        return cost;
    }
}
