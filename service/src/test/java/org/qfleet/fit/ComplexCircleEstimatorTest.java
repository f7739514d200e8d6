package org.qfleet.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresProblem;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;
import org.junit.jupiter.api.Test;
import org.qfleet.sweep.Topology;

class ComplexCircleEstimatorTest {

    private static final int N = 401;

    /** Samples a circle model (the estimator's own model) over a span of {@code widths} bandwidths. */
    private static double[][] sample(CircleModel m, double widths, double sigma, long seed) {
        Random random = new Random(seed);
        double bw = m.f0Hz() / m.qLoaded();
        double[][] data = new double[3][N];
        double[] z = new double[2];
        for (int i = 0; i < N; i++) {
            double f = m.f0Hz() - widths * bw / 2 + widths * bw * i / (N - 1);
            m.evaluate(f, z);
            data[0][i] = f;
            data[1][i] = z[0] + sigma * random.nextGaussian();
            data[2][i] = z[1] + sigma * random.nextGaussian();
        }
        return data;
    }

    @Test
    void recoversAnExactCircleWithDelayLeakageAndRotation() throws FitException {
        CircleModel truth = new CircleModel(3.6001e9, 3.6001e9, 3.6e9 / (2 * 850), 12e-9, 0.04, -0.05, 0.02, 0.01, 1e-9);
        double[][] d = sample(truth, 10, 0, 1);
        CircleFit fit = new ComplexCircleEstimator().fitCircle(d[0], d[1], d[2], Topology.NOTCH);
        CircleModel m = fit.model();
        assertThat(m.f0Hz()).isCloseTo(truth.f0Hz(), within(1e-3));
        assertThat(m.qLoaded()).isCloseTo(truth.qLoaded(), within(1e-6 * truth.qLoaded()));
        assertThat(m.delaySeconds()).isCloseTo(truth.delaySeconds(), within(1e-15));
        assertThat(m.amplitude()).isCloseTo(truth.amplitude(), within(1e-9));
        assertThat(m.background()).isCloseTo(truth.background(), within(1e-9));
        assertThat(m.tiltPerHz()).isCloseTo(truth.tiltPerHz(), within(1e-15));
    }

    @Test
    void agreesWithCommonsMathLevenbergMarquardtOnNoisyData() throws FitException {
        CircleModel truth = new CircleModel(10.4e9, 10.4e9 + 2e5, 10.4e9 / (2 * 5400), 4e-9, 0.08, 0.03, -0.6, 0.7, -2e-9);
        double[][] d = sample(truth, 8, 0.002, 11);
        CircleFit ours = new ComplexCircleEstimator().fitCircle(d[0], d[1], d[2], Topology.NOTCH);

        double ref = ours.referenceHz();
        double scale = ours.scaleHz();
        double[] x = new double[N];
        double[] target = new double[2 * N];
        for (int i = 0; i < N; i++) {
            x[i] = (d[0][i] - ref) / scale;
            target[2 * i] = d[1][i];
            target[2 * i + 1] = d[2][i];
        }
        // The same model, written independently in the original (unrotated) frame, solved by Commons Math.
        LeastSquaresProblem problem = new LeastSquaresBuilder()
                .start(ours.parameters().clone())
                .target(target)
                .model(p -> circleWithJacobian(x, p.toArray()))
                .maxEvaluations(10_000)
                .maxIterations(10_000)
                .build();
        LeastSquaresOptimizer.Optimum optimum = new LevenbergMarquardtOptimizer().optimize(problem);
        double[] theirs = optimum.getPoint().toArray();
        double[] mine = ours.parameters();
        // getSigma is sqrt(diag((J^T J)^-1)); getCost is the residual norm.
        double residualScale = optimum.getCost() / Math.sqrt(2 * N - mine.length);
        double[] sigma = optimum.getSigma(1e-14).mapMultiply(residualScale).toArray();
        for (int k = 0; k < mine.length; k++) {
            // The same minimum: parameters agree to a small fraction of their own uncertainty ...
            assertThat(mine[k]).isCloseTo(theirs[k], within(1e-3 * sigma[k]));
            // ... and so do the uncertainties.
            assertThat(Math.sqrt(ours.covariance()[k][k])).isCloseTo(sigma[k], within(1e-3 * sigma[k]));
        }
    }

    private static Pair<RealVector, org.apache.commons.math3.linear.RealMatrix> circleWithJacobian(double[] x, double[] p) {
        int n = x.length;
        double[] value = new double[2 * n];
        double[][] jac = new double[2 * n][p.length];
        for (int i = 0; i < n; i++) {
            double[] base = circle(x[i], p);
            value[2 * i] = base[0];
            value[2 * i + 1] = base[1];
            for (int k = 0; k < p.length; k++) {
                double h = 1e-7 * Math.max(1e-3, Math.abs(p[k]));
                double[] q = p.clone();
                q[k] += h;
                double[] up = circle(x[i], q);
                q[k] = p[k] - h;
                double[] down = circle(x[i], q);
                jac[2 * i][k] = (up[0] - down[0]) / (2 * h);
                jac[2 * i + 1][k] = (up[1] - down[1]) / (2 * h);
            }
        }
        return new Pair<>(new ArrayRealVector(value), new Array2DRowRealMatrix(jac, false));
    }

    /** exp(-j t x) exp(s x) (B + A g / (g + j (x - x0))), p = [br, bi, ar, ai, x0, g, t, s]. */
    private static double[] circle(double x, double[] p) {
        double u = x - p[4];
        double g = p[5];
        double den = g * g + u * u;
        double lr = g * g / den;
        double li = -g * u / den;
        double mr = p[0] + p[2] * lr - p[3] * li;
        double mi = p[1] + p[2] * li + p[3] * lr;
        double gain = Math.exp(p[7] * x);
        double c = gain * Math.cos(p[6] * x);
        double s = -gain * Math.sin(p[6] * x);
        return new double[] {mr * c - mi * s, mr * s + mi * c};
    }
}
