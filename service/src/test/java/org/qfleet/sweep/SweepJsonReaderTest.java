package org.qfleet.sweep;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.ByteArrayInputStream;
import java.io.InputStream;
import java.io.SequenceInputStream;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.assertj.core.api.AbstractThrowableAssert;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class SweepJsonReaderTest {

    private final SweepJsonReader reader = new SweepJsonReader(SweepLimits.DEFAULT);

    @Test
    void readsAValidMessage() throws Exception {
        Sweep sweep = reader.read("sweeps/0/17", SweepMessage.valid()
                .with("temperatureC", "23.5").with("fixtureId", "\"fx-7\"").bytes());

        assertThat(sweep.source()).isEqualTo("sweeps/0/17");
        assertThat(sweep.topology()).isEqualTo(Topology.TRANSMISSION);
        assertThat(sweep.frequencyHz()).containsExactly(SweepMessage.FREQUENCIES);
        assertThat(sweep.traces()).containsOnlyKeys(SParameter.S21);
        Trace s21 = sweep.trace(SParameter.S21).orElseThrow();
        assertThat(s21.re()).containsExactly(SweepMessage.RE);
        assertThat(s21.im()).containsExactly(SweepMessage.IM);
        assertThat(s21.phaseKnown()).isTrue();
        assertThat(sweep.referenceOhms()).isEqualTo(50.0);
        assertThat(sweep.info()).isEqualTo(new SweepInfo("sw-0001", "st-3", "cavity-10g4", "L-2207", "U-000042",
                "2024-05-17T09:30:00.125+02:00", "fx-7", 23.5));
    }

    @Test
    void readsOptionalTracesAndOtherTopologies() throws Exception {
        String trace = "{\"re\":" + SweepMessage.array(SweepMessage.RE) + ",\"im\":" + SweepMessage.array(SweepMessage.IM) + "}";
        Sweep sweep = reader.read("m", SweepMessage.valid().with("topology", "\"notch\"")
                .with("s11", trace).with("s12", trace).with("s22", trace).bytes());
        assertThat(sweep.topology()).isEqualTo(Topology.NOTCH);
        assertThat(sweep.traces()).containsOnlyKeys(SParameter.S11, SParameter.S21, SParameter.S12, SParameter.S22);

        Sweep reflection = reader.read("m", SweepMessage.valid().with("topology", "\"reflection\"")
                .without("s21").with("s11", trace).bytes());
        assertThat(reflection.topology()).isEqualTo(Topology.REFLECTION);
        assertThat(reflection.traces()).containsOnlyKeys(SParameter.S11);
    }

    @Test
    void numbersInEveryJsonSpellingAreReadExactlyAsDoubleParseDouble() throws Exception {
        // JSON number grammar (RFC 8259, section 6): integers, fractions, exponents with either case and sign,
        // more digits than a double holds, and random doubles as Java prints them; the reference is the JDK.
        String[] spelled = {"0", "-0", "7", "-12", "0.5", "-0.000125", "1e3", "1E-3", "2.5e+2", "-6.551601734243408E-4",
            "123456789012345678901234567890", "0.30000000000000004", "4.9e-324", "1.7976931348623157e308",
            "9007199254740993", "2.2250738585072011e-308", "1.00000000000000011102230246251565404236316680908203125"};
        java.util.SplittableRandom random = new java.util.SplittableRandom(5);
        List<String> all = new java.util.ArrayList<>(List.of(spelled));
        for (int i = 0; i < 500; i++) {
            all.add(Double.toString(Double.longBitsToDouble(random.nextLong() & 0x7FEF_FFFF_FFFF_FFFFL) * (random.nextBoolean() ? 1 : -1)));
            all.add(String.format(java.util.Locale.ROOT, "%.17g", random.nextDouble(-1, 1)));
        }
        String array = "[" + String.join(",", all) + "]";
        String freq = "[" + java.util.stream.IntStream.range(0, all.size()).mapToObj(i -> Integer.toString(1_000_000 + i))
                .collect(java.util.stream.Collectors.joining(",")) + "]";
        Sweep sweep = reader.read("m", SweepMessage.valid().with("frequencyHz", freq)
                .with("s21", "{\"re\":" + array + ",\"im\":" + array + "}").bytes());
        double[] re = sweep.trace(SParameter.S21).orElseThrow().re();
        for (int i = 0; i < all.size(); i++) {
            assertThat(Double.doubleToRawLongBits(re[i])).as(all.get(i)).isEqualTo(Double.doubleToRawLongBits(Double.parseDouble(all.get(i))));
        }
    }

    @Test
    void ignoresUnknownFieldsOfAnyShape() throws Exception {
        Sweep sweep = reader.read("m", SweepMessage.valid()
                .with("operator", "\"kim\"")
                .with("calibration", "{\"kit\":\"85052D\",\"steps\":[1,2,{\"a\":[[]]}],\"due\":null}")
                .with("notes", "[\"a\", 1, true, null]").bytes());
        assertThat(sweep.size()).isEqualTo(7);
    }

    @Test
    void readsFromStreamsAndReadersToo() throws Exception {
        String json = SweepMessage.valid().json();
        Sweep fromStream = reader.read("m", new ByteArrayInputStream(json.getBytes(StandardCharsets.UTF_8)));
        Sweep fromReader = reader.read("m", new StringReader(json));
        assertThat(fromStream.frequencyHz()).containsExactly(SweepMessage.FREQUENCIES);
        assertThat(fromReader.trace(SParameter.S21).orElseThrow().im()).containsExactly(SweepMessage.IM);
    }

    /**
     * The same complex values in the four trace forms. Expected values are exact geometry:
     * m∠60° = (m/2, m·√3/2), m∠90° = (0, m), m∠180° = (-m, 0), m∠-45° = (m/√2, -m/√2), and so on.
     */
    @Test
    void allFourTraceFormsGiveTheSameValues() throws Exception {
        double[] mag = {0.5, 0.1, 1.0, 0.25, 0.2, 0.8, 0.3};
        double[] deg = {60, 90, 180, -45, 0, 30, -120};
        double r3 = Math.sqrt(3);
        double r2 = Math.sqrt(2);
        double[] re = {0.25, 0.0, -1.0, 0.25 / r2, 0.2, 0.4 * r3, -0.15};
        double[] im = {0.25 * r3, 0.1, 0.0, -0.25 / r2, 0.0, 0.4, -0.15 * r3};
        double[] db = new double[mag.length];
        for (int i = 0; i < mag.length; i++) {
            db[i] = 20 * Math.log10(mag[i]); // dB of a linear magnitude, by definition
        }
        assertThat(db[1]).isEqualTo(-20.0);

        Trace fromReIm = s21("{\"re\":" + SweepMessage.array(re) + ",\"im\":" + SweepMessage.array(im) + "}");
        Trace fromMagDeg = s21("{\"mag\":" + SweepMessage.array(mag) + ",\"deg\":" + SweepMessage.array(deg) + "}");
        Trace fromDbDeg = s21("{\"deg\":" + SweepMessage.array(deg) + ",\"db\":" + SweepMessage.array(db) + "}");
        Trace fromDb = s21("{\"db\":" + SweepMessage.array(db) + "}");

        for (Trace trace : new Trace[] {fromReIm, fromMagDeg, fromDbDeg}) {
            assertThat(trace.phaseKnown()).isTrue();
            for (int i = 0; i < mag.length; i++) {
                assertThat(trace.re()[i]).as("re[%d]", i).isCloseTo(re[i], within(1e-15));
                assertThat(trace.im()[i]).as("im[%d]", i).isCloseTo(im[i], within(1e-15));
            }
        }
        assertThat(fromDb.phaseKnown()).isFalse();
        for (int i = 0; i < mag.length; i++) {
            assertThat(fromDb.magnitude(i)).isCloseTo(mag[i], within(1e-15));
            assertThat(fromDb.im()[i]).isZero();
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {
        "{", "", "   ", "not json", "{\"sweepId\":\"a\",}", "{'sweepId':'a'}",
        "{\"sweepId\": NaN}", "{\"frequencyHz\":[1, NaN]}", "{\"frequencyHz\":[Infinity]}",
        "{\"frequencyHz\":[-Infinity]}", "{\"frequencyHz\":[1,2", "{\"frequencyHz\":[01]}"})
    void rejectsInvalidJson(String json) {
        assertError(json, SweepError.INVALID_JSON).hasMessageStartingWith("invalid JSON");
    }

    @Test
    void rejectsContentAfterTheObject() {
        String json = SweepMessage.valid().json();
        assertError(json + " x", SweepError.INVALID_JSON);
        assertError(json + json, SweepError.INVALID_JSON).hasMessageContaining("after the end");
        assertError(json + " {}", SweepError.INVALID_JSON);
        assertThat(read(json + " \n\t ")).isNotNull();
    }

    @Test
    void rejectsDuplicateFields() {
        assertError(SweepMessage.valid().with("x", "1").json().replace("\"x\":1", "\"lot\":\"L-2\""),
                SweepError.INVALID_JSON).hasMessageContaining("duplicate field lot");
        assertError(SweepMessage.valid().with("s21", "{\"db\":[1,2,3,4,5,6,7],\"db\":[1,2,3,4,5,6,7]}").json(),
                SweepError.INVALID_JSON).hasMessageContaining("duplicate field s21.db");
        assertError(SweepMessage.valid().with("x", "1").with("y", "2").json().replace("\"y\"", "\"x\""),
                SweepError.INVALID_JSON).hasMessageContaining("duplicate field x");
    }

    @ParameterizedTest
    @ValueSource(strings = {"sweepId", "stationId", "product", "lot", "unit", "measuredAt", "topology", "frequencyHz"})
    void rejectsAMissingRequiredField(String field) {
        assertError(SweepMessage.valid().without(field).json(), SweepError.MISSING_FIELD)
                .hasMessage("missing field " + field);
    }

    @Test
    void namesEveryMissingFieldAndTheTraceTheTopologyNeeds() {
        assertError(SweepMessage.valid().without("lot").without("unit").json(), SweepError.MISSING_FIELD)
                .hasMessage("missing fields lot, unit");
        assertError(SweepMessage.valid().without("s21").json(), SweepError.MISSING_FIELD)
                .hasMessageContaining("s21").hasMessageContaining("transmission");
        assertError(SweepMessage.valid().with("topology", "\"reflection\"").json(), SweepError.MISSING_FIELD)
                .hasMessageContaining("s11");
        assertError(SweepMessage.valid().with("lot", "\"  \"").json(), SweepError.MISSING_FIELD)
                .hasMessageContaining("lot is empty");
    }

    @Test
    void rejectsWrongTypes() {
        assertError(SweepMessage.valid().with("frequencyHz", "\"1e9,2e9\"").json(), SweepError.WRONG_TYPE)
                .hasMessage("field frequencyHz must be an array of numbers, found a string");
        assertError(SweepMessage.valid().with("frequencyHz", "null").json(), SweepError.WRONG_TYPE)
                .hasMessageContaining("found null");
        assertError(SweepMessage.valid().with("frequencyHz", "[1e9, \"2e9\"]").json(), SweepError.WRONG_TYPE)
                .hasMessageContaining("frequencyHz[1] must be a number");
        assertError(SweepMessage.valid().with("sweepId", "17").json(), SweepError.WRONG_TYPE)
                .hasMessageContaining("sweepId must be a string, found a number");
        assertError(SweepMessage.valid().with("lot", "null").json(), SweepError.WRONG_TYPE);
        assertError(SweepMessage.valid().with("s21", "[1,2]").json(), SweepError.WRONG_TYPE)
                .hasMessageContaining("s21 must be an object");
        assertError(SweepMessage.valid().with("s21", "{\"re\":{},\"im\":[]}").json(), SweepError.WRONG_TYPE)
                .hasMessageContaining("s21.re must be an array");
        assertError(SweepMessage.valid().with("temperatureC", "\"23 C\"").json(), SweepError.WRONG_TYPE);
        assertError(SweepMessage.valid().with("fixtureId", "7").json(), SweepError.WRONG_TYPE);
        assertError("[1, 2]", SweepError.WRONG_TYPE).hasMessageContaining("must be a JSON object");
    }

    @ParameterizedTest
    @ValueSource(strings = {"2024-05-17", "2024-05-17T09:30:00", "17/05/2024 09:30", "2024-13-01T00:00:00Z", "now"})
    void rejectsATimestampThatIsNotRfc3339(String timestamp) {
        assertError(SweepMessage.valid().with("measuredAt", "\"" + timestamp + "\"").json(), SweepError.WRONG_TYPE)
                .hasMessageContaining("measuredAt").hasMessageContaining("RFC 3339");
    }

    @Test
    void acceptsRfc3339TimestampsWithOffsets() {
        for (String timestamp : new String[] {"2024-05-17T09:30:00Z", "2024-05-17T09:30:00.5-07:00", "2024-05-17t09:30:00z"}) {
            assertThat(read(SweepMessage.valid().with("measuredAt", "\"" + timestamp + "\"").json()).info().measuredAt())
                    .isEqualTo(timestamp);
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"thru", "Transmission", "", "reflect"})
    void rejectsAnUnknownTopology(String topology) {
        assertError(SweepMessage.valid().with("topology", "\"" + topology + "\"").json(), SweepError.UNKNOWN_TOPOLOGY)
                .hasMessageContaining("'" + topology + "'");
    }

    @ParameterizedTest
    @ValueSource(strings = {
        "{\"mag\":[1,1,1,1,1,1,1]}",
        "{\"re\":[1,1,1,1,1,1,1]}",
        "{\"re\":[1,1,1,1,1,1,1],\"deg\":[1,1,1,1,1,1,1]}",
        "{\"db\":[1,1,1,1,1,1,1],\"mag\":[1,1,1,1,1,1,1]}",
        "{\"re\":[1,1,1,1,1,1,1],\"im\":[1,1,1,1,1,1,1],\"db\":[1,1,1,1,1,1,1]}",
        "{\"phase\":[1,1,1,1,1,1,1]}",
        "{}"})
    void rejectsAnUnknownTraceForm(String trace) {
        assertError(SweepMessage.valid().with("s21", trace).json(), SweepError.UNKNOWN_TRACE_FORM)
                .hasMessageContaining("s21");
    }

    @Test
    void rejectsEmptyArrays() {
        assertError(SweepMessage.valid().with("frequencyHz", "[]").json(), SweepError.EMPTY_ARRAY)
                .hasMessage("frequencyHz is empty");
        assertError(SweepMessage.valid().with("s21", "{\"db\":[]}").json(), SweepError.EMPTY_ARRAY)
                .hasMessage("s21.db is empty");
    }

    @Test
    void rejectsUnequalLengths() {
        assertError(SweepMessage.valid().with("s21", "{\"db\":[1,2,3,4,5,6]}").json(), SweepError.LENGTH_MISMATCH)
                .hasMessage("s21 has 6 values but frequencyHz has 7");
        assertError(SweepMessage.valid().with("s21", "{\"mag\":[1,2,3,4,5,6,7],\"deg\":[1,2,3,4,5,6]}").json(),
                SweepError.LENGTH_MISMATCH).hasMessage("s21.deg has 6 values but s21.mag has 7");
    }

    @Test
    void rejectsFrequenciesNotStrictlyAscendingAndSaysWhere() {
        assertError(SweepMessage.valid().with("frequencyHz", "[1,2,3,3,5,6,7]").json(), SweepError.NOT_ASCENDING)
                .hasMessageContaining("index 3");
        assertError(SweepMessage.valid().with("frequencyHz", "[1,2,3,4,5,7,6]").json(), SweepError.NOT_ASCENDING)
                .hasMessageContaining("index 6");
        assertError(SweepMessage.valid().with("frequencyHz", "[0,2,3,4,5,6,7]").json(), SweepError.NOT_ASCENDING)
                .hasMessageContaining("positive");
    }

    @Test
    void rejectsNonFiniteNumbersIncludingOverflow() {
        assertError(SweepMessage.valid().with("frequencyHz", "[1,2,3,1e999,5,6,7]").json(), SweepError.NON_FINITE)
                .hasMessageContaining("frequencyHz[3]");
        assertError(SweepMessage.valid().with("s21", "{\"re\":[1,1,1,1,1,1,1],\"im\":[0,0,-1e999,0,0,0,0]}").json(),
                SweepError.NON_FINITE).hasMessageContaining("s21.im[2]");
        assertError(SweepMessage.valid().with("temperatureC", "1E400").json(), SweepError.NON_FINITE);
        // 7000 dB is finite on the wire, but its linear magnitude 10^(7000/20) overflows to infinity
        assertError(SweepMessage.valid().with("s21", "{\"db\":[0,0,0,7000,0,0,0]}").json(), SweepError.NON_FINITE)
                .hasMessageContaining("S21 at index 3");
    }

    @Test
    void rejectsTooManyAndTooFewPoints() {
        SweepJsonReader small = new SweepJsonReader(new SweepLimits(3, 6));
        assertThatThrownBy(() -> small.read("m", SweepMessage.valid().bytes()))
                .isInstanceOfSatisfying(InvalidSweepException.class,
                        e -> assertThat(e.error()).isEqualTo(SweepError.TOO_MANY_POINTS))
                .hasMessage("frequencyHz has more than 6 values");
        assertError(SweepMessage.valid().with("frequencyHz", "[1,2,3]").with("s21", "{\"db\":[1,2,3]}").json(),
                SweepError.TOO_FEW_POINTS).hasMessageContaining("3 points");
    }

    /** An endless array must be refused after maxPoints values, having read only a bounded prefix. */
    @Test
    void stopsReadingAnEndlessArrayAtTheBound() {
        CountingEndlessArray endless = new CountingEndlessArray();
        InputStream in = new SequenceInputStream(new ByteArrayInputStream(
                "{\"sweepId\":\"big-1\",\"frequencyHz\":[".getBytes(StandardCharsets.US_ASCII)), endless);
        SweepJsonReader bounded = new SweepJsonReader(new SweepLimits(7, 1000));

        assertThatThrownBy(() -> bounded.read("m", in))
                .isInstanceOfSatisfying(InvalidSweepException.class, e -> {
                    assertThat(e.error()).isEqualTo(SweepError.TOO_MANY_POINTS);
                    assertThat(e.sweepId()).contains("big-1");
                });
        assertThat(endless.served).isLessThan(1_000_000);
    }

    @Test
    void rejectsPathologicalNestingAndNumbersWithoutFailing() {
        String deep = SweepMessage.valid().with("extra", "[".repeat(100_000)).json();
        assertError(deep, SweepError.INVALID_JSON);
        String longNumber = "1" + "0".repeat(5000);
        assertError(SweepMessage.valid().with("frequencyHz", "[" + longNumber + "]").json(), SweepError.INVALID_JSON)
                .hasMessageContaining("length").hasMessageNotContaining("StreamReadConstraints");
    }

    @Test
    void attachesTheSweepIdWhenItWasRead() {
        assertThatThrownBy(() -> reader.read("m", SweepMessage.valid().with("topology", "\"thru\"").bytes()))
                .isInstanceOfSatisfying(InvalidSweepException.class,
                        e -> assertThat(e.sweepId()).contains("sw-0001"));
        assertThatThrownBy(() -> reader.read("m", "{\"lot\":1}".getBytes(StandardCharsets.UTF_8)))
                .isInstanceOfSatisfying(InvalidSweepException.class, e -> assertThat(e.sweepId()).isEmpty());
    }

    private Sweep read(String json) {
        try {
            return reader.read("m", json.getBytes(StandardCharsets.UTF_8));
        } catch (InvalidSweepException e) {
            throw new AssertionError("unexpected rejection: " + e.getMessage(), e);
        }
    }

    private Trace s21(String trace) {
        return read(SweepMessage.valid().with("s21", trace).json()).trace(SParameter.S21).orElseThrow();
    }

    private AbstractThrowableAssert<?, ? extends Throwable> assertError(String json, SweepError expected) {
        return assertThatThrownBy(() -> reader.read("m", json.getBytes(StandardCharsets.UTF_8)))
                .isInstanceOfSatisfying(InvalidSweepException.class, e -> assertThat(e.error()).isEqualTo(expected));
    }

    /** Serves "1," forever, counting the bytes handed out. */
    private static final class CountingEndlessArray extends InputStream {
        long served;

        @Override
        public int read() {
            return (served++ & 1) == 0 ? '1' : ',';
        }

        @Override
        public int read(byte[] b, int off, int len) {
            for (int i = 0; i < len; i++) {
                b[off + i] = (byte) read();
            }
            return len;
        }
    }
}
