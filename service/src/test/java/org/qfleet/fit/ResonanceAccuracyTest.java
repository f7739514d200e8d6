package org.qfleet.fit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.api.Test;
import org.qfleet.sim.Impairments;
import org.qfleet.sim.ResonatorCircuit;
import org.qfleet.sim.SimulatedSweep;
import org.qfleet.sim.SweepPlan;
import org.qfleet.sim.SweepSimulator;

/**
 * Recovery of the known Qu of circuit-model sweeps (coupled RLC networks solved as two-ports, so
 * the data are not the Lorentzian the estimators assume) across couplings, topologies, noise and
 * impairments. The truth is the circuit's own Qu = omega0 R C (Pozar, Microwave Engineering, ch. 6).
 */
class ResonanceAccuracyTest {

    private static final ResonanceAnalyzer ANALYZER = new ResonanceAnalyzer();

    static Stream<Arguments> noiselessCases() {
        Impairments fixture = new Impairments(Double.POSITIVE_INFINITY, 7e-9, 2e-4, -1e-4, 0.4, false);
        return Stream.of(
                Arguments.of("weak symmetric transmission", ResonatorCircuit.transmission(10.4e9, 6000, 0.03, 0.03), Impairments.NONE, CouplingRoute.TRANSMISSION_PORTS),
                Arguments.of("strong symmetric transmission", ResonatorCircuit.transmission(10.4e9, 6000, 1.5, 1.5), Impairments.NONE, CouplingRoute.TRANSMISSION_PORTS),
                Arguments.of("asymmetric transmission", ResonatorCircuit.transmission(3.6e9, 900, 0.5, 0.1), Impairments.NONE, CouplingRoute.TRANSMISSION_PORTS),
                Arguments.of("transmission with delay, leakage and tilt", ResonatorCircuit.transmission(3.6e9, 900, 0.1, 0.1), fixture, CouplingRoute.TRANSMISSION_PORTS),
                // 2.5 us of cable turns the phase by almost 1 rad from point to point: too far for a delay read off every 4th point
                Arguments.of("transmission behind a very long cable", ResonatorCircuit.transmission(2e9, 1000, 0.1, 0.1), Impairments.NONE.withDelay(2.5e-6), CouplingRoute.TRANSMISSION_PORTS),
                Arguments.of("symmetric notch", ResonatorCircuit.notch(5e9, 20000, 1.2), Impairments.NONE.withDelay(20e-9), CouplingRoute.NOTCH),
                Arguments.of("asymmetric notch", ResonatorCircuit.notch(5e9, 20000, 0.7, 0.35), Impairments.NONE.withDelay(20e-9), CouplingRoute.NOTCH),
                Arguments.of("under-coupled reflection", ResonatorCircuit.reflection(2.4e9, 3000, 0.4), Impairments.NONE.withDelay(3e-9), CouplingRoute.REFLECTION),
                Arguments.of("over-coupled reflection", ResonatorCircuit.reflection(2.4e9, 3000, 3.0), Impairments.NONE.withDelay(3e-9), CouplingRoute.REFLECTION));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("noiselessCases")
    void noiselessCircuitDataGiveQuWithoutBias(String name, ResonatorCircuit circuit, Impairments impairments,
                                               CouplingRoute route) throws FitException {
        SimulatedSweep s = new SweepSimulator(1).simulate(circuit,
                SweepPlan.around(circuit.f0Hz(), circuit.qLoaded(), 10, 401), impairments);
        ResonanceResult r = ANALYZER.analyze(s.sweep());
        assertThat(r.route()).isEqualTo(route);
        assertThat(relativeError(r, s)).as(name).isLessThan(2e-4);
        assertThat(Math.abs(r.qLoaded() / s.truth().qLoaded() - 1)).isLessThan(2e-4);
        assertThat(Math.abs(r.f0Hz() - s.truth().f0Hz())).isLessThan(1e-4 * s.truth().f0Hz() / s.truth().qLoaded());
        assertThat(r.coupling1()).isCloseTo(s.truth().coupling1(), org.assertj.core.api.Assertions.within(1e-3 * (1 + s.truth().coupling1())));
    }

    static Stream<Arguments> noisyCases() {
        return Stream.of(
                Arguments.of("weak transmission, 40 dB", ResonatorCircuit.transmission(10.4e9, 6000, 0.04, 0.04), Impairments.noise(40)),
                Arguments.of("weak transmission, 25 dB, delay", ResonatorCircuit.transmission(10.4e9, 6000, 0.04, 0.04), Impairments.noise(25).withDelay(5e-9)),
                Arguments.of("asymmetric transmission, 35 dB", ResonatorCircuit.transmission(3.6e9, 900, 0.6, 0.15), Impairments.noise(35).withDelay(2e-9)),
                Arguments.of("impaired transmission, 35 dB", ResonatorCircuit.transmission(3.6e9, 900, 0.1, 0.1),
                        new Impairments(35, 10e-9, 1e-3, 5e-4, 0.5, false)),
                Arguments.of("notch, 30 dB", ResonatorCircuit.notch(5e9, 20000, 0.8, 0.2), Impairments.noise(30).withDelay(30e-9)),
                Arguments.of("reflection, 30 dB", ResonatorCircuit.reflection(2.4e9, 3000, 2.0), Impairments.noise(30).withDelay(4e-9)),
                Arguments.of("magnitude-only transmission, 35 dB", ResonatorCircuit.transmission(10.4e9, 6000, 0.05, 0.05),
                        Impairments.noise(35).withMagnitudeOnly(true)));
    }

    /**
     * Honest uncertainty: over repeated noise realisations the stated 1-sigma uncertainty covers the
     * truth within 2 sigma in about 95 % of cases (Coakley et al., IEEE Trans. MTT 51(3), 862, 2003:
     * asymptotic least-squares covariance), and the scatter matches the stated sigma, so that the
     * estimator sits at the Cramer-Rao bound that the covariance expresses.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("noisyCases")
    void statedUncertaintyMatchesTheScatter(String name, ResonatorCircuit circuit, Impairments impairments) throws FitException {
        int runs = 120;
        SweepSimulator simulator = new SweepSimulator(42);
        SweepPlan plan = SweepPlan.around(circuit.f0Hz(), circuit.qLoaded(), 10, 401);
        int covered = 0;
        double sumSquaredError = 0;
        double sumVariance = 0;
        for (int i = 0; i < runs; i++) {
            SimulatedSweep s = simulator.simulate(circuit, plan, impairments);
            ResonanceResult r = ANALYZER.analyze(s.sweep());
            double error = r.qUnloaded() - s.truth().qUnloaded();
            if (Math.abs(error) <= 2 * r.qUnloadedUncertainty()) {
                covered++;
            }
            sumSquaredError += error * error;
            sumVariance += r.qUnloadedUncertainty() * r.qUnloadedUncertainty();
        }
        double coverage = covered / (double) runs;
        double rmsOverSigma = Math.sqrt(sumSquaredError / sumVariance);
        assertThat(coverage).as(name + " coverage").isBetween(0.85, 0.995);
        assertThat(rmsOverSigma).as(name + " RMS error over stated sigma").isBetween(0.6, 1.3);
    }

    @Test
    void weakTransmissionAtFortyDecibelsIsWellInsideOnePercent() throws FitException {
        ResonatorCircuit circuit = ResonatorCircuit.transmissionWithInsertionLoss(10.4e9, 6000, 25, 1.0);
        SweepSimulator simulator = new SweepSimulator(3);
        List<Double> errors = new ArrayList<>();
        for (int i = 0; i < 100; i++) {
            SimulatedSweep s = simulator.simulate(circuit, SweepPlan.around(circuit.f0Hz(), circuit.qLoaded(), 10, 1601),
                    Impairments.noise(40).withDelay(3e-9));
            errors.add(relativeError(ANALYZER.analyze(s.sweep()), s));
        }
        double[] sorted = errors.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        assertThat(sorted[50]).isLessThan(0.002);
        assertThat(sorted[95]).isLessThan(0.006);
    }

    private static double relativeError(ResonanceResult r, SimulatedSweep s) {
        return Math.abs(r.qUnloaded() / s.truth().qUnloaded() - 1);
    }

    @SuppressWarnings("unused")
    private static String describe(double[] v) {
        return Arrays.toString(v);
    }
}
