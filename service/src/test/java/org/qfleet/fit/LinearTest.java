package org.qfleet.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** The small dense solvers against the identities they must satisfy. */
class LinearTest {

    /** M^T M + n I: symmetric positive definite, with entries of mixed sign and size. */
    private static double[][] spd(int n, long seed) {
        Random random = new Random(seed);
        double[][] m = new double[n][n];
        for (double[] row : m) {
            for (int j = 0; j < n; j++) {
                row[j] = random.nextGaussian() * Math.pow(10, random.nextInt(3) - 1);
            }
        }
        double[][] a = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double s = i == j ? n : 0;
                for (int k = 0; k < n; k++) {
                    s += m[k][i] * m[k][j];
                }
                a[i][j] = s;
            }
        }
        return a;
    }

    @Test
    void inverseTimesMatrixIsTheIdentity() {
        for (int n = 1; n <= 9; n++) {
            double[][] a = spd(n, n);
            double[][] inverse = Linear.inverseSymmetric(a);
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    double s = 0;
                    for (int k = 0; k < n; k++) {
                        s += a[i][k] * inverse[k][j];
                    }
                    assertThat(s).as("n %d, (A A^-1)[%d][%d]", n, i, j).isCloseTo(i == j ? 1 : 0, within(1e-12));
                    assertThat(inverse[i][j]).isEqualTo(inverse[j][i]);
                }
            }
        }
    }

    @Test
    void solveAgreesWithTheInverse() {
        double[][] a = spd(7, 42);
        double[] b = {1, -2, 0.5, 3, 0, -1, 2};
        double[] x = new double[7];
        double[][] inverse = Linear.inverseSymmetric(a);
        assertThat(Linear.solveSymmetric(a, b, x)).isTrue();
        for (int i = 0; i < 7; i++) {
            double expected = 0;
            for (int k = 0; k < 7; k++) {
                expected += inverse[i][k] * b[k];
            }
            assertThat(x[i]).isCloseTo(expected, within(1e-12 * (1 + Math.abs(expected))));
        }
    }

    @Test
    void singularMatrixHasNoInverse() {
        double[][] a = {{1, 2}, {2, 4}};
        assertThat(Linear.inverseSymmetric(a)).isNull();
    }
}
