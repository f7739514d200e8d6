package org.qfleet.sweep;

import java.io.IOException;
import java.io.Reader;
import java.util.Arrays;

/**
 * Reads text one line at a time (LF, CR LF or CR endings), counting lines and refusing a line too
 * long to be Touchstone, so that a file without line breaks cannot exhaust memory. Lines are served
 * in place, as ranges of the internal buffer, so reading creates no object per line.
 *
 * <p>Text shorter than {@link #WHOLE_TEXT} characters is held whole. Then a line's end is found
 * only when asked for ({@link #end()}), or by the caller that reads the line anyway and reports
 * where it stopped ({@link #endFrom(int)}), so the text is scanned once. Longer text is read in
 * windows of that size, and each line is scanned for its end before it is served.
 */
final class TextLines {

    static final int MAX_LINE_LENGTH = 65_536;

    /** Texts shorter than this many characters are read whole; longer ones in windows this large. */
    static final int WHOLE_TEXT = 1 << 20;

    private static final int DEFAULT_CAPACITY = 16_384;
    private static final int UNKNOWN = -1;

    private final Reader in;
    private final int window;
    private char[] buffer;
    private int position;
    private int limit;
    private boolean ended;
    private int lineStart;
    private int lineEnd = UNKNOWN;
    private int lineNumber;
    private boolean skipLineFeed;

    TextLines(Reader in) {
        this(in, DEFAULT_CAPACITY);
    }

    /** @param expectedLength the text's length if known (a file's size), used to size the buffer */
    TextLines(Reader in, long expectedLength) {
        this(in, expectedLength, WHOLE_TEXT);
    }

    /** With a smaller window than {@link #WHOLE_TEXT}, for tests of the windowed reading. */
    TextLines(Reader in, long expectedLength, int window) {
        if (window <= MAX_LINE_LENGTH) {
            throw new IllegalArgumentException("the window must hold a line of " + MAX_LINE_LENGTH + " characters");
        }
        this.in = in;
        this.window = window;
        this.buffer = new char[(int) Math.max(16, Math.min(expectedLength + 1, window))];
    }

    /**
     * Moves to the next line, false at the end of the text. The line starts at {@link #start()} in
     * {@link #text()} and ends at the first CR or LF from there, or at {@link #bound()}. The buffer
     * stays valid until the next call.
     */
    boolean next() throws IOException, InvalidSweepException {
        if (lineNumber > 0) {
            position = lineEnd == UNKNOWN ? consume(end()) : consume(lineEnd);
        }
        if (position == limit && !fill()) {
            return false;
        }
        if (skipLineFeed) {
            skipLineFeed = false;
            if (buffer[position] == '\n') {
                position++;
                if (position == limit && !fill()) {
                    return false;
                }
            }
        }
        lineStart = position;
        lineEnd = UNKNOWN;
        lineNumber++;
        if (!ended) {
            lineEnd = scanWindowed();
        }
        return true;
    }

    /** The buffer holding the current line. */
    char[] text() {
        return buffer;
    }

    /** Where the current line starts in {@link #text()}. */
    int start() {
        return lineStart;
    }

    /**
     * How far the current line may extend: its end when already known, else the end of the text.
     * The line ends before that at its first CR or LF.
     */
    int bound() {
        return lineEnd == UNKNOWN ? limit : lineEnd;
    }

    /** Where the current line ends (exclusive, before its line break), finding it if needed. */
    int end() throws InvalidSweepException {
        return lineEnd == UNKNOWN ? endFrom(lineStart) : lineEnd;
    }

    /**
     * Where the current line ends, found from {@code from}, a position the caller knows to be on the
     * line or at its end (where a reader of the line stopped).
     *
     * @throws InvalidSweepException when the line is longer than {@link #MAX_LINE_LENGTH}
     */
    int endFrom(int from) throws InvalidSweepException {
        if (lineEnd != UNKNOWN) {
            return lineEnd;
        }
        int i = from;
        while (i < limit && buffer[i] != '\n' && buffer[i] != '\r') {
            i++;
        }
        checkLength(i - lineStart);
        lineEnd = i;
        return i;
    }

    /** The number of the current line, counting from 1. */
    int lineNumber() {
        return lineNumber;
    }

    /** Moves past the line break at {@code end}; a CR LF pair counts as one. */
    private int consume(int end) {
        if (end == limit) {
            return end;
        }
        if (buffer[end] == '\r') {
            if (end + 1 < limit) {
                return buffer[end + 1] == '\n' ? end + 2 : end + 1;
            }
            skipLineFeed = !ended;
        }
        return end + 1;
    }

    /** The end of the line at {@link #position}, reading more of the text as needed. */
    private int scanWindowed() throws IOException, InvalidSweepException {
        int scan = position;
        while (true) {
            while (scan < limit && buffer[scan] != '\n' && buffer[scan] != '\r') {
                scan++;
            }
            checkLength(scan - position);
            if (scan < limit) {
                return scan;
            }
            int scanned = scan - position;
            boolean more = fill(); // moves the unread text to the front of the buffer
            lineStart = position;
            scan = position + scanned;
            if (!more) {
                return scan;
            }
        }
    }

    private void checkLength(int length) throws InvalidSweepException {
        if (length > MAX_LINE_LENGTH) {
            throw new InvalidSweepException(SweepError.TOUCHSTONE_SYNTAX,
                    "line " + lineNumber + " is longer than " + MAX_LINE_LENGTH + " characters");
        }
    }

    /**
     * Reads more text after what is left unread, which moves to the front of the buffer: as much as
     * the buffer holds, growing it up to the window. False when there is no more text.
     */
    private boolean fill() throws IOException {
        if (ended) {
            return false;
        }
        int unread = limit - position;
        System.arraycopy(buffer, position, buffer, 0, unread);
        position = 0;
        limit = unread;
        int before = limit;
        while (true) {
            if (limit == buffer.length) {
                if (buffer.length >= window) {
                    return true;
                }
                buffer = Arrays.copyOf(buffer, (int) Math.min(2L * buffer.length, window));
            }
            int read = in.read(buffer, limit, buffer.length - limit);
            if (read < 0) {
                ended = true;
                return limit > before;
            }
            limit += read;
        }
    }
}
