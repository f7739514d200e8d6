package org.qfleet.fit;

/**
 * Weighted least squares of |S|^2 with the Lorentzian-with-background power model
 * P(x) = b0 + (a + c v) / (1 + v^2), v = (x - x0) / g, on normalized frequency (Petersan & Anlage,
 * J. Appl. Phys. 84, 3392, 1998). The model is exactly |B + A / (1 + j v)|^2 for a constant complex
 * background; the c term, the background's interference with the resonance, makes the line
 * asymmetric. The data are |S|^2 less the noise power 2 sigma^2 (the mean of |S + n|^2 exceeds |S|^2
 * by that much), weighted by the inverse of their variance 4 sigma^2 (P + sigma^2).
 * Parameters: [b0, a, c, x0, g] with background, [a, x0, g] without.
 */
final class LorentzianProblem implements LeastSquaresProblem {

    private final double[] x;
    private final double[] power;
    private final double[] weight;
    private final boolean background;
    private final double[] d = new double[5];

    LorentzianProblem(double[] x, double[] power, double[] weight, boolean background) {
        this.x = x;
        this.power = power;
        this.weight = weight;
        this.background = background;
    }

    boolean background() {
        return background;
    }

    /** Model power at x for parameters p. */
    static double power(double x, double[] p, boolean background) {
        int o = background ? 2 : 0;
        double b0 = background ? p[0] : 0;
        double a = background ? p[1] : p[0];
        double c = background ? p[2] : 0;
        double v = (x - p[o + 1]) / p[o + 2];
        return b0 + (a + c * v) / (1 + v * v);
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
            double model = b0 + (a + c * v) * q;
            double w = weight[k];
            double r = power[k] - model;
            cost += w * r * r;
            if (jtj == null) {
                continue;
            }
            double dpdv = (c * (1 + v * v) - (a + c * v) * 2 * v) * q * q;
            int i = 0;
            if (background) {
                d[i++] = 1;
                d[i++] = q;
                d[i++] = v * q;
            } else {
                d[i++] = q;
            }
            d[i++] = -dpdv / g;
            d[i] = -dpdv * v / g;
            for (int s = 0; s < n; s++) {
                double wd = w * d[s];
                jtr[s] += wd * r;
                for (int t = s; t < n; t++) {
                    jtj[s][t] += wd * d[t];
                }
            }
        }
        return cost;
    }
}
