package org.qfleet.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** The turned phasors and the gains against the library functions at every point. */
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
                PhasorWalk phasor = PhasorWalk.of(t, x, Phasors.equallySpaced(x));
                for (int i = 0; i < n; i++) {
                    phasor.stepTo(i);
                    assertThat(phasor.c).as("cos n=%d t=%s i=%d", n, t, i).isCloseTo(Math.cos(t * x[i]), within(1e-11));
                    assertThat(phasor.s).as("sin n=%d t=%s i=%d", n, t, i).isCloseTo(-Math.sin(t * x[i]), within(1e-11));
                }
            }
        }
    }

    @Test
    void gainsMatchTheLibrary() {
        for (int n : new int[] {1, 2, 3, 4, 5, 6, 7, 401, 1601, 20001}) {
            double[] x = grid(n);
            for (double s : new double[] {0, 0.7, -3}) {
                double[] gain = new double[n];
                Phasors.fillGain(s, x, Phasors.equallySpaced(x), gain);
                for (int i = 0; i < n; i++) {
                    double expected = Math.exp(s * x[i]);
                    assertThat(gain[i]).as("n=%d s=%s i=%d", n, s, i).isCloseTo(expected, within(1e-11 * expected));
                }
            }
        }
    }
}
