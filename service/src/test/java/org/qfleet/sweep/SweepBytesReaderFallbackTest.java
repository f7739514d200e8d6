package org.qfleet.sweep;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Inputs that are bad or outside the plain subset: the public reader (fast path first) must give
 * the same outcome as the streaming parser alone, the same sweep or the same error code, message and
 * sweepId. The inputs are every bad input of the other sweep message tests, inputs the fast path
 * must leave to the parser, every truncation of a message and messages with one byte changed.
 */
class SweepBytesReaderFallbackTest {

    private static final String TRACE = "{\"re\":" + SweepMessage.array(SweepMessage.RE) + ",\"im\":"
            + SweepMessage.array(SweepMessage.IM) + "}";

    private final SweepJsonReader reader = new SweepJsonReader(SweepLimits.DEFAULT);

    @ParameterizedTest
    @MethodSource("badMessages")
    void rejectsBadMessagesExactlyAsTheParser(String json) {
        assertThat(SameOutcome.check(reader, json.getBytes(StandardCharsets.UTF_8))).isNull();
    }

    /** Valid messages with something the fast path does not read itself: the parser reads them. */
    @ParameterizedTest
    @MethodSource("validOutsideTheSubset")
    void leavesMessagesOutsideTheSubsetToTheParser(String json) {
        byte[] bytes = json.getBytes(StandardCharsets.UTF_8);
        assertThat(SweepBytesReader.read(bytes, SweepLimits.DEFAULT.maxPoints())).isNull();
        assertThat(SameOutcome.check(reader, bytes)).isNotNull();
    }

    @ParameterizedTest
    @ValueSource(strings = {"UTF-16BE", "UTF-16LE", "UTF-32BE", "UTF-32LE"})
    void leavesOtherEncodingsAndByteOrderMarksToTheParser(String encoding) {
        String json = SweepMessage.valid().json();
        byte[] plain = json.getBytes(Charset.forName(encoding));
        byte[] marked = ("\uFEFF" + json).getBytes(Charset.forName(encoding));
        byte[] utf8Marked = ("\uFEFF" + json).getBytes(StandardCharsets.UTF_8);
        for (byte[] bytes : new byte[][] {plain, marked, utf8Marked}) {
            assertThat(SweepBytesReader.read(bytes, SweepLimits.DEFAULT.maxPoints())).isNull();
            SameOutcome.check(reader, bytes);
        }
    }

    @Test
    void refusesTooManyAndTooFewPointsExactlyAsTheParser() {
        SweepJsonReader small = new SweepJsonReader(new SweepLimits(3, 6));
        assertThat(SameOutcome.check(small, SweepMessage.valid().bytes())).isNull();
        assertThat(SameOutcome.check(small, SweepMessage.valid().with("frequencyHz", "[1,2,3,4,5,6]")
                .with("s21", "{\"db\":[1,2,3,4,5,6],\"deg\":[1,2,3,4,5,6,7]}").bytes())).isNull();
        assertThat(SameOutcome.check(small, SweepMessage.valid().with("frequencyHz", "[1,2]")
                .with("s21", "{\"db\":[1,2]}").bytes())).isNull();
        assertThat(SameOutcome.check(small, SweepMessage.valid().with("frequencyHz", "[1,2,3,4,5,6]")
                .with("s21", "{\"db\":[1,2,3,4,5,6]}").bytes())).isNotNull();
    }

    @Test
    void everyTruncationGivesTheParsersError() {
        byte[] message = SweepMessage.valid().with("temperatureC", "21").with("fixtureId", "\"fx\"")
                .with("s11", "{\"db\":[-1,-2,-3,-4,-5,-6,-7]}").with("x", "{\"a\":[true,\"\\n\"]}").bytes();
        for (int length = 0; length < message.length; length++) {
            assertThat(SameOutcome.check(reader, Arrays.copyOf(message, length))).isNull();
        }
    }

