package org.qfleet.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** The hand-reduced normal equations against a Jacobian taken by finite differences of the model. */
class CircleProblemTest {

    private static final int N = 301;
    private final double[] x = new double[N];
    private final double[] zr = new double[N];
    private final double[] zi = new double[N];

    CircleProblemTest() {
        Random random = new Random(5);
        for (int i = 0; i < N; i++) {
            x[i] = -1 + 2.0 * i / (N - 1);
            zr[i] = 0.3 * random.nextGaussian();
            zi[i] = 0.3 * random.nextGaussian();
        }
    }

    /** exp(-j t x) exp(s x) (B + A g / (g + j (x - x0))) with p = [br, bi, ar, ai, x0, g, t, s]. */
    private static double[] model(double xk, double[] q) {
        double u = xk - q[4];
        double g = q[5];
        double den = g * g + u * u;
        double lr = g * g / den;
        double li = -g * u / den;
        double gain = Math.exp(q[7] * xk);
        double mr = gain * (q[0] + q[2] * lr - q[3] * li);
        double mi = gain * (q[1] + q[2] * li + q[3] * lr);
        double c = Math.cos(q[6] * xk);
        double s = -Math.sin(q[6] * xk);
        return new double[] {mr * c - mi * s, mr * s + mi * c};
    }

    private void check(boolean background, boolean tilt, double[] full) {
        int[] active = background ? (tilt ? new int[] {0, 1, 2, 3, 4, 5, 6, 7} : new int[] {0, 1, 2, 3, 4, 5, 6})
                : new int[] {2, 3, 4, 5, 6};
        int n = active.length;
        double[][] j = new double[2 * N][n];
        double[] r = new double[2 * N];
        for (int k = 0; k < N; k++) {
            double[] m = model(x[k], full);
            r[2 * k] = zr[k] - m[0];
            r[2 * k + 1] = zi[k] - m[1];
            for (int a = 0; a < n; a++) {
                double h = 1e-6;
                double[] up = full.clone();
                up[active[a]] += h;
                double[] down = full.clone();
                down[active[a]] -= h;
                double[] mu = model(x[k], up);
                double[] md = model(x[k], down);
                j[2 * k][a] = (mu[0] - md[0]) / (2 * h);
                j[2 * k + 1][a] = (mu[1] - md[1]) / (2 * h);
            }
        }
        double[] p = new double[n];
        for (int a = 0; a < n; a++) {
            p[a] = full[active[a]];
        }
        CircleProblem problem = new CircleProblem(x, zr, zi, background, tilt);
        double[][] jtj = new double[n][n];
        double[] jtr = new double[n];
        double cost = problem.normalEquations(p, jtj, jtr);
        double expectedCost = 0;
        for (double v : r) {
            expectedCost += v * v;
        }
        assertThat(cost).isCloseTo(expectedCost, within(1e-9 * expectedCost));
        assertThat(problem.cost(p)).isCloseTo(expectedCost, within(1e-9 * expectedCost));
        // the per-point residuals kept from the pass agree with a fresh evaluation, and only at that point
        double[] fresh = new CircleProblem(x, zr, zi, background, tilt).residualPower(p);
        assertThat(problem.residualPower(p)).containsExactly(fresh, within(1e-12));
        double[] moved = p.clone();
        moved[n - 1] += 0.01;
        assertThat(problem.residualPower(moved)).containsExactly(
                new CircleProblem(x, zr, zi, background, tilt).residualPower(moved), within(1e-12));
        for (int a = 0; a < n; a++) {
            double g = 0;
            for (int k = 0; k < 2 * N; k++) {
                g += j[k][a] * r[k];
            }
            assertThat(jtr[a]).as("J^T r [%d]", a).isCloseTo(g, within(1e-6 * (1 + Math.abs(g))));
            for (int b = a; b < n; b++) {
                double s = 0;
                for (int k = 0; k < 2 * N; k++) {
                    s += j[k][a] * j[k][b];
                }
                assertThat(jtj[a][b]).as("J^T J [%d][%d]", a, b).isCloseTo(s, within(1e-6 * (1 + Math.abs(s))));
            }
        }
    }

    @Test
    void plainModel() {
        check(false, false, new double[] {0, 0, 0.3, -0.2, 0.05, 0.08, 1.7, 0});
    }

    @Test
    void modelWithBackground() {
        check(true, false, new double[] {0.4, -0.7, 0.3, -0.2, 0.05, 0.08, 1.7, 0});
    }

    @Test
    void modelWithBackgroundAndTilt() {
        check(true, true, new double[] {0.4, -0.7, 0.3, -0.2, 0.05, 0.08, 1.7, 0.2});
    }

    @Test
    void unevenlySpacedPoints() {
        // Phasors from sines and cosines per point instead of turning one step at a time.
        for (int i = 1; i < N - 1; i++) {
            x[i] += 0.3 * (2.0 / (N - 1)) * Math.sin(1.7 * i);
        }
        assertThat(Phasors.equallySpaced(x)).isFalse();
        check(false, false, new double[] {0, 0, 0.3, -0.2, 0.05, 0.08, 1.7, 0});
        check(true, true, new double[] {0.4, -0.7, 0.3, -0.2, 0.05, 0.08, 1.7, 0.2});
    }

    @Test
    void backgroundScoreMatchesTheBackgroundModelAtZeroBackground() {
        double[] p5 = {0.3, -0.2, 0.05, 0.08, 1.7};
        double[][] jtj5 = new double[5][5];
        double[] jtr5 = new double[5];
        double[][] jtj7 = new double[7][7];
        double[] jtr7 = new double[7];
        new CircleProblem(x, zr, zi, false, false).plainWithBackgroundScore(p5, jtj5, jtr5, jtj7, jtr7);
        double[][] expected = new double[7][7];
        double[] expectedJtr = new double[7];
        new CircleProblem(x, zr, zi, true, false).normalEquations(new double[] {0, 0, 0.3, -0.2, 0.05, 0.08, 1.7},
                expected, expectedJtr);
        for (int a = 0; a < 7; a++) {
            assertThat(jtr7[a]).isCloseTo(expectedJtr[a], within(1e-9 * (1 + Math.abs(expectedJtr[a]))));
            for (int b = a; b < 7; b++) {
                assertThat(jtj7[a][b]).as("[%d][%d]", a, b).isCloseTo(expected[a][b], within(1e-9 * (1 + Math.abs(expected[a][b]))));
            }
        }
    }
}
