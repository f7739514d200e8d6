package org.qfleet.fit;

import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Arrays;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.qfleet.sweep.SParameter;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepInfo;
import org.qfleet.sweep.Topology;
import org.qfleet.sweep.Trace;

/** Sweeps without a resonance give a clear FitException, never a number out of thin air. */
class DegenerateSweepTest {

    private static Sweep sweep(Topology topology, double[] re, double[] im) {
        double[] f = new double[re.length];
        for (int i = 0; i < f.length; i++) {
            f[i] = 1e9 + 1e5 * i;
        }
        SParameter p = topology == Topology.REFLECTION ? SParameter.S11 : SParameter.S21;
        return new Sweep("degenerate", SweepInfo.NONE, topology, f, Map.of(p, Trace.complex(re, im)), 50);
    }

    @Test
    void flatTracesHaveNoResonance() {
        double[] flat = new double[101];
        Arrays.fill(flat, 0.1);
        for (Topology t : Topology.values()) {
            assertThatThrownBy(() -> new ResonanceAnalyzer().analyze(sweep(t, flat, new double[101])))
                    .isInstanceOf(FitException.class);
        }
    }

    @Test
    void zeroTraceHasNoResonance() {
        assertThatThrownBy(() -> new ResonanceAnalyzer().analyze(sweep(Topology.TRANSMISSION, new double[101], new double[101])))
                .isInstanceOf(FitException.class);
    }

    @Test
    void pureNoiseNeverPassesUnflagged() {
        Random random = new Random(3);
        for (int k = 0; k < 20; k++) {
            double[] re = new double[201];
            double[] im = new double[201];
            for (int i = 0; i < re.length; i++) {
                re[i] = 1e-3 * random.nextGaussian();
                im[i] = 1e-3 * random.nextGaussian();
            }
            try {
                ResonanceResult r = new ResonanceAnalyzer().analyze(sweep(Topology.TRANSMISSION, re, im));
                org.assertj.core.api.Assertions.assertThat(r.flags()).isNotEmpty();
            } catch (FitException expected) {
                // equally acceptable: no resonance found
            }
        }
    }
}