    @Test
    void everyChangedByteGivesTheParsersOutcome() {
        byte[] message = SweepMessage.valid().with("temperatureC", "-2.5e1").with("s22", "{\"db\":[1,2,3,4,5,6,7]}")
                .with("x", "[{\"b\":null},false]").bytes();
        byte[] replacements = "\u0000\t \"\\,:[]{}-+.0159eEaft\u007f".getBytes(StandardCharsets.ISO_8859_1);
        int sweeps = 0;
        for (int at = 0; at < message.length; at++) {
            for (byte replacement : replacements) {
                byte[] changed = message.clone();
                changed[at] = replacement;
                sweeps += SameOutcome.check(reader, changed) != null ? 1 : 0;
            }
            byte[] flipped = message.clone();
            flipped[at] ^= (byte) 0x80;
            SameOutcome.check(reader, flipped);
        }
        assertThat(sweeps).as("changes that still make a sweep").isPositive();
    }

    @Test
    void randomBytesGiveTheParsersError() {
        Random random = new Random(20_240_517L);
        for (int i = 0; i < 5000; i++) {
            byte[] bytes = new byte[random.nextInt(200)];
            random.nextBytes(bytes);
            if (i % 2 == 0 && bytes.length > 0) {
                bytes[0] = '{';
            }
            assertThat(SameOutcome.check(reader, bytes)).isNull();
        }
    }

    @Test
    void randomEditsGiveTheParsersOutcome() {
        Random random = new Random(7L);
        byte[] message = SweepMessage.valid().with("s22", "{\"mag\":[1,1,1,1,1,1,1],\"deg\":[0,1,2,3,4,5,6]}").bytes();
        byte[] alphabet = "{}[]\":,.-+0123456789eEnulltruefalsNaIfiy re im mag deg db s21 s11 \\u00\t\n\u00e9"
                .getBytes(StandardCharsets.UTF_8);
        for (int i = 0; i < 5_000; i++) {
            byte[] edited = message.clone();
            for (int e = random.nextInt(4); e >= 0; e--) {
                edited = edit(edited, random, alphabet);
            }
            SameOutcome.check(reader, edited);
        }
    }

