package org.qfleet.sweep;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.charset.StandardCharsets;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/** The fast decimal parser must give exactly the bits {@link Double#parseDouble} gives. */
class DecimalParserTest {

    @ParameterizedTest
    @ValueSource(strings = {
        "0", "-0", "+0", "0.0", "-0.0", "0e0", "-0E-5", "000", "0.000", "0e999999999",
        "1", "-1", "+1", "1.", ".5", "-.5", "+.5e-3", "1.e3", "1e5", "1E5", "1e+5", "1E-5", "007.50", "-00.00125",
        "1.7976931348623157e308", "-1.7976931348623157E308", "1.7976931348623158e308", "2.2250738585072014E-308",
        "2.2250738585072011e-308", "2.225073858507201e-308", "4.9e-324", "1e-320", "-1e-320", "2.47e-324",
        "9007199254740991", "9007199254740992", "9007199254740993", "18014398509481983", "18446744073709551615",
        "9999999999999999999", "99999999999999999999", "1234567890123456789012345678901234567890",
        "0.1", "0.2", "0.3", "1e22", "1e23", "1e-22", "1e-23", "8.98846567431158e307", "3.4028235e38",
        "1.2345678901234567e-5", "6.551601734243408E-4", "-0.0067830712410013524", "10.3906868",
        "9.109383701528e-31", "6.02214076e23", "1e120", "1e121", "1e-120", "1e-121", "123456789e-130",
        "0.000000000000000000000000000000000000000000000000000000000000000001", "1e-400", "1e400",
        "1.00000000000000011102230246251565404236316680908203125", "1.0000000000000001110223024625156540423631668090820313",
        "9007199254740993e-3", "2.5e-1", "0.5000000000000000555111512312578270211815834045410156250",
    })
    void givesTheSameBitsAsParseDouble(String text) {
        assertSameAsParseDouble(text);
    }

    @Test
    void givesTheSameBitsForRandomDoublesAsJavaWritesThem() {
        SplittableRandom random = new SplittableRandom(20_240_611);
        for (int i = 0; i < 200_000; i++) {
            double value = Double.longBitsToDouble(random.nextLong());
            if (Double.isFinite(value)) {
                assertSameAsParseDouble(Double.toString(value));
            }
        }
    }

    @Test
    void givesTheSameBitsForRandomDigitsSignsAndExponents() {
        SplittableRandom random = new SplittableRandom(7);
        for (int i = 0; i < 200_000; i++) {
            assertSameAsParseDouble(randomDecimal(random));
        }
    }

    /**
     * Numbers exactly halfway between two doubles (an odd 54-bit integer times a power of two), written
     * as digits times a power of ten, and their neighbours: rounding to even decides the last bit.
     */
    @Test
    void roundsHalfwayCasesLikeParseDouble() {
        SplittableRandom random = new SplittableRandom(11);
        for (int i = 0; i < 50_000; i++) {
            int q = random.nextInt(-4, 24);
            long five = pow5(Math.abs(q));
            String digits;
            if (q >= 0) {
                long low = Math.max(1, ((1L << 53) + five - 1) / five);
                long high = ((1L << 54) - 1) / five;
                long odd = (low + random.nextLong(high - low + 1)) | 1;
                digits = Long.toString(odd > high ? odd - 2 : odd);
            } else {
                long odd = (1L << 53) | random.nextLong(1L << 53) | 1;
                digits = Long.toUnsignedString(odd * five);
            }
            String exponent = "e" + q;
            assertSameAsParseDouble(digits + exponent);
            assertSameAsParseDouble(Long.toUnsignedString(Long.parseUnsignedLong(digits) + 1) + exponent);
            assertSameAsParseDouble(Long.toUnsignedString(Long.parseUnsignedLong(digits) - 1) + exponent);
        }
    }

    /** Plain numbers as Touchstone files hold them take the fast path rather than the fallback. */
    @Test
    void convertsUsualNumbersWithoutTheFallback() {
        SplittableRandom random = new SplittableRandom(3);
        for (int i = 0; i < 100_000; i++) {
            double value = random.nextDouble(-1, 1) * Math.pow(10, random.nextInt(-30, 30));
            String text = Double.toString(value);
            char[] chars = text.toCharArray();
            assertThat(DecimalParser.parseOrNaN(chars, 0, chars.length)).as(text).isEqualTo(Double.parseDouble(text));
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "-", "+", ".", "-.", "e5", ".e5", "1e", "1e+", "1E-", "--1", "+-1", "1..2", "1e5.5",
        "1-2", "1e5e5", "1.2.3", "1+", "0x10", "1,5", "e", "E1"})
    void rejectsWhatIsNotANumber(String text) {
        char[] chars = text.toCharArray();
        assertThat(DecimalParser.parseOrNaN(chars, 0, chars.length)).isNaN();
        assertThatThrownBy(() -> DecimalParser.parse(("[" + text + "]").toCharArray(), 1, text.length() + 1))
                .isInstanceOf(NumberFormatException.class);
    }

