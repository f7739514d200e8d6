package org.qfleet.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.qfleet.sim.Impairments;
import org.qfleet.sim.ResonatorCircuit;
import org.qfleet.sim.SimulatedSweep;
import org.qfleet.sim.SweepPlan;
import org.qfleet.sim.SweepSimulator;
import org.qfleet.sweep.Topology;
import org.qfleet.sweep.TopologyGuess;

class TopologyGuessTest {

    private static SimulatedSweep simulate(ResonatorCircuit c) {
        return new SweepSimulator(2).simulate(c, SweepPlan.around(c.f0Hz(), c.qLoaded(), 10, 401),
                Impairments.noise(30).withDelay(4e-9));
    }

    @Test
    void recognizesEachTopologyFromTheTraces() {
        assertThat(TopologyGuess.of(simulate(ResonatorCircuit.transmission(10.4e9, 6000, 0.05, 0.05)).sweep().withTopology(null)))
                .isEqualTo(Topology.TRANSMISSION);
        assertThat(TopologyGuess.of(simulate(ResonatorCircuit.transmission(3.6e9, 900, 2, 0.5)).sweep().withTopology(null)))
                .isEqualTo(Topology.TRANSMISSION);
        assertThat(TopologyGuess.of(simulate(ResonatorCircuit.notch(5e9, 20000, 0.3)).sweep().withTopology(null)))
                .isEqualTo(Topology.NOTCH);
        assertThat(TopologyGuess.of(simulate(ResonatorCircuit.reflection(2.4e9, 3000, 2)).sweep().withTopology(null)))
                .isEqualTo(Topology.REFLECTION);
    }

    @Test
    void aTransmissionPeakForcedToBeANotchIsRefused() {
        SimulatedSweep s = simulate(ResonatorCircuit.transmission(10.4e9, 6000, 0.05, 0.05));
        assertThatThrownBy(() -> new ResonanceAnalyzer().analyze(s.sweep().withTopology(Topology.NOTCH)))
                .isInstanceOf(FitException.class)
                .hasMessageContaining("transmission");
    }
}
