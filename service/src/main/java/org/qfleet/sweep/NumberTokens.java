package org.qfleet.sweep;

/** Splits a Touchstone data line into numbers, checking each token without regular expressions. */
final class NumberTokens {

    private static final int MAX_SHOWN = 40;

    private double[] values = new double[16];
    private int count;

    /** Parses every whitespace-separated token of the line; the numbers are then in {@link #values()}. */
    int parse(String line, int lineNumber) throws InvalidSweepException {
        count = 0;
        int i = 0;
        int n = line.length();
        while (i < n) {
            while (i < n && line.charAt(i) <= ' ') {
                i++;
            }
            if (i == n) {
                break;
            }
            int start = i;
            while (i < n && line.charAt(i) > ' ') {
                i++;
            }
            add(number(line, start, i, lineNumber));
        }
        return count;
    }

    /** The numbers of the last line parsed (the first {@code count} entries). */
    double[] values() {
        return values;
    }

    private void add(double value) {
        if (count == values.length) {
            values = java.util.Arrays.copyOf(values, 2 * count);
        }
        values[count++] = value;
    }

    private static double number(String line, int start, int end, int lineNumber) throws InvalidSweepException {
        for (int k = start; k < end; k++) {
            char c = line.charAt(k);
            if (!(c >= '0' && c <= '9' || c == '.' || c == '-' || c == '+' || c == 'e' || c == 'E')) {
                throw notANumber(line, start, end, lineNumber);
            }
        }
        double value;
        try {
            value = Double.parseDouble(line.substring(start, end));
        } catch (NumberFormatException e) {
            throw notANumber(line, start, end, lineNumber);
        }
        if (!Double.isFinite(value)) {
            throw new InvalidSweepException(SweepError.NON_FINITE,
                    "line " + lineNumber + ": " + shown(line, start, end) + " is not a finite number");
        }
        return value;
    }

    private static InvalidSweepException notANumber(String line, int start, int end, int lineNumber) {
        return new InvalidSweepException(SweepError.TOUCHSTONE_SYNTAX,
                "line " + lineNumber + ": " + shown(line, start, end) + " is not a number");
    }

    private static String shown(String line, int start, int end) {
        return "'" + line.substring(start, Math.min(end, start + MAX_SHOWN)) + (end - start > MAX_SHOWN ? "...'" : "'");
    }
}
