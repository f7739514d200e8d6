package org.qfleet.fit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Map;
import org.junit.jupiter.api.Test;
import org.qfleet.sim.Impairments;
import org.qfleet.sim.ResonatorCircuit;
import org.qfleet.sim.SimulatedSweep;
import org.qfleet.sim.SweepPlan;
import org.qfleet.sim.SweepSimulator;
import org.qfleet.sweep.SParameter;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepInfo;
import org.qfleet.sweep.Topology;
import org.qfleet.sweep.Trace;

/** Each flag on the sweep that deserves it, and none on a well-designed sweep. */
class QualityFlagsTest {

    private static final ResonatorCircuit WEAK = ResonatorCircuit.transmission(10.4e9, 6000, 0.05, 0.05);
    private static final double BANDWIDTH = WEAK.f0Hz() / WEAK.qLoaded();
    private final ResonanceAnalyzer analyzer = new ResonanceAnalyzer();

    private static Sweep s21Only(SimulatedSweep s) {
        return new Sweep("test", SweepInfo.NONE, Topology.TRANSMISSION, s.sweep().frequencyHz(),
                Map.of(SParameter.S21, s.sweep().trace(SParameter.S21).orElseThrow()), 50);
    }

    private ResonanceResult fit(SweepPlan plan, Impairments impairments) throws FitException {
        return analyzer.analyze(s21Only(new SweepSimulator(4).simulate(WEAK, plan, impairments)));
    }

    @Test
    void wellDesignedSweepHasNoFlags() throws FitException {
        // IEC 63185 as commonly quoted: step below a tenth of the width, noise 20 dB below the peak.
        ResonanceResult r = fit(SweepPlan.around(WEAK.f0Hz(), WEAK.qLoaded(), 10, 401), Impairments.noise(40));
        assertThat(r.flags()).isEmpty();
    }

    @Test
    void coarseStepFlagsFewPointsInBand() throws FitException {
        ResonanceResult r = fit(SweepPlan.around(WEAK.f0Hz(), WEAK.qLoaded(), 10, 61), Impairments.noise(40));
        assertThat(r.flags()).contains(QualityFlag.FEW_POINTS_IN_BAND);
    }

    @Test
    void narrowSpanIsFlagged() throws FitException {
        ResonanceResult r = fit(SweepPlan.around(WEAK.f0Hz(), WEAK.qLoaded(), 2.5, 401), Impairments.noise(40));
        assertThat(r.flags()).contains(QualityFlag.SPAN_NARROW);
    }

    @Test
    void resonanceNearTheEndIsFlagged() throws FitException {
        SweepPlan plan = new SweepPlan(WEAK.f0Hz() - 9 * BANDWIDTH, WEAK.f0Hz() + 0.6 * BANDWIDTH, 401);
        ResonanceResult r = fit(plan, Impairments.noise(40));
        assertThat(r.flags()).contains(QualityFlag.RESONANCE_AT_EDGE);
    }

    @Test
    void noisySweepIsFlaggedLowSnr() throws FitException {
        ResonanceResult r = fit(SweepPlan.around(WEAK.f0Hz(), WEAK.qLoaded(), 10, 401), Impairments.noise(15));
        assertThat(r.flags()).contains(QualityFlag.LOW_SNR);
    }

    @Test
    void strongSymmetricCouplingIsFlagged() throws FitException {
        ResonatorCircuit strong = ResonatorCircuit.transmission(10.4e9, 6000, 2, 2);
        SimulatedSweep s = new SweepSimulator(4).simulate(strong,
                SweepPlan.around(strong.f0Hz(), strong.qLoaded(), 10, 401), Impairments.noise(40));
        assertThat(analyzer.analyze(s21Only(s)).flags()).contains(QualityFlag.STRONG_COUPLING);
    }

    @Test
    void secondResonanceInTheSpanIsFlagged() throws FitException {
        SweepPlan plan = SweepPlan.around(WEAK.f0Hz(), WEAK.qLoaded(), 14, 701);
        SimulatedSweep main = new SweepSimulator(4).simulate(WEAK, plan, Impairments.noise(40));
        ResonatorCircuit spurious = ResonatorCircuit.transmission(WEAK.f0Hz() + 4.5 * BANDWIDTH, 6000, 0.02, 0.02);
        SimulatedSweep second = new SweepSimulator(5).simulate(spurious, plan, Impairments.NONE);
        Trace a = main.sweep().trace(SParameter.S21).orElseThrow();
        Trace b = second.sweep().trace(SParameter.S21).orElseThrow();
        double[] re = new double[a.size()];
        double[] im = new double[a.size()];
        for (int i = 0; i < re.length; i++) {
            re[i] = a.re()[i] + b.re()[i];
            im[i] = a.im()[i] + b.im()[i];
        }
        Sweep both = new Sweep("two", SweepInfo.NONE, Topology.TRANSMISSION, plan.frequencies(),
                Map.of(SParameter.S21, Trace.complex(re, im)), 50);
        ResonanceResult r = analyzer.analyze(both);
        assertThat(r.flags()).contains(QualityFlag.MULTIPLE_RESONANCES);
        assertThat(r.f0Hz()).isCloseTo(WEAK.f0Hz(), org.assertj.core.api.Assertions.within(0.5 * BANDWIDTH));
    }

    @Test
    void dataThatDoNotFollowTheModelAreFlaggedPoorFit() throws FitException {
        SweepPlan plan = SweepPlan.around(WEAK.f0Hz(), WEAK.qLoaded(), 10, 401);
        SimulatedSweep s = new SweepSimulator(4).simulate(WEAK, plan, Impairments.noise(45));
        Trace t = s.sweep().trace(SParameter.S21).orElseThrow();
        double[] re = t.re().clone();
        double[] im = t.im().clone();
        // A standing-wave ripple of a mismatched fixture, 8 % of the peak, three periods across the span.
        double peak = s.truth().circleDiameter();
        for (int i = 0; i < re.length; i++) {
            double ripple = 0.08 * peak * Math.sin(2 * Math.PI * 3 * i / (re.length - 1.0));
            re[i] += ripple;
        }
        Sweep rippled = new Sweep("ripple", SweepInfo.NONE, Topology.TRANSMISSION, s.sweep().frequencyHz(),
                Map.of(SParameter.S21, Trace.complex(re, im)), 50);
        assertThat(analyzer.analyze(rippled).flags()).contains(QualityFlag.POOR_FIT);
    }
}
