package org.qfleet.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.EnumMap;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.qfleet.sim.Impairments;
import org.qfleet.sim.ResonatorCircuit;
import org.qfleet.sim.SweepPlan;
import org.qfleet.sim.SweepSimulator;
import org.qfleet.sweep.SParameter;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.Topology;
import org.qfleet.sweep.Trace;

/**
 * The reflection circles are started from the resonance S21 found; a reflection that shows another
 * resonance must still be fitted where it is, so that the mismatch is seen and reported.
 */
class PortCirclesTest {

    private static final double F0_HZ = 5.2e9;
    private static final double QU = 4000;
    private static final double COUPLING = 0.2;

    private final ResonatorCircuit s21Resonator = ResonatorCircuit.transmission(F0_HZ, QU, COUPLING, COUPLING);
    private final double widthHz = F0_HZ / s21Resonator.qLoaded();
    private final SweepPlan plan = SweepPlan.around(F0_HZ, s21Resonator.qLoaded(), 10, 401);

    private Sweep sweep(ResonatorCircuit circuit) {
        return new SweepSimulator(3).simulate(circuit, plan, Impairments.noise(40).withDelay(2e-9)).sweep();
    }

    /** S21 of the nominal resonator, S11 and S22 of one tuned {@code shiftWidths} bandwidths away. */
    private Sweep withReflectionsOf(double shiftWidths) {
        Sweep main = sweep(s21Resonator);
        Sweep other = sweep(ResonatorCircuit.transmission(F0_HZ + shiftWidths * widthHz, QU, COUPLING, COUPLING));
        Map<SParameter, Trace> traces = new EnumMap<>(SParameter.class);
        traces.put(SParameter.S21, main.trace(SParameter.S21).orElseThrow());
        traces.put(SParameter.S11, other.trace(SParameter.S11).orElseThrow());
        traces.put(SParameter.S22, other.trace(SParameter.S22).orElseThrow());
        return new Sweep(main.source(), main.info(), Topology.TRANSMISSION, main.frequencyHz(), traces, main.referenceOhms());
    }

    @Test
    void reflectionsOfTheSameResonanceGiveBothCouplings() throws FitException {
        ResonanceResult r = new ResonanceAnalyzer().analyze(withReflectionsOf(0));
        assertThat(r.route()).isEqualTo(CouplingRoute.TRANSMISSION_PORTS);
        assertThat(r.flags()).doesNotContain(QualityFlag.COUPLING_MISMATCH);
    }

    @Test
    void aReflectionStartedAtAnotherResonanceIsFittedWhereItIs() throws FitException {
        Sweep sweep = withReflectionsOf(2.5);
        ResonanceShape s21 = ResonanceShape.of((CircleModel) new ResonanceAnalyzer().analyze(sweep).model());
        TraceFit s11 = new ComplexCircleEstimator().fitNear(sweep.frequencyHz(), sweep.trace(SParameter.S11).orElseThrow(),
                Topology.REFLECTION, s21);
        assertThat(s11.shape().f0Hz()).isCloseTo(F0_HZ + 2.5 * widthHz, within(0.05 * widthHz));
    }

    @Test
    void reflectionsOfAnotherResonanceAreFlaggedAndNotUsed() throws FitException {
        ResonanceResult r = new ResonanceAnalyzer().analyze(withReflectionsOf(2.5));
        assertThat(r.route()).isEqualTo(CouplingRoute.TRANSMISSION_SYMMETRIC);
        assertThat(r.flags()).contains(QualityFlag.COUPLING_MISMATCH);
    }
}
