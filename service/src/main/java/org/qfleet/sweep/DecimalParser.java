package org.qfleet.sweep;

import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;

/**
 * Converts decimal text such as {@code -6.551601734243408E-4} to the nearest double without creating
 * a String, giving exactly what {@link Double#parseDouble} gives. Plain decimal numbers with at most
 * 19 significant digits take a fast path; anything else (more digits, exponents far out, subnormal
 * or overflowing results, other syntax) goes to {@link Double#parseDouble}.
 *
 * <p>The fast path is exact. When the digits, read as an integer w, are below 2^53 and the decimal
 * exponent q is within ±22, both w and 10^|q| are exact doubles and one IEEE multiplication or
 * division rounds correctly (Clinger, "How to Read Floating Point Numbers Accurately", PLDI 1990).
 * Otherwise w · 10^q is computed with the 128-bit powers of five of {@link PowersOfFive} and rounded
 * to nearest-even (the Eisel-Lemire algorithm: Lemire, "Number Parsing at a Gigabyte per Second",
 * Software: Practice and Experience 51(8), 2021; recalled from memory), falling back in the rare
 * case the 128-bit product cannot decide the rounding.
 *
 * <p>Text comes as characters ({@link #scan(char[], int, int)}, any plain decimal) or as the bytes
 * of a JSON message ({@link #scanJson(byte[], int, int)}, JSON's stricter grammar); both end in
 * the same conversion.
 */
final class DecimalParser {

    private static final int MAX_DIGITS = 19;
    private static final int EXPONENT_CAP = 100_000;
    private static final int MANTISSA_BITS = 52;
    private static final int DOUBLE_BIAS = 1023;
    private static final int INFINITE_POWER = 0x7FF;
    private static final double[] POWERS_OF_TEN = {
        1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11,
        1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22,
    };

    /** Reads eight bytes of a byte array as one long, the first byte lowest. */
    private static final VarHandle LONGS = MethodHandles.byteArrayViewVarHandle(long[].class, ByteOrder.LITTLE_ENDIAN);

    private static final long[] LONG_POWERS_OF_TEN = {1, 10, 100, 1000, 10_000, 100_000, 1_000_000, 10_000_000};

    private int stop;
    /** The digits read so far by {@link #readDigits}, as an integer. */
    private long mantissa;

    /**
     * The double that {@link Double#parseDouble} gives for {@code text[start, end)}.
     *
     * @throws NumberFormatException when the text is not a number
     */
    static double parse(char[] text, int start, int end) {
        double value = parseOrNaN(text, start, end);
        return value == value ? value : Double.parseDouble(new String(text, start, end - start));
    }

    /**
     * The value of {@code text[start, end)} when it is a plain decimal number
     * ({@code [+-]digits[.digits][(e|E)[+-]digits]}, at least one digit before the exponent) that
     * the fast path can convert exactly; NaN otherwise, for the caller to fall back. Never infinite.
     */
    static double parseOrNaN(char[] text, int start, int end) {
        DecimalParser parser = new DecimalParser();
        double value = parser.scan(text, start, end);
        return parser.stop == end ? value : Double.NaN;
    }

    /**
     * Reads the plain decimal number that starts at {@code text[start]} and ends at the first
     * character that cannot continue it, or at {@code end}; {@link #stop()} then tells where. NaN
     * when no plain number starts there or the fast path cannot convert it (and {@link #stop()} is
     * then meaningless). Never infinite. Not thread-safe: one instance per reader.
     */
    double scan(char[] text, int start, int end) {
        int i = start;
        boolean negative = false;
        if (i < end && (text[i] == '-' || text[i] == '+')) {
            negative = text[i] == '-';
            i++;
        }
        int mantissaStart = i;
        while (i < end && text[i] == '0') {
            i++;
        }
        int digitsStart = i;
        i = digitsEnd(text, i, end);
        long digits = accumulate(0, text, digitsStart, i);
        int significant = i - digitsStart;
        int mantissaDigits = i - mantissaStart;
        int exponent = 0;
        if (i < end && text[i] == '.') {
            int fractionStart = ++i;
            if (significant == 0) {
                while (i < end && text[i] == '0') {
                    i++;
                }
            }
            digitsStart = i;
            i = digitsEnd(text, i, end);
            significant += i - digitsStart;
            if (significant > MAX_DIGITS) {
                return Double.NaN;
            }
            digits = accumulate(digits, text, digitsStart, i);
            exponent = fractionStart - i;
            mantissaDigits += i - fractionStart;
        }
        if (mantissaDigits == 0 || significant > MAX_DIGITS) {
            return Double.NaN;
        }
        if (i < end && (text[i] == 'e' || text[i] == 'E')) {
            i++;
            boolean negativeExponent = false;
            if (i < end && (text[i] == '-' || text[i] == '+')) {
                negativeExponent = text[i] == '-';
                i++;
            }
            int exponentStart = i;
            int written = 0;
            for (int d; i < end && (d = text[i] - '0') >= 0 && d <= 9; i++) {
                written = Math.min(EXPONENT_CAP, 10 * written + d);
            }
            if (i == exponentStart) {
                return Double.NaN;
            }
            exponent += negativeExponent ? -written : written;
        }
        stop = i;
        double magnitude = digits == 0 ? 0.0 : scaled(digits, exponent);
        return negative ? -magnitude : magnitude;
    }

