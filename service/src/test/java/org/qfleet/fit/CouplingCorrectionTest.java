package org.qfleet.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;

class CouplingCorrectionTest {

    private static final double QL = 5000;

    private static ResonanceShape peak(double s21) {
        return new ResonanceShape(1e10, QL, s21, 0, 1);
    }

    private static ResonanceShape dip(double diameter, double phi) {
        return new ResonanceShape(1e10, QL, diameter, 1, Math.cos(phi));
    }

    @Test
    void insertionLossFormulaOfCavityMethods() {
        // Qu = QL / (1 - 10^(-IL/20)) (IEC 62562 / IEC 61338-1-3 form): IL = 20 dB gives Qu = QL / 0.9.
        Coupling c = CouplingCorrection.apply(CouplingRoute.TRANSMISSION_SYMMETRIC, List.of(peak(Math.pow(10, -20.0 / 20))));
        assertThat(c.qUnloaded()).isCloseTo(QL / 0.9, within(1e-6));
        assertThat(c.resonanceDb()).isCloseTo(-20, within(1e-9));
    }

    @Test
    void weakCouplingRuleOfThumb() {
        // Common practice: at -20 dB insertion loss QL reads about 10 % below Qu, at -30 dB about 3 %.
        double at20 = CouplingCorrection.apply(CouplingRoute.TRANSMISSION_SYMMETRIC, List.of(peak(0.1))).qUnloaded();
        double at30 = CouplingCorrection.apply(CouplingRoute.TRANSMISSION_SYMMETRIC,
                List.of(peak(Math.pow(10, -1.5)))).qUnloaded();
        assertThat((at20 - QL) / at20).isCloseTo(0.10, within(0.005));
        assertThat((at30 - QL) / at30).isCloseTo(0.03, within(0.003));
    }

    @Test
    void symmetricCouplingsSatisfyTheTwoPortRelation() {
        // |S21(f0)| = 2 beta / (1 + 2 beta) for equal couplings (coupled-resonator two-port).
        Coupling c = CouplingCorrection.apply(CouplingRoute.TRANSMISSION_SYMMETRIC, List.of(peak(0.3)));
        double beta = c.coupling1();
        assertThat(2 * beta / (1 + 2 * beta)).isCloseTo(0.3, within(1e-12));
        assertThat(1 / c.qUnloaded() + 1 / c.qExternal()).isCloseTo(1 / QL, within(1e-15));
    }

    @Test
    void portsRouteRecoversAsymmetricCouplingsAndShowsTheSymmetricBias() {
        double b1 = 0.5;
        double b2 = 0.1;
        double sum = 1 + b1 + b2;
        ResonanceShape s21 = peak(2 * Math.sqrt(b1 * b2) / sum);
        // D11 = 2 b1 / (1 + b1 + b2), D22 = 2 b2 / (1 + b1 + b2), background |S11| = 1 off resonance.
        ResonanceShape s11 = dip(2 * b1 / sum, 0);
        ResonanceShape s22 = dip(2 * b2 / sum, 0);
        Coupling ports = CouplingCorrection.apply(CouplingRoute.TRANSMISSION_PORTS, List.of(s21, s11, s22));
        assertThat(ports.qUnloaded()).isCloseTo(QL * sum, within(1e-6));
        assertThat(ports.coupling1()).isCloseTo(b1, within(1e-12));
        assertThat(ports.coupling2()).isCloseTo(b2, within(1e-12));
        assertThat(CouplingCorrection.predictedTransmission(ports)).isCloseTo(s21.amplitude(), within(1e-12));
        // DESIGN.md section 4: the symmetric formula returns Qu / (1 + (sqrt b1 - sqrt b2)^2), -13 % at 0.5 / 0.1.
        Coupling symmetric = CouplingCorrection.apply(CouplingRoute.TRANSMISSION_SYMMETRIC, List.of(s21));
        double expected = QL * sum / (1 + Math.pow(Math.sqrt(b1) - Math.sqrt(b2), 2));
        assertThat(symmetric.qUnloaded()).isCloseTo(expected, within(1e-6));
        assertThat(symmetric.qUnloaded() / ports.qUnloaded() - 1).isCloseTo(-0.13, within(0.005));
    }

    @Test
    void notchMinimumAndDiameterCorrection() {
        // Symmetric notch: S21min = QL / Qu, Qe = QL / (1 - S21min).
        double beta = 2;
        double s21min = 1 / (1 + beta);
        Coupling c = CouplingCorrection.apply(CouplingRoute.NOTCH, List.of(dip(1 - s21min, 0)));
        assertThat(c.qUnloaded()).isCloseTo(QL / s21min, within(1e-6));
        assertThat(c.qExternal()).isCloseTo(QL / (1 - s21min), within(1e-6));
        assertThat(c.coupling1()).isCloseTo(beta, within(1e-9));
        // Khalil et al., J. Appl. Phys. 111, 054510 (2012): 1/Qu = 1/QL - Re(1/Qc), QL/Qc = d exp(j phi).
        double d = 0.6;
        double phi = 0.4;
        Coupling rotated = CouplingCorrection.apply(CouplingRoute.NOTCH, List.of(dip(d, phi)));
        assertThat(1 / rotated.qUnloaded()).isCloseTo(1 / QL - d * Math.cos(phi) / QL, within(1e-15));
    }

    @Test
    void reflectionUnderAndOverCoupled() {
        // D = 2 beta / (1 + beta), Qu = QL (1 + beta), for beta below and above critical coupling.
        for (double beta : new double[] {0.3, 1.0, 4.0}) {
            Coupling c = CouplingCorrection.apply(CouplingRoute.REFLECTION, List.of(dip(2 * beta / (1 + beta), 0)));
            assertThat(c.coupling1()).isCloseTo(beta, within(1e-9));
            assertThat(c.qUnloaded()).isCloseTo(QL * (1 + beta), within(1e-6));
            // |S11(f0)| = |1 - beta| / (1 + beta).
            assertThat(Math.pow(10, c.resonanceDb() / 20)).isCloseTo(Math.abs(1 - beta) / (1 + beta), within(1e-9));
        }
    }
}