    static Stream<String> badMessages() {
        List<String> bad = new ArrayList<>(List.of("{", "", "   ", "not json", "{\"sweepId\":\"a\",}", "{'sweepId':'a'}",
                "{\"sweepId\": NaN}", "{\"frequencyHz\":[1, NaN]}", "{\"frequencyHz\":[Infinity]}",
                "{\"frequencyHz\":[-Infinity]}", "{\"frequencyHz\":[1,2", "{\"frequencyHz\":[01]}", "[1, 2]",
                "{\"lot\":1}", "{}", "{\"sweepId\":\"x\"}", "\"text\"", "17", "null", "{\"sweepId\":\"a\"}}"));
        String json = SweepMessage.valid().json();
        bad.addAll(List.of(json + " x", json + json, json + " {}", json + "\u0000", json + "\f",
                "\f" + json, json.replace(",", ",\f"), json.replace("[", "[\u000b")));
        bad.addAll(List.of(
                SweepMessage.valid().with("x", "1").json().replace("\"x\":1", "\"lot\":\"L-2\""),
                SweepMessage.valid().with("s21", "{\"db\":[1,2,3,4,5,6,7],\"db\":[1,2,3,4,5,6,7]}").json(),
                SweepMessage.valid().with("x", "1").with("y", "2").json().replace("\"y\"", "\"x\""),
                SweepMessage.valid().without("lot").without("unit").json(),
                SweepMessage.valid().without("sweepId").json(),
                SweepMessage.valid().without("stationId").json(),
                SweepMessage.valid().without("product").json(),
                SweepMessage.valid().without("lot").json(),
                SweepMessage.valid().without("unit").json(),
                SweepMessage.valid().without("measuredAt").json(),
                SweepMessage.valid().without("topology").json(),
                SweepMessage.valid().without("frequencyHz").json(),
                SweepMessage.valid().without("s21").json(),
                SweepMessage.valid().with("topology", "\"reflection\"").json(),
                SweepMessage.valid().with("lot", "\"  \"").json(),
                SweepMessage.valid().with("sweepId", "\"\"").json(),
                SweepMessage.valid().with("frequencyHz", "\"1e9,2e9\"").json(),
                SweepMessage.valid().with("frequencyHz", "null").json(),
                SweepMessage.valid().with("frequencyHz", "[1e9, \"2e9\"]").json(),
                SweepMessage.valid().with("sweepId", "17").json(),
                SweepMessage.valid().with("lot", "null").json(),
                SweepMessage.valid().with("s21", "[1,2]").json(),
                SweepMessage.valid().with("s21", "{\"re\":{},\"im\":[]}").json(),
                SweepMessage.valid().with("temperatureC", "\"23 C\"").json(),
                SweepMessage.valid().with("temperatureC", "[23]").json(),
                SweepMessage.valid().with("fixtureId", "7").json(),
                SweepMessage.valid().with("topology", "\"thru\"").json(),
                SweepMessage.valid().with("topology", "\"Transmission\"").json(),
                SweepMessage.valid().with("topology", "\"\"").json(),
                SweepMessage.valid().with("topology", "\"reflect\"").json(),
                SweepMessage.valid().with("frequencyHz", "[]").json(),
                SweepMessage.valid().with("s21", "{\"db\":[]}").json(),
                SweepMessage.valid().with("s21", "{\"db\":[1,2,3,4,5,6]}").json(),
                SweepMessage.valid().with("s21", "{\"mag\":[1,2,3,4,5,6,7],\"deg\":[1,2,3,4,5,6]}").json(),
                SweepMessage.valid().with("frequencyHz", "[1,2,3,3,5,6,7]").json(),
                SweepMessage.valid().with("frequencyHz", "[1,2,3,4,5,7,6]").json(),
                SweepMessage.valid().with("frequencyHz", "[0,2,3,4,5,6,7]").json(),
                SweepMessage.valid().with("frequencyHz", "[-0.0,2,3,4,5,6,7]").json(),
                SweepMessage.valid().with("frequencyHz", "[1,2,3,1e999,5,6,7]").json(),
                SweepMessage.valid().with("s21", "{\"re\":[1,1,1,1,1,1,1],\"im\":[0,0,-1e999,0,0,0,0]}").json(),
                SweepMessage.valid().with("temperatureC", "1E400").json(),
                SweepMessage.valid().with("s21", "{\"db\":[0,0,0,7000,0,0,0]}").json(),
                SweepMessage.valid().with("frequencyHz", "[1,2,3]").with("s21", "{\"db\":[1,2,3]}").json(),
                SweepMessage.valid().with("extra", "[".repeat(100_000)).json(),
                SweepMessage.valid().with("frequencyHz", "[1" + "0".repeat(5000) + "]").json(),
                SweepMessage.valid().with("frequencyHz", "[1" + "0".repeat(999) + "]").json(),
                SweepMessage.valid().with("x", "1" + "0".repeat(1000)).json(),
                SweepMessage.valid().with("x" + "y".repeat(50_000), "1").json(),
                SweepMessage.valid().with("x", "tru").json(),
                SweepMessage.valid().with("x", "nulll").json(),
                SweepMessage.valid().with("x", "true1").json(),
                SweepMessage.valid().with("x", "\"\\x\"").json(),
                SweepMessage.valid().with("x", "\"\\u12G4\"").json(),
                SweepMessage.valid().with("x", "\"a\u0001b\"").json(),
                SweepMessage.valid().with("x", "[1,]").json(),
                SweepMessage.valid().with("x", "{\"a\" 1}").json(),
                SweepMessage.valid().with("x", "+1").json(),
                SweepMessage.valid().with("x", ".5").json(),
                SweepMessage.valid().with("x", "1.").json(),
                SweepMessage.valid().with("x", "-").json(),
                SweepMessage.valid().with("lot", "\"L\u0001\"").json(),
                SweepMessage.valid().with("s21", "{\"phase\":[1,1,1,1,1,1,1]}").json(),
                SweepMessage.valid().with("s21", "{\"mag\":[1,1,1,1,1,1,1]}").json(),
                SweepMessage.valid().with("s21", "{\"re\":[1,1,1,1,1,1,1],\"deg\":[1,1,1,1,1,1,1]}").json(),
                SweepMessage.valid().with("s21", "{\"db\":[1,1,1,1,1,1,1],\"mag\":[1,1,1,1,1,1,1]}").json(),
                SweepMessage.valid().with("s21", "{}").json(),
                SweepMessage.valid().with("s21", "{\"re\":[1,1,1,1,1,1,1]}").json(),
                SweepMessage.valid().with("s21", "{\"re\":[1,1,1,1,1,1,1],\"im\":[1,1,1,1,1,1,1],\"db\":[1,1,1,1,1,1,1]}").json(),
                SweepMessage.valid().with("measuredAt", "\"2024-05-17\"").json(),
                SweepMessage.valid().with("measuredAt", "\"2024-13-01T00:00:00Z\"").json(),
                SweepMessage.valid().with("measuredAt", "\"2024-05-17T09:30:00\"").json(),
                SweepMessage.valid().with("measuredAt", "\"17/05/2024 09:30\"").json(),
                SweepMessage.valid().with("measuredAt", "\"now\"").json()));
        return bad.stream();
    }

