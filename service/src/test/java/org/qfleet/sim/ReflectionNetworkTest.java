package org.qfleet.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class ReflectionNetworkTest {

    private static final double F0 = 3.6e9;
    private static final double QU = 900;

    @ParameterizedTest
    @ValueSource(doubles = {0.1, 0.5, 1, 2, 8})
    void reflectionAtResonanceFollowsTheCoupling(double beta) {
        Complex s11 = new ResponseProbe(ResonatorCircuit.reflection(F0, QU, beta)).at(F0).s11();

        // |S11(f0)| = |1 - beta| / (1 + beta) (Pozar, Microwave Engineering, ch. 6, recalled from memory).
        assertThat(s11.abs()).isCloseTo(Math.abs(1 - beta) / (1 + beta), within(1e-13));
        assertThat(s11.im()).isCloseTo(0, within(1e-13));
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.3, 0.9, 1.1, 3})
    void circleEnclosesTheOriginOnlyWhenOverCoupled(double beta) {
        ResponseProbe probe = new ResponseProbe(ResonatorCircuit.reflection(F0, QU, beta));
        double turned = 0;
        double previous = probe.at(F0 / 3).s11().arg();
        for (int i = -8000; i <= 8000; i++) {
            double phase = probe.at(F0 * Math.pow(3, i / 8000.0)).s11().arg();
            turned += Math.IEEEremainder(phase - previous, 2 * Math.PI);
            previous = phase;
        }

        // Over-coupled (beta > 1): the circle encloses the origin and the phase turns a full cycle
        // (DESIGN section 4; Kajfez, Q Factor Measurements, recalled from memory).
        assertThat(Math.abs(turned)).isCloseTo(beta > 1 ? 2 * Math.PI : 0, within(0.02));
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.2, 0.7, 1.5, 4})
    void unloadedQComesBackFromWidthAndDiameter(double beta) {
        ResonatorCircuit circuit = ResonatorCircuit.reflection(F0, QU, beta);
        ResponseProbe probe = new ResponseProbe(circuit);
        double atF0 = probe.at(F0).s11().abs();
        double level = (1 + atF0 * atF0) / 2;

        // Half-power points: |S11|^2 = (1 + |S11(f0)|^2) / 2 (DESIGN section 4).
        double[] band = ResponseProbe.crossings(f -> level - squared(probe.at(f).s11()), F0, circuit.qLoaded());
        double measuredQl = F0 / (band[1] - band[0]);
        double diameter = probe.at(band[1]).s11().minus(probe.at(band[0]).s11()).abs();
        double measuredBeta = diameter / (2 - diameter);

        // D = 2 beta / (1 + beta), beta = D / (2 - D), Qu = QL (1 + beta) (DESIGN section 4).
        assertThat(diameter).isCloseTo(2 * beta / (1 + beta), within(1e-9));
        assertThat(measuredQl).isCloseTo(QU / (1 + beta), within(QU * 1e-9));
        assertThat(measuredQl * (1 + measuredBeta)).isCloseTo(QU, within(QU * 1e-9));
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.2, 1, 5})
    void isPassive(double beta) {
        ResponseProbe probe = new ResponseProbe(ResonatorCircuit.reflection(F0, QU, beta));
        for (int i = -300; i <= 300; i++) {
            assertThat(probe.at(F0 * (1 + i * 1e-4)).s11().abs()).isLessThanOrEqualTo(1 + 1e-12);
        }
    }

    private static double squared(Complex z) {
        return z.re() * z.re() + z.im() * z.im();
    }
}
