package org.qfleet.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.qfleet.sweep.SParameter;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepInfo;
import org.qfleet.sweep.Topology;
import org.qfleet.sweep.Trace;

class SweepSimulatorTest {

    private static final ResonatorCircuit CAVITY = ResonatorCircuit.transmission(10.4e9, 6000, 0.04, 0.025);
    private static final SweepPlan PLAN = SweepPlan.around(10.4e9, CAVITY.qLoaded(), 8, 401);

    @Test
    void transmissionSweepCarriesAllFourTracesAndTheTruth() {
        SweepInfo info = new SweepInfo("sw-1", "st-01", "p", "lot", "u", "2025-01-01T00:00:00Z", null, null);
        SimulatedSweep simulated = new SweepSimulator(1).simulate(CAVITY, PLAN, Impairments.noise(40), info);
        Sweep sweep = simulated.sweep();
        Truth truth = simulated.truth();

        assertThat(sweep.source()).isEqualTo("sim");
        assertThat(sweep.info()).isEqualTo(info);
        assertThat(sweep.topology()).isEqualTo(Topology.TRANSMISSION);
        assertThat(sweep.referenceOhms()).isEqualTo(50);
        assertThat(sweep.traces()).containsOnlyKeys(SParameter.S11, SParameter.S21, SParameter.S12, SParameter.S22);
        assertThat(sweep.frequencyHz()).hasSize(401).startsWith(PLAN.startHz()).endsWith(PLAN.stopHz());
        assertThat(truth.f0Hz()).isEqualTo(10.4e9);
        assertThat(truth.qUnloaded()).isEqualTo(6000);
        // 1/Qe = sum 1/Qe_k with Qe_k = Qu / beta_k; 1/QL = 1/Qu + 1/Qe (Pozar ch. 6, recalled from memory).
        assertThat(1 / truth.qExternal()).isCloseTo(0.04 / 6000 + 0.025 / 6000, within(1e-15));
        assertThat(1 / truth.qLoaded()).isCloseTo(1 / 6000.0 + 1 / truth.qExternal(), within(1e-15));
        assertThat(truth.circleDiameter()).isCloseTo(2 * Math.sqrt(0.04 * 0.025) / 1.065, within(1e-15));
        assertThat(truth.noiseSigma()).isCloseTo(truth.circleDiameter() / 100, within(1e-15));
    }

    @Test
    void notchAndReflectionCarryTheirTraces() {
        SweepSimulator simulator = new SweepSimulator(2);
        ResonatorCircuit notch = ResonatorCircuit.notch(6e9, 20000, 0.5, 0.2);
        ResonatorCircuit reflection = ResonatorCircuit.reflection(3.6e9, 900, 2);
        SimulatedSweep dip = simulator.simulate(notch, SweepPlan.around(6e9, notch.qLoaded(), 8, 101), Impairments.NONE);
        SimulatedSweep oneport = simulator.simulate(reflection, SweepPlan.around(3.6e9, 300, 8, 101), Impairments.NONE);

        assertThat(dip.sweep().traces()).containsOnlyKeys(SParameter.S21, SParameter.S11);
        assertThat(dip.truth().coupling2()).isZero();
        assertThat(dip.truth().f0Hz()).isLessThan(6e9);
        assertThat(oneport.sweep().traces()).containsOnlyKeys(SParameter.S11);
        assertThat(oneport.truth().circleDiameter()).isCloseTo(4.0 / 3, within(1e-15));
        assertThat(oneport.truth().noiseSigma()).isZero();
    }

    @Test
    void sameSeedGivesTheSameSweepsAndAnotherSeedDoesNot() {
        Impairments noisy = Impairments.noise(30);
        Trace first = new SweepSimulator(7).simulate(CAVITY, PLAN, noisy).sweep().traces().get(SParameter.S21);
        Trace again = new SweepSimulator(7).simulate(CAVITY, PLAN, noisy).sweep().traces().get(SParameter.S21);
        Trace other = new SweepSimulator(8).simulate(CAVITY, PLAN, noisy).sweep().traces().get(SParameter.S21);

        assertThat(again.re()).containsExactly(first.re());
        assertThat(again.im()).containsExactly(first.im());
        assertThat(other.re()).isNotEqualTo(first.re());
    }

