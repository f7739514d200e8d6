package org.qfleet.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class NotchNetworkTest {

    private static final double F0 = 6.0e9;
    private static final double QU = 20000;

    @ParameterizedTest
    @ValueSource(doubles = {0.05, 0.5, 1, 3, 20})
    void symmetricDipFallsToLoadedOverUnloadedQ(double beta) {
        ResonatorCircuit circuit = ResonatorCircuit.notch(F0, QU, beta);
        ResponseProbe probe = new ResponseProbe(circuit);
        Complex dip = probe.at(F0).s21();

        // S21min = QL / Qu = 1 / (1 + beta) of the off-resonance level (DESIGN section 4).
        assertThat(dip.re()).isCloseTo(circuit.qLoaded() / QU, within(1e-13));
        assertThat(dip.im()).isCloseTo(0, within(1e-13));
        assertThat(probe.at(F0 * (1 + 1e-6)).s21().abs()).isGreaterThan(dip.abs());
        assertThat(probe.at(F0 * (1 - 1e-6)).s21().abs()).isGreaterThan(dip.abs());
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.1, 1, 4})
    void unloadedQComesBackFromTheDip(double beta) {
        ResonatorCircuit circuit = ResonatorCircuit.notch(F0, QU, beta);
        ResponseProbe probe = new ResponseProbe(circuit);
        double minimum = probe.at(F0).s21().abs();
        double level = (1 + minimum * minimum) / 2;

        // Half-power points of a dip: |S21|^2 = (1 + S21min^2) / 2 (DESIGN section 4).
        double[] band = ResponseProbe.crossings(f -> squared(probe.at(f).s21()) - level, F0, circuit.qLoaded());
        double measuredQl = F0 / (band[1] - band[0]);

        assertThat(measuredQl).isCloseTo(circuit.qLoaded(), within(circuit.qLoaded() * 1e-9));
        // Qu = QL / S21min and Qe = QL / (1 - S21min) (DESIGN section 4).
        assertThat(measuredQl / minimum).isCloseTo(QU, within(QU * 1e-9));
        assertThat(measuredQl / (1 - minimum)).isCloseTo(QU / beta, within(QU / beta * 1e-9));
    }

    @ParameterizedTest
    @CsvSource({"0.5, 0.3", "2, -0.6", "0.2, 1.0", "1, 0"})
    void asymmetricDipFollowsKhalilsModelWithTheSameUnloadedQ(double beta, double phi) {
        ResonatorCircuit circuit = ResonatorCircuit.notch(F0, QU, beta, phi);
        ResonatorNetwork network = ResonatorNetwork.of(circuit);
        ResponseProbe probe = new ResponseProbe(circuit);
        // Far from resonance the series branch is open; what remains is the mismatched feed line.
        // At 100 f0 and f0 / 100 the detuning is equal and opposite, so the resonator's remainders cancel.
        Complex background = probe.at(F0 * 100).s21().plus(probe.at(F0 / 100).s21()).times(0.5);
        double f0 = network.loadedF0Hz();
        Complex atF0 = resonantPart(probe, background, f0);
        double radius = atF0.abs();

        // Khalil et al., J. Appl. Phys. 111, 054510 (2012): S21 = background (1 - (QL/|Qe|) e^{j phi}
        // / (1 + 2j QL (f - f0) / f0)), and 1/Qu = 1/QL - Re(1/Qe) = 1/QL - cos(phi) / |Qe|.
        assertThat(atF0.arg()).isCloseTo(phi, within(1e-10));
        double[] band = ResponseProbe.crossings(
                f -> squared(resonantPart(probe, background, f)) - radius * radius / 2, f0, circuit.qLoaded());
        double measuredQl = f0 / (band[1] - band[0]);
        double magnitudeOfQe = measuredQl / radius;
        double measuredQu = 1 / (1 / measuredQl - Math.cos(atF0.arg()) / magnitudeOfQe);

        assertThat(measuredQl).isCloseTo(circuit.qLoaded(), within(circuit.qLoaded() * 1e-8));
        assertThat(measuredQu).isCloseTo(QU, within(QU * 1e-8));
        // The circle's diameter is QL / Qe for every phi: radius times |background|.
        assertThat(radius * background.abs()).isCloseTo(network.circleDiameter(), within(1e-10));
        assertThat(network.circleDiameter()).isCloseTo(beta / (1 + beta), within(1e-15));
        // The half-power band is centred f0 / (8 QL^2) above the loaded resonance (DESIGN section 4).
        double centre = 0.5 * (band[0] + band[1]);
        assertThat((centre - f0) / f0).isCloseTo(1 / (8 * measuredQl * measuredQl), within(1e-11));
    }

    @ParameterizedTest
    @CsvSource({"0.5, 0", "2, 0.7", "0.1, -1.2"})
    void isPassive(double beta, double phi) {
        ResponseProbe probe = new ResponseProbe(ResonatorCircuit.notch(F0, 300, beta, phi));
        for (int i = -200; i <= 200; i++) {
            SMatrix s = probe.at(F0 * (1 + i * 1e-4));
            assertThat(squared(s.s11()) + squared(s.s21())).isLessThanOrEqualTo(1 + 1e-12);
            assertThat(s.s12().re()).isCloseTo(s.s21().re(), within(1e-15));
        }
    }

    /** 1 - S21 / background: the part of the response the resonator adds. */
    private static Complex resonantPart(ResponseProbe probe, Complex background, double fHz) {
        return Complex.ONE.minus(probe.at(fHz).s21().dividedBy(background));
    }

    private static double squared(Complex z) {
        return z.re() * z.re() + z.im() * z.im();
    }
}
