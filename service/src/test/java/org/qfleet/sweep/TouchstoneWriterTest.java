package org.qfleet.sweep;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.StringReader;
import java.util.EnumMap;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

class TouchstoneWriterTest {

    private final TouchstoneReader reader = new TouchstoneReader(new SweepLimits(1, 10_000));

    @Test
    void riInHertzRoundTripsExactly() throws Exception {
        Sweep original = randomSweep(new Random(1), 201, SParameter.S11, SParameter.S21, SParameter.S12, SParameter.S22);
        Sweep copy = roundTrip(original, FrequencyUnit.HZ, TouchstoneFormat.RI);

        assertThat(copy.frequencyHz()).containsExactly(original.frequencyHz());
        for (SParameter p : SParameter.values()) {
            assertThat(copy.trace(p).orElseThrow().re()).containsExactly(original.trace(p).orElseThrow().re());
            assertThat(copy.trace(p).orElseThrow().im()).containsExactly(original.trace(p).orElseThrow().im());
        }
        assertThat(copy.referenceOhms()).isEqualTo(original.referenceOhms());
    }

    @ParameterizedTest
    @EnumSource(TouchstoneFormat.class)
    void everyFormatAndUnitRoundTripsToRoundingError(TouchstoneFormat format) throws Exception {
        Random random = new Random(format.ordinal());
        for (FrequencyUnit unit : FrequencyUnit.values()) {
            Sweep original = randomSweep(random, 101, SParameter.S11, SParameter.S21, SParameter.S12, SParameter.S22);
            Sweep copy = roundTrip(original, unit, format);
            for (int i = 0; i < original.size(); i++) {
                assertThat(copy.frequencyHz()[i]).isCloseTo(original.frequencyHz()[i], within(original.frequencyHz()[i] * 1e-15));
            }
            for (SParameter p : SParameter.values()) {
                assertClose(copy.trace(p).orElseThrow(), original.trace(p).orElseThrow(), 1e-14);
            }
        }
    }

    @Test
    void writesAOnePortFileWhenS11IsTheOnlyTrace() throws Exception {
        Sweep original = randomSweep(new Random(3), 11, SParameter.S11);
        TouchstoneWriter writer = new TouchstoneWriter(FrequencyUnit.GHZ, TouchstoneFormat.MA);

        assertThat(TouchstoneWriter.extension(original)).isEqualTo(".s1p");
        String text = writer.toText(original);
        assertThat(text).contains("# GHz S MA R 50.0\n").startsWith("! 1-port");
        Sweep copy = reader.read("copy.s1p", new StringReader(text), 1);
        assertThat(copy.traces()).containsOnlyKeys(SParameter.S11);
        assertClose(copy.trace(SParameter.S11).orElseThrow(), original.trace(SParameter.S11).orElseThrow(), 1e-14);
    }

    @Test
    void writesAbsentParametersOfATwoPortFileAsZero() throws Exception {
        Sweep original = randomSweep(new Random(4), 11, SParameter.S21);
        assertThat(TouchstoneWriter.extension(original)).isEqualTo(".s2p");
        assertThat(new TouchstoneWriter(FrequencyUnit.MHZ, TouchstoneFormat.RI).toText(original))
                .as("the opening comment counts ports, not parameters").startsWith("! 2-port");

        Sweep ri = roundTrip(original, FrequencyUnit.MHZ, TouchstoneFormat.RI);
        assertThat(ri.trace(SParameter.S11).orElseThrow().re()).containsOnly(0.0);
        assertThat(ri.trace(SParameter.S22).orElseThrow().im()).containsOnly(0.0);
        assertClose(ri.trace(SParameter.S21).orElseThrow(), original.trace(SParameter.S21).orElseThrow(), 1e-15);

        Sweep db = roundTrip(original, FrequencyUnit.MHZ, TouchstoneFormat.DB);
        for (int i = 0; i < original.size(); i++) {
            assertThat(db.trace(SParameter.S12).orElseThrow().magnitude(i)).isLessThan(1e-19);
        }
    }

    private Sweep roundTrip(Sweep sweep, FrequencyUnit unit, TouchstoneFormat format) throws InvalidSweepException {
        String text = new TouchstoneWriter(unit, format).toText(sweep);
        return reader.read("copy", new StringReader(text), TouchstoneWriter.ports(sweep));
    }

    private static void assertClose(Trace actual, Trace expected, double tolerance) {
        for (int i = 0; i < expected.size(); i++) {
            assertThat(actual.re()[i]).as("re[%d]", i).isCloseTo(expected.re()[i], within(tolerance));
            assertThat(actual.im()[i]).as("im[%d]", i).isCloseTo(expected.im()[i], within(tolerance));
        }
    }

    /** Invented data: ascending frequencies near 3.6 GHz and values inside the unit circle. */
    static Sweep randomSweep(Random random, int points, SParameter... parameters) {
        double[] frequencies = new double[points];
        double f = 3.5e9 + random.nextDouble() * 1e6;
        for (int i = 0; i < points; i++) {
            f += 1e3 + random.nextDouble() * 1e5;
            frequencies[i] = f;
        }
        Map<SParameter, Trace> traces = new EnumMap<>(SParameter.class);
        for (SParameter p : parameters) {
            double[] re = new double[points];
            double[] im = new double[points];
            for (int i = 0; i < points; i++) {
                re[i] = random.nextDouble() * 1.4 - 0.7;
                im[i] = random.nextDouble() * 1.4 - 0.7;
            }
            traces.put(p, Trace.complex(re, im));
        }
        return new Sweep("random", SweepInfo.NONE, null, frequencies, traces, 50.0);
    }
}