    /** Forms only Java's own parser knows are left to it, and it decides. */
    @ParameterizedTest
    @ValueSource(strings = {"NaN", "Infinity", "-Infinity", "1d", "1f", "0x1p3", " 1", "1 "})
    void leavesJavaOnlyFormsToParseDouble(String text) {
        char[] chars = text.toCharArray();
        assertThat(DecimalParser.parseOrNaN(chars, 0, chars.length)).isNaN();
        assertSameAsParseDouble(text);
    }

    @Test
    void readsOnlyTheGivenRange() {
        char[] text = "9 -12.5e-1 9".toCharArray();

        assertThat(DecimalParser.parse(text, 2, 10)).isEqualTo(-1.25);
        assertThat(DecimalParser.parse(text, 3, 5)).isEqualTo(12.0);
    }

    /** Every JSON spelling (RFC 8259, section 6) among the numbers above, read from bytes. */
    @ParameterizedTest
    @ValueSource(strings = {
        "0", "-0", "0.0", "-0.0", "0e0", "-0E-5", "0.000", "0e999999999", "1", "-1", "1e5", "1E5", "1e+5", "1E-5",
        "1.7976931348623157e308", "-1.7976931348623157E308", "1.7976931348623158e308", "1.7976931348623159e308",
        "2.2250738585072014E-308", "2.2250738585072011e-308", "4.9e-324", "1e-320", "-1e-320", "2.47e-324",
        "9007199254740993", "18446744073709551615", "18446744073709551616", "36893488147419103232",
        "99999999999999999999", "1234567890123456789012345678901234567890", "0.1", "0.3", "1e22", "1e23",
        "1.2345678901234567e-5", "6.551601734243408E-4", "-0.0067830712410013524", "-0.35806402866636833",
        "0.000000000000000000000000000000000000000000000000000000000000000001", "1e-400", "1e400", "-1e400",
        "1.00000000000000011102230246251565404236316680908203125", "9007199254740993e-3", "12345678.87654321e-8",
        "1e0000000000000000000000000000000005", "0.000000000000000000001234567890123456789012345"})
    void readsJsonNumbersFromBytesWithTheSameBitsAsParseDouble(String text) {
        assertSameAsParseDoubleFromBytes(text);
    }

    @Test
    void readsRandomJsonNumbersFromBytesWithTheSameBitsAsParseDouble() {
        SplittableRandom random = new SplittableRandom(19);
        for (int i = 0; i < 100_000; i++) {
            double value = Double.longBitsToDouble(random.nextLong());
            if (Double.isFinite(value)) {
                assertSameAsParseDoubleFromBytes(Double.toString(value));
            }
            assertSameAsParseDoubleFromBytes(randomJsonDecimal(random));
        }
    }

    /** Where JSON's grammar has no number, the byte reader finds none, though Java's grammar may. */
    @ParameterizedTest
    @ValueSource(strings = {"", "-", "+1", ".5", "-.5", "1.", "1.e3", "-1.x", "e5", "1e", "1e+", "1E-", "--1", "-+1",
        "NaN", "Infinity", "-Infinity", "x1", " 1", "\\u0031"})
    void findsNoJsonNumberWhereJsonGrammarHasNone(String text) {
        byte[] bytes = text.getBytes(StandardCharsets.ISO_8859_1);
        assertThat(new DecimalParser().scanJson(bytes, 0, bytes.length)).isNaN();
    }

