package org.qfleet.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** The rotated phasors and gains against the library functions at every point. */
class PhasorsTest {

    private static double[] grid(int n) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = n == 1 ? 0 : -1 + 2.0 * i / (n - 1);
        }
        return x;
    }

    @Test
    void rotationsMatchTheLibraryAtEveryLengthAndTwist() {
        for (int n : new int[] {1, 2, 3, 4, 5, 6, 7, 101, 401, 1601, 20001}) {
            double[] x = grid(n);
            for (double t : new double[] {0, 0.3, -2.5, 40, 900}) {
                double[] cos = new double[n];
                double[] sin = new double[n];
                Phasors.fill(t, x, Phasors.equallySpaced(x), cos, sin);
                for (int i = 0; i < n; i++) {
                    assertThat(cos[i]).as("cos n=%d t=%s i=%d", n, t, i).isCloseTo(Math.cos(t * x[i]), within(1e-11));
                    assertThat(sin[i]).as("sin n=%d t=%s i=%d", n, t, i).isCloseTo(-Math.sin(t * x[i]), within(1e-11));
                }
            }
        }
    }

    @Test
    void gainsMatchTheLibrary() {
        double[] x = grid(1601);
        double[] gain = new double[x.length];
        Phasors.fillGain(0.7, x, true, gain);
        for (int i = 0; i < x.length; i++) {
            assertThat(gain[i]).isCloseTo(Math.exp(0.7 * x[i]), within(1e-12));
        }
    }
}
