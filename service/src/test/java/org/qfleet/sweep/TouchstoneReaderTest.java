package org.qfleet.sweep;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import org.assertj.core.api.AbstractThrowableAssert;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class TouchstoneReaderTest {

    private static final SweepLimits ANY_SIZE = new SweepLimits(1, 1000);

    private final TouchstoneReader reader = new TouchstoneReader(ANY_SIZE);

    // --- the specification's examples (files under sweep/, recalled from memory, see their headers)

    /** Touchstone 1.1 one-port example: MA format in MHz, 0.894 at -12.136 degrees at 2 MHz. */
    @Test
    void readsTheVersion11OnePortExample() throws Exception {
        Sweep sweep = reader.read("ex1.s1p", resource("spec-v11-one-port-ma.s1p"), 1);

        assertThat(sweep.frequencyHz()).containsExactly(2.0e6);
        assertThat(sweep.traces()).containsOnlyKeys(SParameter.S11);
        assertPolar(sweep, SParameter.S11, 0, 0.894, -12.136);
        assertThat(sweep.referenceOhms()).isEqualTo(50.0);
        assertThat(sweep.topology()).isNull();
        assertThat(sweep.info()).isEqualTo(SweepInfo.NONE);
        assertThat(sweep.source()).isEqualTo("ex1.s1p");
    }

    @Test
    void rejectsTheVersion11ZParameterExample() {
        assertError(() -> reader.read("z.s1p", resource("spec-v11-one-port-z.s1p"), 1), SweepError.UNSUPPORTED_PARAMETER)
                .hasMessage("line 4: Z-parameters are not supported, only S-parameters");
    }

    /** Touchstone 1.1 two-port example in RI format; the 1.1 order is S11 S21 S12 S22. */
    @Test
    void readsTheVersion11TwoPortExample() throws Exception {
        Sweep sweep = reader.read("ex.s2p", resource("spec-v11-two-port-ri.s2p"), 2);

        assertThat(sweep.frequencyHz()).containsExactly(1.0e9, 2.0e9, 10.0e9);
        assertThat(sweep.traces()).containsOnlyKeys(SParameter.S11, SParameter.S21, SParameter.S12, SParameter.S22);
        Trace s21 = sweep.trace(SParameter.S21).orElseThrow();
        assertThat(s21.re()).containsExactly(-0.0003, -0.0096, -0.0134);
        assertThat(s21.im()).containsExactly(-0.0021, -0.0298, 0.0379);
        assertThat(sweep.trace(SParameter.S22).orElseThrow().re()).containsExactly(0.3926, 0.3517, 0.3419);
    }

    /**
     * Touchstone 1.1 two-port example with noise data and a bare "#" option line (all defaults:
     * GHz, S, MA, R 50). The noise block starts where the frequency stops increasing (4 after 22).
     */
    @Test
    void readsTheVersion11NoiseExampleAndIgnoresTheNoiseData() throws Exception {
        Sweep sweep = reader.read("noise.s2p", resource("spec-v11-two-port-noise.s2p"), 2);

        assertThat(sweep.frequencyHz()).containsExactly(2.0e9, 22.0e9);
        assertPolar(sweep, SParameter.S11, 0, 0.95, -26);
        assertPolar(sweep, SParameter.S21, 0, 3.57, 157);
        assertPolar(sweep, SParameter.S12, 0, 0.04, 76);
        assertPolar(sweep, SParameter.S22, 1, 0.56, -85);
        assertThat(sweep.referenceOhms()).isEqualTo(50.0);
    }

    /** Touchstone 2.0 two-port example: [Two-Port Data Order] 21_12 is the 1.1 order. */
    @Test
    void readsTheVersion20TwoPortExampleWithOrder21_12() throws Exception {
        Sweep sweep = reader.read("v2.s2p", resource("spec-v20-two-port-21-12.s2p"), 2);

        assertThat(sweep.frequencyHz()).containsExactly(2.0e9, 22.0e9);
        assertPolar(sweep, SParameter.S21, 0, 3.57, 157);
        assertPolar(sweep, SParameter.S12, 0, 0.04, 76);
        assertPolar(sweep, SParameter.S21, 1, 1.30, 40);
    }

    /** With 12_21 the second pair of a record is S12 and the third S21. */
    @Test
    void readsOrder12_21() throws Exception {
        String text = text("spec-v20-two-port-21-12.s2p").replace("21_12", "12_21");
        Sweep sweep = reader.read("v2.ts", new StringReader(text), 0);

        assertPolar(sweep, SParameter.S12, 0, 3.57, 157);
        assertPolar(sweep, SParameter.S21, 0, 0.04, 76);
    }

    /** A 2.0 one-port file in DB format: -20 dB at 90 degrees is 0.1j, 0 dB at 180 degrees is -1. */
    @Test
    void readsAVersion20OnePortFileInDb() throws Exception {
        Sweep sweep = reader.read("v2.s1p", resource("spec-v20-one-port.s1p"), 1);

        assertThat(sweep.frequencyHz()).containsExactly(100e6, 200e6, 300e6);
        Trace s11 = sweep.trace(SParameter.S11).orElseThrow();
        assertThat(s11.re()[0]).isCloseTo(0.0, within(1e-15));
        assertThat(s11.im()[0]).isCloseTo(0.1, within(1e-15));
        double magnitude = Math.pow(10, -6.0 / 20); // dB to linear, by definition
        assertThat(s11.re()[1]).isCloseTo(magnitude / Math.sqrt(2), within(1e-15));
        assertThat(s11.im()[1]).isCloseTo(-magnitude / Math.sqrt(2), within(1e-15));
        assertThat(s11.re()[2]).isCloseTo(-1.0, within(1e-15));
        assertThat(sweep.referenceOhms()).isEqualTo(75.0);
    }

    // --- option line, comments, layout

    @ParameterizedTest
    @CsvSource({"Hz, 1", "hz, 1", "KHZ, 1e3", "kHz, 1e3", "mhz, 1e6", "GHz, 1e9", "ghz, 1e9"})
    void convertsFrequencyUnitsInAnyCase(String unit, double hertz) throws Exception {
        Sweep sweep = read("# " + unit + " S RI R 50\n1.5 0.1 0.2\n2.5 0.3 0.4\n", 1);
        assertThat(sweep.frequencyHz()).containsExactly(1.5 * hertz, 2.5 * hertz);
    }

    @Test
    void acceptsOptionsInAnyOrderAndCase() throws Exception {
        Sweep sweep = read("#  ri r 75   s KHz\n1 0.1 0.2\n", 1);
        assertThat(sweep.frequencyHz()).containsExactly(1e3);
        assertThat(sweep.trace(SParameter.S11).orElseThrow().im()).containsExactly(0.2);
        assertThat(sweep.referenceOhms()).isEqualTo(75.0);
    }

    @Test
    void usesTheDefaultsWithoutAnOptionLine() throws Exception {
        Sweep sweep = read("! no option line\n1 0.5 90\n", 1);
        assertThat(sweep.frequencyHz()).containsExactly(1e9);
        assertPolar(sweep, SParameter.S11, 0, 0.5, 90);
        assertThat(sweep.referenceOhms()).isEqualTo(50.0);
    }

    @Test
    void readsCommentsBlankLinesTabsAndRecordsSpreadOverLines() throws Exception {
        String text = "! header\n\n# GHz S RI R 50 ! options\n"
                + "1\t0.11 0.12  0.21 0.22 ! S11 S21\n"
                + "   0.31 0.32\n"
                + "0.41 0.42\n"
                + "\n"
                + "2 0.51 0.52 0.61 0.62 0.71 0.72 0.81 0.82\n";
        Sweep sweep = read(text, 2);

        assertThat(sweep.frequencyHz()).containsExactly(1e9, 2e9);
        assertThat(sweep.trace(SParameter.S11).orElseThrow().re()).containsExactly(0.11, 0.51);
        assertThat(sweep.trace(SParameter.S21).orElseThrow().im()).containsExactly(0.22, 0.62);
        assertThat(sweep.trace(SParameter.S12).orElseThrow().re()).containsExactly(0.31, 0.71);
        assertThat(sweep.trace(SParameter.S22).orElseThrow().im()).containsExactly(0.42, 0.82);
    }

    @Test
    void countsLinesTheSameWithAnyLineEnding() {
        String lf = "# GHz S RI\n1 0 0\n2 0 0\n1.5 0 0\n";
        for (String text : new String[] {lf, lf.replace("\n", "\r\n"), lf.replace("\n", "\r")}) {
            assertError(() -> read(text, 1), SweepError.NOT_ASCENDING).hasMessageStartingWith("line 4: ");
        }
    }

    @Test
    void ignoresLaterOptionLinesInVersion11ButNotIn20() throws Exception {
        Sweep sweep = read("# MHz S RI\n# GHz S MA\n1 0.1 0.2\n", 1);
        assertThat(sweep.frequencyHz()).containsExactly(1e6);
        assertError(() -> read("[Version] 2.0\n# MHz S RI\n# GHz S MA\n", 1), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessage("line 3: a second option line");
        assertError(() -> read("1 0.1 0.2\n# MHz S RI\n", 1), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessage("line 2: the option line must come before the data");
    }

    // --- errors with line numbers

    @Test
    void saysWhichRecordHasTheWrongNumberOfValues() {
        String good = "1 0 0 0 0 0 0 0 0\n";
        assertError(() -> read("# GHz S RI\n" + good + "2 0 0 0 0 0 0\n3 0 0 0 0 0 0 0 0\n", 2), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessage("line 3: expected 9 numbers per frequency, found 7");
        assertError(() -> read("# GHz S RI\n" + good + "2 0 0 0 0 0 0\n", 2), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessage("line 3: expected 9 numbers per frequency, found 7");
        assertError(() -> read("# GHz S RI\n" + good + "2 0 0 0 0 0 0 0 0 0 0\n", 2), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessage("line 3: expected 9 numbers per frequency, found 11");
        assertError(() -> read("# GHz S RI\n1 0 0 0\n", 1), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessage("line 2: expected 3 numbers per frequency, found 4");
    }

    @Test
    void rejectsTokensThatAreNotFiniteNumbers() {
        assertError(() -> read("# GHz S RI\n1 0 0\n2 0 O.5\n", 1), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessage("line 3: 'O.5' is not a number");
        assertError(() -> read("# GHz S RI\n1 0 NaN\n", 1), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessage("line 2: 'NaN' is not a number");
        assertError(() -> read("# GHz S RI\n1 0 0\n2 1e999 0\n", 1), SweepError.NON_FINITE)
                .hasMessage("line 3: '1e999' is not a finite number");
        assertError(() -> read("# GHz S RI\n1 0 0,\n", 1), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessageStartingWith("line 2: ");
    }

    @Test
    void rejectsFrequenciesThatDoNotAscendOrAreNotPositive() {
        assertError(() -> read("# MHz S RI\n1 0 0\n2 0 0\n2 0 0\n", 1), SweepError.NOT_ASCENDING)
                .hasMessage("line 4: frequency 2.0 MHz is not above the previous one (2.0 MHz)");
        assertError(() -> read("# MHz S RI\n0 0 0\n2 0 0\n", 1), SweepError.NOT_ASCENDING)
                .hasMessage("line 2: frequency 0.0 MHz is not positive");
        String v2 = "[Version] 2.0\n[Number of Ports] 2\n[Two-Port Data Order] 12_21\n[Number of Frequencies] 2\n"
                + "[Network Data]\n5 0 0 0 0 0 0 0 0\n4 0 0 0 0 0 0 0 0\n";
        assertError(() -> read(v2, 2), SweepError.NOT_ASCENDING).hasMessageStartingWith("line 7: ");
    }

    @ParameterizedTest
    @ValueSource(strings = {"Y", "Z", "H", "G", "y", "z"})
    void rejectsParametersOtherThanS(String parameter) {
        assertError(() -> read("# GHz " + parameter + " RI R 50\n1 0 0\n", 1), SweepError.UNSUPPORTED_PARAMETER)
                .hasMessageContaining(parameter.toUpperCase() + "-parameters");
    }

    @Test
    void rejectsBadOptionLines() {
        assertError(() -> read("# GHz S XY R 50\n", 1), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessageStartingWith("line 1: unknown option 'XY'");
        assertError(() -> read("# GHz S RI R\n", 1), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessageContaining("'R' must be followed by the reference impedance");
        assertError(() -> read("# GHz S RI R 0\n", 1), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessageContaining("reference impedance '0'");
        assertError(() -> read("# GHz MHz S RI\n", 1), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessage("line 1: the option line gives the frequency unit twice");
    }

    @Test
    void rejectsThreeOrMorePorts() {
        assertError(() -> read("# GHz S RI\n1 0 0\n", 3), SweepError.UNSUPPORTED_PARAMETER)
                .hasMessageContaining("3-port");
        assertError(() -> read("[Version] 2.0\n# GHz S RI\n[Number of Ports] 4\n", 0), SweepError.UNSUPPORTED_PARAMETER)
                .hasMessage("line 3: 4-port data is not supported, only 1- and 2-port files");
    }

    @Test
    void needsThePortCountFromTheNameOrTheVersion20Header() throws Exception {
        assertError(() -> read("# GHz S RI\n1 0 0\n", 0), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessageContaining(".s1p or .s2p");
        Sweep sweep = read("[Version] 2.0\n[Number of Ports] 1\n[Number of Frequencies] 1\n[Network Data]\n1 0.5 0\n", 0);
        assertThat(sweep.traces()).containsOnlyKeys(SParameter.S11);
    }

    @Test
    void checksTheVersion20Header() {
        String header = "[Version] 2.0\n# GHz S RI R 50\n[Number of Ports] 1\n";
        assertError(() -> read(header + "[Number of Frequencies] 3\n[Network Data]\n1 0 0\n2 0 0\n[End]\n", 1),
                SweepError.TOUCHSTONE_SYNTAX).hasMessage("line 4: [Number of Frequencies] is 3 but the network data has 2");
        assertError(() -> read(header + "[Number of Frequencies] 1\n[Network Data]\n1 0 0\n2 0 0\n", 1),
                SweepError.TOUCHSTONE_SYNTAX).hasMessageStartingWith("line 7: more frequencies than the 1 declared");
        assertError(() -> read(header + "[Network Data]\n1 0 0\n", 1), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessage("line 4: [Number of Frequencies] must come before [Network Data]");
        assertError(() -> read(header.replace("1\n", "2\n") + "[Number of Frequencies] 1\n[Network Data]\n", 2),
                SweepError.TOUCHSTONE_SYNTAX).hasMessageContaining("[Two-Port Data Order]");
        assertError(() -> read(header + "[Matrix Format] Lower\n", 1), SweepError.UNSUPPORTED_PARAMETER)
                .hasMessage("line 4: [Matrix Format] Lower is not supported, only Full");
        assertError(() -> read(header + "[Mixed-Mode Order] D2,1\n", 1), SweepError.UNSUPPORTED_PARAMETER);
        assertError(() -> read(header + "[Frobnicate] 7\n", 1), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessage("line 4: unknown keyword [Frobnicate]");
        assertError(() -> read(header + "[Number of Ports] 1\n", 1), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessage("line 4: [Number of Ports] appears twice");
        assertError(() -> read("[Version] 3.0\n", 1), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessageContaining("unsupported [Version] '3.0'");
        assertError(() -> read(header + "[Number of Frequencies] 1\n1 0 0\n", 1), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessage("line 5: data before [Network Data]");
    }

    @Test
    void skipsTheInformationBlockWhateverItHolds() throws Exception {
        Sweep sweep = read("[Version] 2.0\n[Number of Ports] 1\n[Number of Frequencies] 1\n[Begin Information]\n"
                + "[\n# Z\n1 2 3 4\n[Number of Ports] 9\n[End Information]\n[Network Data]\n1 0.5 0\n", 1);
        assertThat(sweep.size()).isEqualTo(1);
        assertError(() -> read("[Version] 2.0\n[Number of Ports\n", 1), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessage("line 2: keyword without a closing ']'");
    }

    @Test
    void acceptsFullMatrixFormatAndKeywordsInAnyCase() throws Exception {
        Sweep sweep = read("[VERSION] 2.0\n[number of ports] 1\n[Matrix Format] full\n[Number Of Frequencies] 1\n"
                + "[NETWORK DATA]\n1 0.5 0\n[end]\n", 1);
        assertThat(sweep.size()).isEqualTo(1);
    }

    @Test
    void rejectsKeywordsInAVersion11File() {
        assertError(() -> read("# GHz S RI\n[Number of Ports] 1\n", 1), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessageContaining("line 2: keyword [Number of Ports]").hasMessageContaining("[Version] 2.0");
        assertError(() -> read("# GHz S RI\n[Version] 2.0\n", 1), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessageStartingWith("line 2: ");
    }

    @Test
    void rejectsDifferentReferenceImpedancesPerPort() {
        String text = text("spec-v20-two-port-21-12.s2p").replace("[Reference] 50 50.0", "[Reference] 50 25.0");
        assertError(() -> reader.read("v2.s2p", new StringReader(text), 2), SweepError.UNSUPPORTED_PARAMETER)
                .hasMessageContaining("different reference impedances");
    }

    @Test
    void checksTheShapeOfNoiseData() {
        String text = text("spec-v11-two-port-noise.s2p").replace("18 2.7 .46 -33 .40", "18 2.7 .46 -33");
        assertError(() -> reader.read("n.s2p", new StringReader(text), 2), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessage("line 11: expected 5 numbers per noise frequency, found 4"
                        + " (noise data starts on line 10, where the frequency stops increasing)");
        String v2 = text("spec-v20-two-port-21-12.s2p").replace("[Number of Noise Frequencies] 2", "[Number of Noise Frequencies] 3");
        assertError(() -> reader.read("n.s2p", new StringReader(v2), 2), SweepError.TOUCHSTONE_SYNTAX)
                .hasMessage("[Number of Noise Frequencies] is 3 but the noise data has 2");
    }

    @Test
    void rejectsNoiseDataInAOnePortFile() {
        assertError(() -> read("# GHz S RI\n2 0 0\n1 0 0 0 0\n", 1), SweepError.NOT_ASCENDING)
                .hasMessageStartingWith("line 3: ");
    }

    @Test
    void boundsTheNumberOfPoints() {
        TouchstoneReader small = new TouchstoneReader(new SweepLimits(2, 3));
        assertError(() -> small.read("f.s1p", new StringReader("1 0 0\n2 0 0\n3 0 0\n4 0 0\n"), 1), SweepError.TOO_MANY_POINTS)
                .hasMessage("line 4: more than 3 frequencies");
        assertError(() -> small.read("f.s1p", new StringReader("1 0 0\n"), 1), SweepError.TOO_FEW_POINTS);
        assertError(() -> small.read("f.s1p", new StringReader("[Version] 2.0\n[Number of Frequencies] 9\n"), 1),
                SweepError.TOO_MANY_POINTS).hasMessageStartingWith("line 2: ");
        assertError(() -> new TouchstoneReader().read("ex1.s1p", resource("spec-v11-one-port-ma.s1p"), 1),
                SweepError.TOO_FEW_POINTS).hasMessage("1 points, fewer than the 7 needed");
    }

    @Test
    void rejectsAFileWithoutData() {
        assertError(() -> read("! only a comment\n# GHz S RI\n", 1), SweepError.EMPTY_ARRAY)
                .hasMessageContaining("no network data");
    }

    @Test
    void refusesOverlyLongLines() {
        String text = "# GHz S RI\n1 0 0\n!" + "x".repeat(TextLines.MAX_LINE_LENGTH + 1) + "\n";
        assertError(() -> read(text, 1), SweepError.TOUCHSTONE_SYNTAX).hasMessageStartingWith("line 3 is longer than");
    }

    @Test
    void reportsAFailingReaderAsUnreadable() {
        Reader failing = new Reader() {
            @Override
            public int read(char[] buffer, int offset, int length) throws IOException {
                throw new IOException("device not ready");
            }

            @Override
            public void close() {
            }
        };
        assertError(() -> reader.read("f.s1p", failing, 1), SweepError.UNREADABLE)
                .hasMessage("cannot read f.s1p: device not ready");
    }

    private Sweep read(String text, int ports) throws InvalidSweepException {
        return reader.read("test.s" + ports + "p", new StringReader(text), ports);
    }

    private static Reader resource(String name) {
        InputStream in = TouchstoneReaderTest.class.getResourceAsStream("/sweep/" + name);
        assertThat(in).as(name).isNotNull();
        return new InputStreamReader(in, StandardCharsets.US_ASCII);
    }

    private static String text(String name) {
        try (Reader in = resource(name)) {
            StringBuilder text = new StringBuilder();
            char[] buffer = new char[4096];
            for (int n = in.read(buffer); n >= 0; n = in.read(buffer)) {
                text.append(buffer, 0, n);
            }
            return text.toString();
        } catch (IOException e) {
            throw new AssertionError(e);
        }
    }

    /** Checks a sample by its magnitude and angle, computed back from the rectangular value. */
    private static void assertPolar(Sweep sweep, SParameter parameter, int i, double magnitude, double degrees) {
        Trace trace = sweep.trace(parameter).orElseThrow();
        assertThat(trace.magnitude(i)).as("|%s[%d]|", parameter, i).isCloseTo(magnitude, within(1e-12));
        assertThat(Math.toDegrees(Math.atan2(trace.im()[i], trace.re()[i])))
                .as("angle of %s[%d]", parameter, i).isCloseTo(degrees, within(1e-9));
    }

    private interface Action {
        void run() throws Exception;
    }

    private static AbstractThrowableAssert<?, ? extends Throwable> assertError(Action action, SweepError expected) {
        return assertThatThrownBy(action::run).isInstanceOfSatisfying(InvalidSweepException.class,
                e -> assertThat(e.error()).as(e.getMessage()).isEqualTo(expected));
    }
}
