package org.qfleet.sweep;

import static org.assertj.core.api.Assertions.assertThat;

import java.math.BigInteger;
import org.junit.jupiter.api.Test;

/** Every entry of the written-out table, recomputed from its definition with exact integers. */
class PowersOfFiveTest {

    private static final BigInteger FIVE = BigInteger.valueOf(5);

    @Test
    void everyEntryIsTheDefined128BitApproximation() {
        for (int q = PowersOfFive.MIN_Q; q <= PowersOfFive.MAX_Q; q++) {
            BigInteger expected = q >= 0 ? positive(q) : negative(q);

            assertThat(expected.bitLength()).as("5^%d", q).isEqualTo(128);
            assertThat(PowersOfFive.high(q)).as("high bits of 5^%d", q).isEqualTo(expected.shiftRight(64).longValue());
            assertThat(PowersOfFive.low(q)).as("low bits of 5^%d", q).isEqualTo(expected.longValue());
        }
    }

    /** 5^q with its top bit moved to bit 127, truncated when longer. */
    private static BigInteger positive(int q) {
        BigInteger power = FIVE.pow(q);
        int shift = 128 - power.bitLength();
        return shift >= 0 ? power.shiftLeft(shift) : power.shiftRight(-shift);
    }

    /** 2^b / 5^-q + 1, b = z + 127 for q >= -27 and 2z + 128 below (2^z the least power of two >= 5^-q), cut to 128 bits. */
    private static BigInteger negative(int q) {
        BigInteger power = FIVE.pow(-q);
        int z = power.subtract(BigInteger.ONE).bitLength();
        int b = q >= -27 ? z + 127 : 2 * z + 128;
        BigInteger reciprocal = BigInteger.ONE.shiftLeft(b).divide(power).add(BigInteger.ONE);
        return reciprocal.shiftRight(Math.max(0, reciprocal.bitLength() - 128));
    }
}
