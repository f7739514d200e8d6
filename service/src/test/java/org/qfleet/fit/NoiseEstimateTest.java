package org.qfleet.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.withinPercentage;

import java.util.Random;
import org.junit.jupiter.api.Test;

class NoiseEstimateTest {

    @Test
    void recoversWhiteNoiseUnderASmoothResonance() {
        Random random = new Random(7);
        int n = 4001;
        double sigma = 0.003;
        double[] re = new double[n];
        double[] im = new double[n];
        double[] mag = new double[n];
        for (int i = 0; i < n; i++) {
            double u = (i - n / 2.0) / 200.0;
            re[i] = 0.1 / (1 + u * u) + sigma * random.nextGaussian();
            im[i] = -0.1 * u / (1 + u * u) + sigma * random.nextGaussian();
            mag[i] = 0.1 / Math.sqrt(1 + u * u) + sigma * random.nextGaussian();
        }
        assertThat(NoiseEstimate.complexSigma(re, im)).isCloseTo(sigma, withinPercentage(6));
        assertThat(NoiseEstimate.realSigma(mag)).isCloseTo(sigma, withinPercentage(6));
    }
}
