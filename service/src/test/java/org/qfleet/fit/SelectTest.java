package org.qfleet.fit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** Selection against a full sort, on the shapes the fits feed it: noise, sorted data, a peaked line, ties. */
class SelectTest {

    private static double sortedMedian(double[] v) {
        double[] s = v.clone();
        Arrays.sort(s);
        int m = s.length / 2;
        return s.length % 2 == 1 ? s[m] : 0.5 * (s[m - 1] + s[m]);
    }

    private static void check(double[] v) {
        double expected = sortedMedian(v);
        assertThat(Select.median(v.clone(), v.length)).isEqualTo(expected);
        for (int k : new int[] {0, v.length / 3, v.length - 1}) {
            double[] copy = v.clone();
            double[] sorted = v.clone();
            Arrays.sort(sorted);
            assertThat(Select.kth(copy, copy.length, k)).isEqualTo(sorted[k]);
        }
    }

    @Test
    void agreesWithSortingOnManyShapes() {
        Random random = new Random(11);
        for (int n : new int[] {1, 2, 3, 4, 5, 101, 400, 401}) {
            double[] noise = new double[n];
            double[] sorted = new double[n];
            double[] peaked = new double[n];
            double[] ties = new double[n];
            for (int i = 0; i < n; i++) {
                noise[i] = random.nextGaussian();
                sorted[i] = i;
                double u = (i - n / 2.0) / 20;
                peaked[i] = 1 / (1 + u * u);
                ties[i] = random.nextInt(3);
            }
            check(noise);
            check(sorted);
            check(peaked);
            check(ties);
        }
    }
}