    static Stream<String> validOutsideTheSubset() {
        return Stream.of(
                SweepMessage.valid().with("lot", "\"L-\\u0032207\"").json(),
                SweepMessage.valid().with("fixtureId", "\"fixture \\\"7\\\"\"").json(),
                SweepMessage.valid().with("fixtureId", "\"Pr\u00fcfplatz 7\"").json(),
                SweepMessage.valid().with("fixtureId", "\"del \u007f\"").json(),
                SweepMessage.valid().json().replace("\"sweepId\"", "\"\\u0073weepId\""),
                SweepMessage.valid().json().replace("\"re\"", "\"r\\u0065\""),
                SweepMessage.valid().with("x", "\"Gr\u00fc\u00dfe\"").json(),
                SweepMessage.valid().with("x", "[".repeat(40) + "]".repeat(40)).json(),
                SweepMessage.valid().with("x", "\"" + "a".repeat(20_000) + "\"").json(),
                SweepMessage.valid().with("x", "1" + "0".repeat(200)).json(),
                SweepMessage.valid().with("frequencyHz", "[1000000000." + "0".repeat(120) + ",1.001e9,1.002e9,1.003e9,1.004e9,1.005e9,1.006e9]").json());
    }

    private static byte[] edit(byte[] bytes, Random random, byte[] alphabet) {
        int at = random.nextInt(bytes.length + 1);
        byte b = alphabet[random.nextInt(alphabet.length)];
        return switch (random.nextInt(4)) {
            case 0 -> {
                byte[] replaced = bytes.clone();
                if (at < bytes.length) {
                    replaced[at] = b;
                }
                yield replaced;
            }
            case 1 -> {
                byte[] longer = new byte[bytes.length + 1];
                System.arraycopy(bytes, 0, longer, 0, at);
                longer[at] = b;
                System.arraycopy(bytes, at, longer, at + 1, bytes.length - at);
                yield longer;
            }
            case 2 -> {
                if (at == bytes.length) {
                    yield bytes;
                }
                byte[] shorter = new byte[bytes.length - 1];
                System.arraycopy(bytes, 0, shorter, 0, at);
                System.arraycopy(bytes, at + 1, shorter, at, bytes.length - at - 1);
                yield shorter;
            }
            default -> Arrays.copyOf(bytes, at);
        };
    }
}
