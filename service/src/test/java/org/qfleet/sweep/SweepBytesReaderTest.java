package org.qfleet.sweep;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.util.EnumMap;
import java.util.Map;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.qfleet.codec.SweepMessageWriter;
import org.qfleet.codec.TraceForm;

/**
 * The byte-level fast path against the streaming parser on plain messages: both must give the same
 * sweep, every double bit for bit (or the same error when the sweep itself is refused), and the fast
 * path must have read these messages itself rather than leaving them to the parser.
 */
class SweepBytesReaderTest {

    private static final int MAX_POINTS = SweepLimits.DEFAULT.maxPoints();

    private final SweepJsonReader reader = new SweepJsonReader(SweepLimits.DEFAULT);

    @Test
    void readsGeneratedMessagesExactlyAsTheParser() {
        RandomSweepMessages messages = new RandomSweepMessages(20_240_611);
        int sweeps = 0;
        for (int i = 0; i < 2000; i++) {
            byte[] json = messages.next();
            assertThat(SweepBytesReader.read(json, MAX_POINTS)).as("message %d", i).isNotNull();
            sweeps += SameOutcome.check(reader, json) != null ? 1 : 0;
        }
        assertThat(sweeps).as("messages that make a sweep").isGreaterThan(1000);
    }

    @ParameterizedTest
    @EnumSource(TraceForm.class)
    void readsWhatTheMessageWriterWritesExactlyAsTheParser(TraceForm form) {
        SplittableRandom random = new SplittableRandom(form.ordinal());
        SweepMessageWriter writer = new SweepMessageWriter(form);
        for (int i = 0; i < 100; i++) {
            Sweep written = randomSweep(random, i);
            byte[] json = writer.write(written);
            assertThat(SweepBytesReader.read(json, MAX_POINTS)).as("message %d", i).isNotNull();
            Sweep read = SameOutcome.check(reader, json);
            assertThat(read).isNotNull();
            if (form == TraceForm.RE_IM) { // the writer's numbers round-trip (its contract)
                SameOutcome.assertSameSweep(read, written, "message " + i);
            }
        }
    }

    @Test
    void readsTheSameSweepWhateverTheOrderOfTheFields() throws InvalidSweepException {
        byte[] inOrder = SweepMessage.valid().with("temperatureC", "-0.0").with("fixtureId", "\"fx-1\"").bytes();
        byte[] reversed = ("{\"fixtureId\":\"fx-1\",\"s21\":{\"im\":" + SweepMessage.array(SweepMessage.IM)
                + ",\"re\":" + SweepMessage.array(SweepMessage.RE) + "},\"temperatureC\":-0.0,\"frequencyHz\":"
                + SweepMessage.array(SweepMessage.FREQUENCIES) + ",\"topology\":\"transmission\","
                + "\"measuredAt\":\"2024-05-17T09:30:00.125+02:00\",\"unit\":\"U-000042\",\"lot\":\"L-2207\","
                + "\"product\":\"cavity-10g4\",\"stationId\":\"st-3\",\"sweepId\":\"sw-0001\"}").getBytes(StandardCharsets.UTF_8);

        assertThat(SweepBytesReader.read(reversed, MAX_POINTS)).isNotNull();
        SameOutcome.assertSameSweep(reader.read("m", reversed), reader.readWithParser("m", inOrder), "reversed");
        assertThat(Double.doubleToRawLongBits(reader.read("m", reversed).info().temperatureC()))
                .isEqualTo(Double.doubleToRawLongBits(-0.0));
    }

    /** A sweep the writer can write in every form: nonzero, finite magnitudes. */
    private static Sweep randomSweep(SplittableRandom random, int i) {
        int points = random.nextInt(7, 60);
        double[] f = new double[points];
        f[0] = random.nextDouble(1e6, 1e11);
        for (int k = 1; k < points; k++) {
            f[k] = f[k - 1] + random.nextDouble(1, 1e6);
        }
        Topology topology = Topology.values()[random.nextInt(3)];
        Map<SParameter, Trace> traces = new EnumMap<>(SParameter.class);
        for (SParameter p : new SParameter[] {SParameter.S11, SParameter.S21, SParameter.S22}) {
            if (p == SweepValidator.requiredParameter(topology) || random.nextBoolean()) {
                traces.put(p, randomTrace(random, points));
            }
        }
        SweepInfo info = new SweepInfo("sw-" + i, "st-" + random.nextInt(9), "cav-x104", "L-" + i, "U-" + i,
                "2024-05-17T09:30:00Z", random.nextBoolean() ? "fx-01" : null,
                random.nextBoolean() ? random.nextDouble(-40, 80) : null);
        return new Sweep("m", info, topology, f, traces, 50.0);
    }

    private static Trace randomTrace(SplittableRandom random, int points) {
        double[] re = new double[points];
        double[] im = new double[points];
        for (int k = 0; k < points; k++) {
            re[k] = component(random);
            double other = component(random);
            im[k] = other == 0 ? 0.5 : other;
        }
        return Trace.complex(re, im);
    }

    /** Long mantissas, exponents from -300 to 300, subnormals and signed zeros. */
    private static double component(SplittableRandom random) {
        double sign = random.nextBoolean() ? 1 : -1;
        return switch (random.nextInt(5)) {
            case 0 -> random.nextDouble(-1, 1);
            case 1 -> sign * random.nextDouble(1, 10) * Math.pow(10, random.nextInt(-300, 300));
            case 2 -> sign * Double.longBitsToDouble(random.nextLong(1, 1L << 52));
            case 3 -> sign * 0.0;
            default -> sign * random.nextDouble() * 1e-5;
        };
    }
}