    /**
     * Reads the JSON number (RFC 8259, section 6: {@code -?(0|[1-9][0-9]*)(.[0-9]+)?([eE][+-]?[0-9]+)?})
     * that starts at {@code text[start]}, bytes of ASCII text, and ends at the first byte that cannot
     * continue it, or at {@code end}; {@link #stop()} then tells where. Gives exactly what
     * {@link Double#parseDouble} gives for those bytes (infinite when they overflow): plain numbers
     * by the same conversion as {@link #scan(char[], int, int)}, the others through
     * {@link Double#parseDouble}. NaN (and {@link #stop()} meaningless) when no JSON number starts
     * there. Not thread-safe: one instance per reader.
     */
    double scanJson(byte[] text, int start, int end) {
        int i = start;
        boolean negative = i < end && text[i] == '-';
        if (negative) {
            i++;
        }
        int integerStart = i;
        mantissa = 0;
        i = i < end && text[i] == '0' ? i + 1 : readDigits(text, i, end); // no leading zeros in JSON
        if (i == integerStart) {
            return Double.NaN;
        }
        int significant = text[integerStart] == '0' ? 0 : i - integerStart;
        int exponent = 0;
        if (i < end && text[i] == '.') {
            int fractionStart = ++i;
            if (significant == 0) {
                while (i < end && text[i] == '0') {
                    i++;
                }
            }
            int digitsStart = i;
            i = readDigits(text, i, end);
            if (i == fractionStart) {
                return Double.NaN;
            }
            significant += i - digitsStart;
            exponent = fractionStart - i;
        }
        if (i < end && (text[i] == 'e' || text[i] == 'E')) {
            i++;
            boolean negativeExponent = false;
            if (i < end && (text[i] == '-' || text[i] == '+')) {
                negativeExponent = text[i] == '-';
                i++;
            }
            int exponentStart = i;
            int written = 0;
            for (int d; i < end && (d = text[i] - '0') >= 0 && d <= 9; i++) {
                written = Math.min(EXPONENT_CAP, 10 * written + d);
            }
            if (i == exponentStart) {
                return Double.NaN;
            }
            exponent += negativeExponent ? -written : written;
        }
        stop = i;
        double magnitude = significant > MAX_DIGITS ? Double.NaN : mantissa == 0 ? 0.0 : scaled(mantissa, exponent);
        if (magnitude != magnitude) {
            return Double.parseDouble(new String(text, start, i - start, StandardCharsets.ISO_8859_1));
        }
        return negative ? -magnitude : magnitude;
    }

    /** The end of the run of decimal digits that starts at {@code text[from]}. */
    private static int digitsEnd(char[] text, int from, int end) {
        int i = from;
        while (i < end && text[i] >= '0' && text[i] <= '9') {
            i++;
        }
        return i;
    }

    /**
     * {@code digits} followed by the decimal digits {@code text[from, to)}, four at a time so that
     * the multiplications do not wait for one another (modulo 2^64 past 19 digits).
     */
    private static long accumulate(long digits, char[] text, int from, int to) {
        long value = digits;
        int i = from;
        for (; i + 4 <= to; i += 4) {
            value = 10_000 * value + (1000 * text[i] + 100 * text[i + 1] + 10 * text[i + 2] + text[i + 3] - 1111 * '0');
        }
        for (; i < to; i++) {
            value = 10 * value + (text[i] - '0');
        }
        return value;
    }

    /**
     * Reads the run of decimal digits that starts at {@code text[from]}, appending them to
     * {@link #mantissa} (modulo 2^64 past 19 digits), and returns where the run ends. Eight bytes
     * are looked at in one step: all digits, or the digits before the first byte that is not one.
     */
    private int readDigits(byte[] text, int from, int end) {
        int i = from;
        long value = mantissa;
        for (; i + 8 <= end; i += 8) {
            long word = (long) LONGS.get(text, i);
            long nonDigits = nonDigits(word);
            if (nonDigits != 0) {
                int count = Long.numberOfTrailingZeros(nonDigits) >>> 3;
                mantissa = count == 0 ? value : value * LONG_POWERS_OF_TEN[count] + leadingDigitsValue(word, count);
                return i + count;
            }
            value = 100_000_000 * value + eightDigitsValue(word);
        }
        for (; i < end && text[i] >= '0' && text[i] <= '9'; i++) {
            value = 10 * value + (text[i] - '0');
        }
        mantissa = value;
        return i;
    }

