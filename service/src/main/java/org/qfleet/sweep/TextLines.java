package org.qfleet.sweep;

import java.io.IOException;
import java.io.Reader;

/**
 * Reads text one line at a time (LF, CR LF or CR endings), counting lines and refusing a line too
 * long to be Touchstone, so that a file without line breaks cannot exhaust memory.
 */
final class TextLines {

    static final int MAX_LINE_LENGTH = 65_536;

    private final Reader in;
    private final char[] buffer = new char[8192];
    private final StringBuilder line = new StringBuilder(128);
    private int position;
    private int limit;
    private int lineNumber;
    private boolean skipLineFeed;

    TextLines(Reader in) {
        this.in = in;
    }

    /** The next line without its line break, or null at the end of the text. */
    String next() throws IOException, InvalidSweepException {
        line.setLength(0);
        boolean started = false;
        while (true) {
            if (position == limit && !fill()) {
                if (!started) {
                    return null;
                }
                lineNumber++;
                return line.toString();
            }
            if (skipLineFeed) {
                skipLineFeed = false;
                if (buffer[position] == '\n') {
                    position++;
                    continue;
                }
            }
            started = true;
            int start = position;
            while (position < limit && buffer[position] != '\n' && buffer[position] != '\r') {
                position++;
            }
            if (line.length() + position - start > MAX_LINE_LENGTH) {
                throw new InvalidSweepException(SweepError.TOUCHSTONE_SYNTAX,
                        "line " + (lineNumber + 1) + " is longer than " + MAX_LINE_LENGTH + " characters");
            }
            line.append(buffer, start, position - start);
            if (position < limit) {
                skipLineFeed = buffer[position++] == '\r';
                lineNumber++;
                return line.toString();
            }
        }
    }

    /** The number of the line last returned, counting from 1. */
    int lineNumber() {
        return lineNumber;
    }

    private boolean fill() throws IOException {
        int read;
        do {
            read = in.read(buffer, 0, buffer.length);
        } while (read == 0);
        position = 0;
        limit = Math.max(read, 0);
        return read > 0;
    }
}
