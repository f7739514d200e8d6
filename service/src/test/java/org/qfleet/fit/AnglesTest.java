package org.qfleet.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** The fast arc tangent against the library's in every quadrant, and its special values. */
class AnglesTest {

    @Test
    void staysWithinTheStatedErrorEverywhere() {
        Random random = new Random(2);
        double worst = 0;
        for (int i = 0; i < 200_000; i++) {
            double angle = (random.nextDouble() * 2 - 1) * Math.PI;
            double radius = Math.pow(10, random.nextDouble() * 12 - 6);
            double y = radius * Math.sin(angle);
            double x = radius * Math.cos(angle);
            worst = Math.max(worst, Math.abs(Angles.atan2(y, x) - Math.atan2(y, x)));
        }
        assertThat(worst).isLessThan(3e-8);
    }

    @Test
    void specialValuesAreTheLibrarys() {
        double[] values = {0.0, -0.0, 1.0, -1.0, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NaN};
        for (double y : values) {
            for (double x : values) {
                if (y != 0 && x != 0 && Double.isFinite(x) && Double.isFinite(y)) {
                    continue;
                }
                // bit patterns, so that NaN equals NaN and -0.0 differs from 0.0
                assertThat(Double.doubleToLongBits(Angles.atan2(y, x))).as("atan2(%s, %s)", y, x)
                        .isEqualTo(Double.doubleToLongBits(Math.atan2(y, x)));
            }
        }
        assertThat(Angles.atan2(1, 1)).isCloseTo(Math.PI / 4, within(3e-8));
        assertThat(Angles.atan2(1e-300, -1)).isCloseTo(Math.PI, within(1e-15));
    }
}