    /** A JSON number ends at the first byte that cannot continue it; a leading zero stands alone. */
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"01|1", "-00|2", "007.5|1", "-0.5x|4", "1e5e5|3", "1.5.3|3", "12 3|2",
        "0x10|1", "123456789012345678,5|18", "1234567812345678]|16", "9\u00e9|1", "3.25E-2}|7"})
    void stopsWhereTheJsonNumberEnds(String text, int stop) {
        byte[] bytes = text.getBytes(StandardCharsets.ISO_8859_1);
        DecimalParser parser = new DecimalParser();
        double value = parser.scanJson(bytes, 0, bytes.length);
        assertThat(parser.stop()).isEqualTo(stop);
        assertThat(value).isEqualTo(Double.parseDouble(text.substring(0, stop)));
    }

    /** Digits up to the given end are read, however many there are, and never a byte past it. */
    @Test
    void readsJsonNumbersFromBytesUpToTheGivenEndOnly() {
        byte[] digits = "-1234567890123456789012345.98765432109876543210e-1234567890".getBytes(StandardCharsets.ISO_8859_1);
        DecimalParser parser = new DecimalParser();
        for (int end = 2; end <= digits.length; end++) {
            String text = new String(digits, 0, end, StandardCharsets.ISO_8859_1);
            double value = parser.scanJson(digits, 0, end);
            if (text.endsWith(".") || text.endsWith("e") || text.endsWith("-") && end > 2) {
                assertThat(value).as(text).isNaN();
            } else {
                assertThat(Double.doubleToRawLongBits(value)).as(text)
                        .isEqualTo(Double.doubleToRawLongBits(Double.parseDouble(text)));
                assertThat(parser.stop()).as(text).isEqualTo(end);
            }
        }
    }

    /** Reads the text from the middle of a byte array, followed by a byte that cannot continue a number. */
    private static void assertSameAsParseDoubleFromBytes(String text) {
        byte[] bytes = ("[\t" + text + ",\u00b9]").getBytes(StandardCharsets.ISO_8859_1);
        DecimalParser parser = new DecimalParser();
        double actual = parser.scanJson(bytes, 2, bytes.length);
        assertThat(Double.doubleToRawLongBits(actual)).as(text)
                .isEqualTo(Double.doubleToRawLongBits(Double.parseDouble(text)));
        assertThat(parser.stop()).as(text).isEqualTo(2 + text.length());
    }

    /** A random number in JSON's grammar: up to 25 integer and 25 fraction digits, an exponent up to ±400. */
    private static String randomJsonDecimal(SplittableRandom random) {
        StringBuilder text = new StringBuilder(random.nextBoolean() ? "-" : "");
        int integerDigits = random.nextInt(4) == 0 ? 0 : random.nextInt(1, 26);
        text.append(integerDigits == 0 ? "0" : Integer.toString(random.nextInt(1, 10)));
        appendDigits(text, integerDigits - 1, random);
        if (random.nextBoolean()) {
            appendDigits(text.append('.').append("0".repeat(random.nextInt(3) == 0 ? random.nextInt(1, 20) : 0)),
                    random.nextInt(1, 26), random);
        }
        if (random.nextBoolean()) {
            text.append(random.nextBoolean() ? 'e' : 'E').append(new String[] {"", "-", "+"}[random.nextInt(3)])
                    .append(random.nextInt(random.nextInt(4) == 0 ? 401 : 30));
        }
        return text.toString();
    }

    private static void appendDigits(StringBuilder text, int count, SplittableRandom random) {
        for (int d = 0; d < count; d++) {
            text.append((char) ('0' + random.nextInt(10)));
        }
    }

    private static void assertSameAsParseDouble(String text) {
        char[] chars = ("  " + text + "x").toCharArray(); // a range inside a larger buffer
        double expected = Double.parseDouble(text);
        double actual = DecimalParser.parse(chars, 2, chars.length - 1);
        assertThat(Double.doubleToRawLongBits(actual)).as(text).isEqualTo(Double.doubleToRawLongBits(expected));
        double fast = DecimalParser.parseOrNaN(chars, 2, chars.length - 1);
        if (!Double.isNaN(fast)) {
            assertThat(Double.doubleToRawLongBits(fast)).as(text).isEqualTo(Double.doubleToRawLongBits(expected));
        }
    }

    private static long pow5(int n) {
        long power = 1;
        for (int k = 0; k < n; k++) {
            power *= 5;
        }
        return power;
    }

    /** Random sign, leading zeros, 1 to 22 digits with or without a point, and an exponent up to ±330. */
    private static String randomDecimal(SplittableRandom random) {
        StringBuilder text = new StringBuilder();
        int sign = random.nextInt(3);
        text.append(sign == 0 ? "" : sign == 1 ? "-" : "+");
        text.append("0".repeat(random.nextInt(4) == 0 ? random.nextInt(1, 4) : 0));
        int digits = random.nextInt(1, 23);
        int point = random.nextInt(-1, digits + 1);
        for (int d = 0; d < digits; d++) {
            if (d == point) {
                text.append('.');
            }
            text.append((char) ('0' + random.nextInt(10)));
        }
        if (random.nextBoolean()) {
            text.append(random.nextBoolean() ? 'e' : 'E');
            int exponentSign = random.nextInt(3);
            text.append(exponentSign == 0 ? "" : exponentSign == 1 ? "-" : "+");
            int bound = random.nextInt(4) == 0 ? 331 : 40;
            text.append(random.nextInt(bound));
        }
        return text.toString();
    }
}