    @Test
    void noiseHasTheStatedSigmaOnEveryComponent() {
        SweepPlan dense = SweepPlan.around(10.4e9, CAVITY.qLoaded(), 8, 4001);
        double snrDb = 30;
        SimulatedSweep noisy = new SweepSimulator(11).simulate(CAVITY, dense, Impairments.noise(snrDb));
        Sweep clean = new SweepSimulator(11).simulate(CAVITY, dense, Impairments.NONE).sweep();
        double sigma = noisy.truth().circleDiameter() * Math.pow(10, -snrDb / 20);

        double sum = 0;
        double sumSquares = 0;
        double sumProducts = 0;
        int count = 0;
        for (SParameter parameter : clean.traces().keySet()) {
            Trace n = noisy.sweep().traces().get(parameter);
            Trace c = clean.traces().get(parameter);
            for (int i = 0; i < c.size(); i++) {
                double dx = n.re()[i] - c.re()[i];
                double dy = n.im()[i] - c.im()[i];
                sum += dx + dy;
                sumSquares += dx * dx + dy * dy;
                sumProducts += dx * dy;
                count++;
            }
        }
        int samples = 2 * count;
        // Sample statistics of 32 008 independent normal draws: the standard error of the standard
        // deviation is sigma / sqrt(2 n), about 0.4 % here (common practice bound of several errors).
        assertThat(noisy.truth().noiseSigma()).isCloseTo(sigma, within(1e-15));
        assertThat(Math.sqrt(sumSquares / samples) / sigma).isCloseTo(1, within(0.03));
        assertThat(Math.abs(sum / samples)).isLessThan(5 * sigma / Math.sqrt(samples));
        assertThat(Math.abs(sumProducts / count) / (sigma * sigma)).isLessThan(5 / Math.sqrt(count));
    }

    @Test
    void delayTurnsThePhaseBy2PiFTau() {
        double tau = 2.5e-9;
        Sweep plain = new SweepSimulator(3).simulate(CAVITY, PLAN, Impairments.NONE).sweep();
        Sweep delayed = new SweepSimulator(3).simulate(CAVITY, PLAN, Impairments.NONE.withDelay(tau)).sweep();

        for (SParameter parameter : plain.traces().keySet()) {
            double[] f = plain.frequencyHz();
            double[] turn = new double[f.length];
            for (int i = 0; i < f.length; i++) {
                Complex ratio = complex(delayed, parameter, i).dividedBy(complex(plain, parameter, i));
                assertThat(ratio.abs()).isCloseTo(1, within(1e-12));
                turn[i] = i == 0 ? ratio.arg() : turn[i - 1] + Math.IEEEremainder(ratio.arg() - turn[i - 1], 2 * Math.PI);
            }
            // A delay tau multiplies by exp(-j 2 pi f tau): the phase slope changes by -2 pi tau.
            double slope = (turn[f.length - 1] - turn[0]) / (f[f.length - 1] - f[0]);
            assertThat(slope / (-2 * Math.PI * tau)).isCloseTo(1, within(1e-9));
            assertThat(Math.IEEEremainder(turn[0] + 2 * Math.PI * f[0] * tau, 2 * Math.PI)).isCloseTo(0, within(1e-9));
        }
    }

    @Test
    void tiltIsZeroAtTheCentreAndHalfTheSpanValueAtTheEnds() {
        double tiltDb = 0.8;
        SweepPlan plan = SweepPlan.around(10.4e9, CAVITY.qLoaded(), 8, 5);
        Sweep plain = new SweepSimulator(3).simulate(CAVITY, plan, Impairments.NONE).sweep();
        Sweep tilted = new SweepSimulator(3).simulate(CAVITY, plan, Impairments.NONE.withTilt(tiltDb)).sweep();

        for (SParameter parameter : plain.traces().keySet()) {
            Trace a = plain.traces().get(parameter);
            Trace b = tilted.traces().get(parameter);
            double[] expectedDb = {-0.4, -0.2, 0, 0.2, 0.4};
            for (int i = 0; i < 5; i++) {
                assertThat(20 * Math.log10(b.magnitude(i) / a.magnitude(i))).isCloseTo(expectedDb[i], within(1e-12));
            }
        }
    }

