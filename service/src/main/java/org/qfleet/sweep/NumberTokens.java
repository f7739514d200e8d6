package org.qfleet.sweep;

import java.util.Arrays;

/** Splits a Touchstone data line into numbers, checking each token without regular expressions. */
final class NumberTokens {

    private static final int MAX_SHOWN = 40;

    private final DecimalParser decimal = new DecimalParser();
    private double[] values = new double[16];
    private int count;
    private int stop;

    /** Parses every whitespace-separated token of the line; the numbers are then in {@link #values()}. */
    int parse(String line, int lineNumber) throws InvalidSweepException {
        char[] text = line.toCharArray();
        return parse(text, 0, text.length, lineNumber);
    }

    /**
     * Parses every whitespace-separated token of {@code text[start, end)} up to a line break or a
     * {@code !} that starts a comment, like {@link #parse(String, int)}; {@link #stop()} then tells
     * where it stopped. Each character is read once: a plain number is converted as it is scanned,
     * and only other tokens are looked at again.
     */
    int parse(char[] text, int start, int end, int lineNumber) throws InvalidSweepException {
        count = 0;
        int i = start;
        while (true) {
            while (i < end && text[i] <= ' ' && text[i] != '\n' && text[i] != '\r') {
                i++;
            }
            if (i == end || text[i] == '!' || text[i] == '\n' || text[i] == '\r') {
                stop = i;
                return count;
            }
            double value = decimal.scan(text, i, end);
            if (value == value && isDelimiter(text, decimal.stop(), end)) {
                i = decimal.stop();
            } else {
                int tokenStart = i;
                while (!isDelimiter(text, i, end)) {
                    i++;
                }
                value = checkedNumber(text, tokenStart, i, lineNumber);
            }
            add(value);
        }
    }

    /** Where the last {@link #parse(char[], int, int, int)} stopped: the end, a line break or a comment. */
    int stop() {
        return stop;
    }

    /** The numbers of the last line parsed (the first {@code count} entries). */
    double[] values() {
        return values;
    }

    private void add(double value) {
        if (count == values.length) {
            values = Arrays.copyOf(values, 2 * count);
        }
        values[count++] = value;
    }

    /** True at the end of a token: the end of the text, a blank, a line break or a comment. */
    private static boolean isDelimiter(char[] text, int i, int end) {
        return i == end || text[i] <= ' ' || text[i] == '!';
    }

    /** Any token the fast path did not take: odd forms, non-finite values and everything that is not a number. */
    private static double checkedNumber(char[] text, int start, int end, int lineNumber) throws InvalidSweepException {
        for (int k = start; k < end; k++) {
            char c = text[k];
            if (!(c >= '0' && c <= '9' || c == '.' || c == '-' || c == '+' || c == 'e' || c == 'E')) {
                throw notANumber(text, start, end, lineNumber);
            }
        }
        double value;
        try {
            value = DecimalParser.parse(text, start, end);
        } catch (NumberFormatException e) {
            throw notANumber(text, start, end, lineNumber);
        }
        if (!Double.isFinite(value)) {
            throw new InvalidSweepException(SweepError.NON_FINITE,
                    "line " + lineNumber + ": " + shown(text, start, end) + " is not a finite number");
        }
        return value;
    }

    private static InvalidSweepException notANumber(char[] text, int start, int end, int lineNumber) {
        return new InvalidSweepException(SweepError.TOUCHSTONE_SYNTAX,
                "line " + lineNumber + ": " + shown(text, start, end) + " is not a number");
    }

    private static String shown(char[] text, int start, int end) {
        return "'" + new String(text, start, Math.min(end, start + MAX_SHOWN) - start)
                + (end - start > MAX_SHOWN ? "...'" : "'");
    }
}