    /**
     * Eight bytes read as one little-endian long, with the high bit of each byte that is not an
     * ASCII digit set and every other bit clear. After XOR with '0' a digit has a zero high nibble
     * (halved and added to 0x78, a nonzero one reaches bit 7) and a low nibble below 10 (plus 6, one
     * of 10 or more reaches bit 4); no sum leaves its byte. A SWAR ("SIMD within a register") test,
     * common practice in fast number parsers.
     */
    private static long nonDigits(long bytes) {
        long x = bytes ^ 0x3030303030303030L;
        long highNibble = ((x & 0xF0F0F0F0F0F0F0F0L) >>> 1) + 0x7878787878787878L;
        long tenOrMore = ((x & 0x0F0F0F0F0F0F0F0FL) + 0x0606060606060606L) << 3;
        return (highNibble | tenOrMore) & 0x8080808080808080L;
    }

    /** The value of the first {@code count} (1 to 7) bytes, ASCII digits, of a little-endian long. */
    private static long leadingDigitsValue(long bytes, int count) {
        long digits = bytes << 8 * (8 - count); // the digits move to the top, zero bytes come in below
        return eightDigitsValue(digits | 0x3030303030303030L >>> 8 * count); // ... and become leading '0's
    }

    /**
     * The value of eight ASCII digits read as one little-endian long (first digit in the lowest
     * byte): each byte becomes 10 times itself plus the next (pairs in the even bytes), then the four
     * pairs are weighted by 10^6, 10^4, 100 and 1 in the upper half of two products. Common practice
     * in fast number parsers (SWAR).
     */
    private static long eightDigitsValue(long bytes) {
        long value = bytes - 0x3030303030303030L;
        value = value * 10 + (value >>> 8);
        return ((value & 0x000000FF000000FFL) * (100 + (1_000_000L << 32))
                + ((value >>> 16) & 0x000000FF000000FFL) * (1 + (10_000L << 32))) >>> 32;
    }

    /** Where the number read by the last {@link #scan} or {@link #scanJson} ended (exclusive). */
    int stop() {
        return stop;
    }

    /** digits · 10^exponent for digits > 0 (read as unsigned), or NaN when the fast path cannot tell. */
    private static double scaled(long digits, int exponent) {
        if (digits >>> 53 == 0 && exponent >= -22 && exponent <= 22) {
            double exact = digits;
            return exponent < 0 ? exact / POWERS_OF_TEN[-exponent] : exact * POWERS_OF_TEN[exponent];
        }
        if (exponent < PowersOfFive.MIN_Q || exponent > PowersOfFive.MAX_Q) {
            return Double.NaN;
        }
        return eiselLemire(digits, exponent);
    }

    /**
     * w · 10^q for w > 0 (unsigned) and q within the table: the top bits of w · 5^q from the 128-bit
     * powers of five, the power of two from q · log2(10), rounded to nearest even (Lemire 2021). NaN
     * when the product cannot decide the rounding, or the result is subnormal or overflows.
     */
    private static double eiselLemire(long w, int q) {
        int leadingZeros = Long.numberOfLeadingZeros(w);
        long normalized = w << leadingZeros;
        long high = unsignedMultiplyHigh(normalized, PowersOfFive.high(q));
        long low = normalized * PowersOfFive.high(q);
        if ((high & 0x1FF) == 0x1FF) {
            // the 64 bits of 5^q were not enough to fix the bits that decide the rounding: add the next 64
            long secondHigh = unsignedMultiplyHigh(normalized, PowersOfFive.low(q));
            long sum = low + secondHigh;
            if (Long.compareUnsigned(sum, low) < 0) {
                high++;
            }
            low = sum;
            if (low == -1L && (high & 0x1FF) == 0x1FF) {
                return Double.NaN; // still undecided: leave it to the exact algorithm
            }
        }
        int upperBit = (int) (high >>> 63);
        int shift = upperBit + 64 - MANTISSA_BITS - 3;
        long mantissa = high >>> shift;
        int power2 = binaryExponent(q) + upperBit - leadingZeros + DOUBLE_BIAS;
        if (power2 <= 0) {
            return Double.NaN; // subnormal: rare enough to leave to the exact algorithm
        }
        if ((low == 0 || low == 1) && q >= -4 && q <= 23 && (mantissa & 3) == 1
                && mantissa << shift == high) {
            mantissa &= ~1L; // exactly halfway (possible only for q in [-4, 23]): round to even, that is down
        }
        mantissa += mantissa & 1;
        mantissa >>>= 1;
        if (mantissa >= 2L << MANTISSA_BITS) {
            mantissa = 1L << MANTISSA_BITS;
            power2++;
        }
        if (power2 >= INFINITE_POWER) {
            return Double.NaN; // overflow: leave it to the exact algorithm, which gives infinity
        }
        mantissa &= ~(1L << MANTISSA_BITS);
        return Double.longBitsToDouble((long) power2 << MANTISSA_BITS | mantissa);
    }

    /** floor(q · log2(10)) + 63, exact for |q| below about 700 (Lemire 2021). */
    private static int binaryExponent(int q) {
        return (((152_170 + 65_536) * q) >> 16) + 63;
    }

    private static long unsignedMultiplyHigh(long a, long b) {
        return Math.multiplyHigh(a, b) + ((a >> 63) & b) + ((b >> 63) & a);
    }
}
