package org.qfleet.sweep;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.fail;

import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.Map;

/**
 * Reads one input with the public reader (the byte-level fast path first) and with the streaming
 * parser alone, and checks that both made the same of it: the same sweep, every double bit for bit,
 * or the same error code, message and sweepId.
 */
final class SameOutcome {

    private SameOutcome() {
    }

    /** The sweep both read, or null when both rejected the input in the same way. */
    static Sweep check(SweepJsonReader reader, byte[] json) {
        Object viaFastPath = outcome(() -> reader.read("m", json), json);
        Object viaParser = outcome(() -> reader.readWithParser("m", json), json);
        String input = shown(json);
        if (viaParser instanceof Sweep expected) {
            assertThat(viaFastPath).as("input %s", input).isInstanceOf(Sweep.class);
            assertSameSweep((Sweep) viaFastPath, expected, input);
            return expected;
        }
        InvalidSweepException expected = (InvalidSweepException) viaParser;
        assertThat(viaFastPath).as("input %s", input).isInstanceOf(InvalidSweepException.class);
        InvalidSweepException actual = (InvalidSweepException) viaFastPath;
        assertThat(actual.error()).as("error of %s", input).isEqualTo(expected.error());
        assertThat(actual.getMessage()).as("message of %s", input).isEqualTo(expected.getMessage());
        assertThat(actual.sweepId()).as("sweepId of %s", input).isEqualTo(expected.sweepId());
        return null;
    }

    static void assertSameSweep(Sweep actual, Sweep expected, String input) {
        assertThat(actual.source()).isEqualTo(expected.source());
        assertThat(actual.info()).as("info of %s", input).isEqualTo(expected.info());
        if (expected.info().temperatureC() != null) {
            assertThat(Double.doubleToRawLongBits(actual.info().temperatureC())).as("temperatureC of %s", input)
                    .isEqualTo(Double.doubleToRawLongBits(expected.info().temperatureC()));
        }
        assertThat(actual.topology()).isEqualTo(expected.topology());
        assertThat(actual.referenceOhms()).isEqualTo(expected.referenceOhms());
        assertSameBits(actual.frequencyHz(), expected.frequencyHz(), "frequencyHz of " + input);
        assertThat(actual.traces().keySet()).as("traces of %s", input).isEqualTo(expected.traces().keySet());
        for (Map.Entry<SParameter, Trace> entry : expected.traces().entrySet()) {
            Trace trace = actual.traces().get(entry.getKey());
            assertThat(trace.phaseKnown()).isEqualTo(entry.getValue().phaseKnown());
            assertSameBits(trace.re(), entry.getValue().re(), entry.getKey() + " re of " + input);
            assertSameBits(trace.im(), entry.getValue().im(), entry.getKey() + " im of " + input);
        }
    }

    private static void assertSameBits(double[] actual, double[] expected, String what) {
        if (!Arrays.equals(rawBits(actual), rawBits(expected))) {
            fail(what + ": " + Arrays.toString(actual) + " instead of " + Arrays.toString(expected));
        }
    }

    private static long[] rawBits(double[] values) {
        return Arrays.stream(values).mapToLong(Double::doubleToRawLongBits).toArray();
    }

    private static Object outcome(Read read, byte[] json) {
        try {
            return read.sweep();
        } catch (InvalidSweepException e) {
            return e;
        } catch (RuntimeException e) {
            return fail("escaped on input " + shown(json), e);
        }
    }

    private static String shown(byte[] json) {
        String text = new String(json, StandardCharsets.ISO_8859_1);
        return text.length() <= 300 ? text : text.substring(0, 300) + "... (" + json.length + " bytes)";
    }

    @FunctionalInterface
    private interface Read {
        Sweep sweep() throws InvalidSweepException;
    }
}
