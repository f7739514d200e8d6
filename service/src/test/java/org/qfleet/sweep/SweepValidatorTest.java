package org.qfleet.sweep;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatCode;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.EnumMap;
import java.util.Map;
import org.assertj.core.api.AbstractThrowableAssert;
import org.junit.jupiter.api.Test;

class SweepValidatorTest {

    private static final SweepLimits LIMITS = new SweepLimits(3, 10);

    @Test
    void acceptsAGoodSweepWithOrWithoutTopology() {
        assertThatCode(() -> SweepValidator.validate(sweep(null, freq(1, 2, 3), SParameter.S11), LIMITS))
                .doesNotThrowAnyException();
        assertThatCode(() -> SweepValidator.validate(sweep(Topology.NOTCH, freq(1, 2, 3), SParameter.S21), LIMITS))
                .doesNotThrowAnyException();
    }

    @Test
    void checksTheNumberOfPoints() {
        assertError(sweep(null, freq(), SParameter.S21), SweepError.EMPTY_ARRAY);
        assertError(sweep(null, freq(1, 2), SParameter.S21), SweepError.TOO_FEW_POINTS)
                .hasMessage("2 points, fewer than the 3 needed");
        assertError(sweep(null, freq(1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11), SParameter.S21), SweepError.TOO_MANY_POINTS)
                .hasMessage("11 points, more than the limit of 10");
    }

    @Test
    void checksTracesAgainstFrequencies() {
        Map<SParameter, Trace> traces = new EnumMap<>(SParameter.class);
        traces.put(SParameter.S21, Trace.complex(new double[2], new double[2]));
        assertError(new Sweep("s", SweepInfo.NONE, null, freq(1, 2, 3), traces, 50), SweepError.LENGTH_MISMATCH)
                .hasMessage("S21 has 2 values but there are 3 frequencies");
        assertError(new Sweep("s", SweepInfo.NONE, null, freq(1, 2, 3), Map.of(), 50), SweepError.MISSING_FIELD);
    }

    @Test
    void checksTheFrequencyAxis() {
        assertError(sweep(null, freq(1, 2, 2, 4), SParameter.S21), SweepError.NOT_ASCENDING).hasMessageContaining("index 2");
        assertError(sweep(null, freq(1, 3, 2), SParameter.S21), SweepError.NOT_ASCENDING).hasMessageContaining("index 2");
        assertError(sweep(null, freq(-1, 2, 3), SParameter.S21), SweepError.NOT_ASCENDING).hasMessageContaining("positive");
        assertError(sweep(null, freq(1, Double.NaN, 3), SParameter.S21), SweepError.NON_FINITE).hasMessageContaining("index 1");
        assertError(sweep(null, freq(1, 2, Double.POSITIVE_INFINITY), SParameter.S21), SweepError.NON_FINITE);
    }

    @Test
    void checksTraceValuesAreFinite() {
        Sweep sweep = sweep(null, freq(1, 2, 3), SParameter.S11);
        sweep.trace(SParameter.S11).orElseThrow().im()[1] = Double.NaN;
        assertError(sweep, SweepError.NON_FINITE).hasMessageStartingWith("S11 at index 1");
    }

    @Test
    void checksTheTopologyAgainstTheTraces() {
        Sweep onePort = sweep(null, freq(1, 2, 3), SParameter.S11);
        assertError(onePort.withTopology(Topology.TRANSMISSION), SweepError.TOPOLOGY_MISMATCH)
                .hasMessage("topology transmission needs S21, but the sweep has only [S11]");
        assertError(onePort.withTopology(Topology.NOTCH), SweepError.TOPOLOGY_MISMATCH);
        assertThatCode(() -> SweepValidator.validateTopology(onePort.withTopology(Topology.REFLECTION)))
                .doesNotThrowAnyException();
        Sweep transmission = sweep(Topology.REFLECTION, freq(1, 2, 3), SParameter.S21, SParameter.S22);
        assertError(transmission, SweepError.TOPOLOGY_MISMATCH).hasMessageContaining("needs S11");
        assertThatThrownBy(() -> SweepValidator.validateTopology(onePort))
                .isInstanceOfSatisfying(InvalidSweepException.class,
                        e -> assertThat(e.error()).isEqualTo(SweepError.TOPOLOGY_MISMATCH));
    }

    @Test
    void choosesADefaultTopologyFromTheTraces() {
        assertThat(SweepFiles.defaultTopology(sweep(null, freq(1, 2, 3), SParameter.S11))).isEqualTo(Topology.REFLECTION);
        assertThat(SweepFiles.defaultTopology(sweep(null, freq(1, 2, 3), SParameter.S11, SParameter.S21,
                SParameter.S12, SParameter.S22))).isEqualTo(Topology.TRANSMISSION);
        assertThat(SweepFiles.defaultTopology(sweep(null, freq(1, 2, 3), SParameter.S21))).isEqualTo(Topology.TRANSMISSION);
    }

    private static double[] freq(double... values) {
        return values;
    }

    private static Sweep sweep(Topology topology, double[] frequencies, SParameter... parameters) {
        Map<SParameter, Trace> traces = new EnumMap<>(SParameter.class);
        for (SParameter p : parameters) {
            traces.put(p, Trace.complex(new double[frequencies.length], new double[frequencies.length]));
        }
        return new Sweep("test", SweepInfo.NONE, topology, frequencies, traces, 50.0);
    }

    private static AbstractThrowableAssert<?, ? extends Throwable> assertError(Sweep sweep, SweepError expected) {
        return assertThatThrownBy(() -> SweepValidator.validate(sweep, LIMITS))
                .isInstanceOfSatisfying(InvalidSweepException.class, e -> assertThat(e.error()).isEqualTo(expected));
    }
}
