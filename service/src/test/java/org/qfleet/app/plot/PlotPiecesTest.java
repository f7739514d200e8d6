package org.qfleet.app.plot;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** The small helpers of the plot: geometry, text escaping, number formats, file names. */
class PlotPiecesTest {

    @Test
    void circleThroughThreePointsOfTheUnitCircle() {
        Circle c = Circle.through(1, 0, 0, 1, -1, 0);

        assertThat(c.centerRe()).isCloseTo(0, within(1e-12));
        assertThat(c.centerIm()).isCloseTo(0, within(1e-12));
        assertThat(c.radius()).isCloseTo(1, within(1e-12));
    }

    @Test
    void circleThroughPointsOnALineIsUndefined() {
        assertThat(Circle.through(0, 0, 1, 1, 2, 2)).isNull();
        assertThat(Circle.through(1, 1, 1, 1, 1, 1)).isNull();
    }

    @Test
    void textIsEscapedForXmlAndForbiddenCharactersDropped() {
        assertThat(SvgBuilder.escape("a<b & 'c' \"d\">\u0001e")).isEqualTo("a&lt;b &amp; &apos;c&apos; &quot;d&quot;&gt;e");
    }

    @Test
    void valuesShowTheDigitsTheirUncertaintySupports() {
        assertThat(ValueFormat.withUncertainty(6012.345, 45.2)).isEqualTo("6012 ± 45");
        assertThat(ValueFormat.withUncertainty(51.234, 0.87)).isEqualTo("51.23 ± 0.87");
        assertThat(ValueFormat.withUncertainty(6012.345, Double.NaN)).isEqualTo("6012");
        assertThat(ValueFormat.withUncertainty(Double.NaN, 3)).isEqualTo("n/a");
    }

    @Test
    void frequenciesUseAUnitEachForValueAndUncertainty() {
        // 1234 Hz uncertainty: two significant digits reach 1e-7 GHz, so 7 decimals.
        assertThat(ValueFormat.frequency(10.40012345e9, 1234)).isEqualTo("10.4001235 GHz ± 1.2 kHz");
        assertThat(ValueFormat.frequency(3.6e9, Double.NaN)).isEqualTo("3.6 GHz");
    }

    @Test
    void fileNamesComeFromTheLastPartOfTheSource() {
        assertThat(PlotDirectory.fileStem("lot7/unit 3.s2p")).isEqualTo("unit_3.s2p");
        assertThat(PlotDirectory.fileStem("C:\\data\\u1.s1p")).isEqualTo("u1.s1p");
        assertThat(PlotDirectory.fileStem("sweeps.jsonl:17")).isEqualTo("sweeps.jsonl_17");
        assertThat(PlotDirectory.fileStem("../..")).isEqualTo("sweep");
        assertThat(PlotDirectory.fileStem("")).isEqualTo("sweep");
        assertThat(PlotDirectory.fileStem("x".repeat(500))).hasSize(120);
    }
}
