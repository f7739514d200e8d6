package org.qfleet.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class TransmissionNetworkTest {

    private static final double F0 = 10.4e9;
    private static final double QU = 6000;

    @ParameterizedTest
    @ValueSource(doubles = {0.005, 0.03, 0.3, 1, 4})
    void symmetricPeakFollowsCoupledResonatorFormula(double beta) {
        ResonatorCircuit circuit = ResonatorCircuit.transmission(F0, QU, beta, beta);
        Complex s21 = new ResponseProbe(circuit).at(F0).s21();

        // |S21(f0)| = 2 beta / (1 + 2 beta), symmetric coupled-resonator two-port (DESIGN section 4;
        // the insertion-loss form of IEC 62562, recalled from memory).
        assertThat(s21.abs()).isCloseTo(2 * beta / (1 + 2 * beta), within(1e-13));
        assertThat(s21.im()).isCloseTo(0, within(1e-13));
    }

    @ParameterizedTest
    @CsvSource({"0.03, 0.03", "0.5, 0.1", "0.1, 0.5", "2, 0.7"})
    void reflectionsAtResonanceFollowTheCouplings(double beta1, double beta2) {
        ResonatorCircuit circuit = ResonatorCircuit.transmission(F0, QU, beta1, beta2);
        SMatrix s = new ResponseProbe(circuit).at(F0);
        double sum = 1 + beta1 + beta2;

        // Coupled-resonator two-port at f0 (DESIGN section 4): |S21| = 2 sqrt(b1 b2) / (1 + b1 + b2),
        // S11 = (b1 - 1 - b2) / (1 + b1 + b2), S22 likewise with the ports swapped.
        assertThat(s.s21().abs()).isCloseTo(2 * Math.sqrt(beta1 * beta2) / sum, within(1e-13));
        assertThat(s.s11().re()).isCloseTo((beta1 - 1 - beta2) / sum, within(1e-13));
        assertThat(s.s22().re()).isCloseTo((beta2 - 1 - beta1) / sum, within(1e-13));
        assertThat(s.s11().im()).isCloseTo(0, within(1e-13));
    }

    @ParameterizedTest
    @CsvSource({"6000, 0.03, 0.03", "900, 0.05, 0.05", "900, 0.5, 0.1", "20000, 1.5, 0.2"})
    void halfPowerWidthIsF0OverLoadedQ(double qu, double beta1, double beta2) {
        ResonatorCircuit circuit = ResonatorCircuit.transmission(F0, qu, beta1, beta2);
        ResponseProbe probe = new ResponseProbe(circuit);
        double peakPower = probe.at(F0).s21().abs() * probe.at(F0).s21().abs();
        double ql = qu / (1 + beta1 + beta2);

        double[] band = ResponseProbe.crossings(f -> squared(probe.at(f).s21()) - peakPower / 2, F0, ql);

        // Half-power width = f0 / QL with 1 / QL = 1 / Qu + 1 / Qe (Pozar, Microwave Engineering,
        // ch. 6, recalled from memory); centre above f0 by f0 / (8 QL^2) (DESIGN section 4).
        assertThat((band[1] - band[0]) / (F0 / ql)).isCloseTo(1, within(1e-9));
        double centre = 0.5 * (band[0] + band[1]);
        assertThat((centre - F0) / (F0 / (8 * ql * ql))).isCloseTo(1, within(1e-3));
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.01, 0.03, 0.2, 1})
    void unloadedQComesBackFromLoadedQAndPeakTransmission(double beta) {
        ResonatorCircuit circuit = ResonatorCircuit.transmission(F0, QU, beta, beta);
        ResponseProbe probe = new ResponseProbe(circuit);
        double peak = probe.at(F0).s21().abs();
        double[] band = ResponseProbe.crossings(f -> squared(probe.at(f).s21()) - peak * peak / 2, F0, circuit.qLoaded());
        double measuredQl = F0 / (band[1] - band[0]);

        // Qu = QL / (1 - |S21(f0)|) for symmetric coupling (DESIGN section 4).
        assertThat(measuredQl / (1 - peak)).isCloseTo(QU, within(QU * 1e-9));
    }

    @ParameterizedTest
    @CsvSource({"0.5, 0.1", "0.05, 0.2", "1.2, 0.3"})
    void asymmetricCouplingIsRecoveredFromTheReflectionCircles(double beta1, double beta2) {
        ResonatorCircuit circuit = ResonatorCircuit.transmission(F0, QU, beta1, beta2);
        ResponseProbe probe = new ResponseProbe(circuit);
        double peak = probe.at(F0).s21().abs();
        double[] band = ResponseProbe.crossings(f -> squared(probe.at(f).s21()) - peak * peak / 2, F0, circuit.qLoaded());
        double measuredQl = F0 / (band[1] - band[0]);
        // A circle r / (1 + j QL x) has its half-power points a full diameter apart.
        double d11 = probe.at(band[1]).s11().minus(probe.at(band[0]).s11()).abs();
        double d22 = probe.at(band[1]).s22().minus(probe.at(band[0]).s22()).abs();
        double sum = 1 + beta1 + beta2;

        // D11 = 2 b1 / (1 + b1 + b2), D22 = 2 b2 / (1 + b1 + b2), Qu = 2 QL / (2 - D11 - D22) (DESIGN section 4).
        assertThat(d11).isCloseTo(2 * beta1 / sum, within(1e-9));
        assertThat(d22).isCloseTo(2 * beta2 / sum, within(1e-9));
        assertThat(2 * measuredQl / (2 - d11 - d22)).isCloseTo(QU, within(QU * 1e-9));
        // The symmetric formula on an asymmetric device gives Qu / (1 + (sqrt b1 - sqrt b2)^2) (DESIGN section 4).
        double biased = QU / (1 + Math.pow(Math.sqrt(beta1) - Math.sqrt(beta2), 2));
        assertThat(measuredQl / (1 - peak)).isCloseTo(biased, within(QU * 1e-9));
    }

    @ParameterizedTest
    @CsvSource({"0.03, 0.03", "0.5, 0.1", "3, 0.2"})
    void isReciprocalAndPassive(double beta1, double beta2) {
        ResponseProbe probe = new ResponseProbe(ResonatorCircuit.transmission(F0, 500, beta1, beta2));
        for (int i = -200; i <= 200; i++) {
            SMatrix s = probe.at(F0 * (1 + i * 1e-4));
            // Reciprocity of a network of R, L, C and ideal transformers (Pozar ch. 4, recalled from memory).
            assertThat(s.s12().re()).isCloseTo(s.s21().re(), within(1e-15));
            assertThat(s.s12().im()).isCloseTo(s.s21().im(), within(1e-15));
            // Passivity: no more power leaves than enters (common practice check).
            assertThat(squared(s.s11()) + squared(s.s21())).isLessThanOrEqualTo(1 + 1e-12);
            assertThat(squared(s.s22()) + squared(s.s12())).isLessThanOrEqualTo(1 + 1e-12);
        }
    }

    private static double squared(Complex z) {
        return z.re() * z.re() + z.im() * z.im();
    }
}