    @Test
    void leakageIsAddedToTransmissionBeforeTheDelay() {
        double tau = 1e-9;
        Impairments both = Impairments.NONE.withLeakage(0.01, -0.02).withDelay(tau);
        Sweep plain = new SweepSimulator(4).simulate(CAVITY, PLAN, Impairments.NONE).sweep();
        Sweep leaky = new SweepSimulator(4).simulate(CAVITY, PLAN, both).sweep();

        for (int i = 0; i < plain.size(); i++) {
            Complex undelay = Complex.unit(2 * Math.PI * plain.frequencyHz()[i] * tau);
            for (SParameter parameter : new SParameter[] {SParameter.S21, SParameter.S12}) {
                Complex added = complex(leaky, parameter, i).times(undelay).minus(complex(plain, parameter, i));
                assertThat(added.re()).isCloseTo(0.01, within(1e-12));
                assertThat(added.im()).isCloseTo(-0.02, within(1e-12));
            }
            Complex s11 = complex(leaky, SParameter.S11, i).times(undelay).minus(complex(plain, SParameter.S11, i));
            assertThat(s11.abs()).isCloseTo(0, within(1e-12));
        }
    }

    @Test
    void magnitudeOnlyKeepsTheNoisyMagnitudeAndDropsThePhase() {
        Impairments complex = Impairments.noise(25).withDelay(1e-9);
        Sweep full = new SweepSimulator(5).simulate(CAVITY, PLAN, complex).sweep();
        Sweep scalar = new SweepSimulator(5).simulate(CAVITY, PLAN, complex.withMagnitudeOnly(true)).sweep();

        Trace s21 = scalar.traces().get(SParameter.S21);
        assertThat(s21.phaseKnown()).isFalse();
        assertThat(s21.im()).containsOnly(0.0);
        for (int i = 0; i < s21.size(); i++) {
            assertThat(s21.re()[i]).isEqualTo(full.traces().get(SParameter.S21).magnitude(i));
        }
    }

    @Test
    void rejectsImpossibleInputsWithTheFieldNamed() {
        assertThatThrownBy(() -> ResonatorCircuit.transmission(10e9, -5, 0.1, 0.1))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("qUnloaded");
        assertThatThrownBy(() -> ResonatorCircuit.transmission(10e9, 1000, 0.1, 0))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("coupling2");
        assertThatThrownBy(() -> ResonatorCircuit.notch(10e9, 1000, 0.1, Math.PI / 2))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("asymmetryRad");
        assertThatThrownBy(() -> new ResonatorCircuit(Topology.REFLECTION, 1e9, 100, 1, 0, 0.1))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("notch only");
        assertThatThrownBy(() -> new SweepPlan(2e9, 1e9, 101))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("startHz < stopHz");
        assertThatThrownBy(() -> new SweepPlan(1e9, 2e9, 1))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("at least 2 points");
        assertThatThrownBy(() -> Impairments.noise(Double.NaN))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("snrDb");
        assertThatThrownBy(() -> ResonatorCircuit.transmissionWithInsertionLoss(10e9, 1000, 0.5, 50))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("insertion loss");
    }

    @Test
    void insertionLossFactoryHitsTheRequestedPeak() {
        ResonatorCircuit circuit = ResonatorCircuit.transmissionWithInsertionLoss(3.6e9, 900, 25, 1.3);
        double peak = new ResponseProbe(circuit).at(3.6e9).s21().abs();

        assertThat(20 * Math.log10(peak)).isCloseTo(-25, within(1e-12));
        assertThat(circuit.coupling1() / circuit.coupling2()).isCloseTo(1.3, within(1e-12));
    }

    private static Complex complex(Sweep sweep, SParameter parameter, int i) {
        Trace t = sweep.traces().get(parameter);
        return new Complex(t.re()[i], t.im()[i]);
    }
}
