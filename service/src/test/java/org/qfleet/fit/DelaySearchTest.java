package org.qfleet.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** The delay search on a simulated circle: its two ways of summing agree, and it finds the delay. */
class DelaySearchTest {

    private static final int N = 203;
    private static final double X0 = 0.05;
    private static final double G = 0.1;
    private static final double DELAY = 2.3;

    /** exp(-j t x) (B + A g / (g + j (x - x0))) plus noise, as {x, re, im}. */
    private static double[][] circle(double br, double bi, long seed) {
        Random random = new Random(seed);
        double[][] d = new double[3][N];
        for (int i = 0; i < N; i++) {
            double x = -1 + 2.0 * i / (N - 1);
            double u = x - X0;
            double den = G * G + u * u;
            double mr = br + 0.3 * G * G / den + 0.1 * G * u / den;
            double mi = bi - 0.3 * G * u / den + 0.1 * G * G / den;
            double c = Math.cos(DELAY * x);
            double s = Math.sin(DELAY * x);
            d[0][i] = x;
            d[1][i] = c * mr + s * mi + 1e-3 * random.nextGaussian();
            d[2][i] = c * mi - s * mr + 1e-3 * random.nextGaussian();
        }
        return d;
    }

    @Test
    void polynomialAndPhasorSumsAgreeOnEquallySpacedPoints() {
        for (boolean background : new boolean[] {false, true}) {
            double[][] d = circle(background ? 0.6 : 0, background ? -0.4 : 0, 3);
            // Equally spaced points may be summed either way: as a polynomial in exp(j t h) or over phasors.
            DelaySearch.Start polynomial = DelaySearch.refine(d[0], d[1], d[2], X0, G, DELAY - 1.1, background, true, true);
            DelaySearch.Start phasors = DelaySearch.refine(d[0], d[1], d[2], X0, G, DELAY - 1.1, background, false, true);
            assertThat(polynomial.delay()).isCloseTo(phasors.delay(), within(1e-9));
            assertThat(polynomial.amplitudes()).containsExactly(phasors.amplitudes(), within(1e-9));
            // ... and the walk and parabolas end near the true delay and amplitudes
            assertThat(polynomial.delay()).isCloseTo(DELAY, within(0.05));
            assertThat(polynomial.amplitudes()[2]).isCloseTo(0.3, within(0.02));
            assertThat(polynomial.amplitudes()[3]).isCloseTo(0.1, within(0.02));
        }
    }
}
