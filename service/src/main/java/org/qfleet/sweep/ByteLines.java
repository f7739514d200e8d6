package org.qfleet.sweep;

import java.io.IOException;
import java.io.InputStream;

/**
 * Splits a byte stream into lines and serves each line as its own stream, so a JSON Lines file is
 * read message by message without ever holding a whole line in memory.
 */
final class ByteLines {

    private final InputStream in;
    private final byte[] buffer = new byte[65_536];
    private final LineStream line = new LineStream();
    private int position;
    private int limit;
    private int newlines;
    private int lineNumber;

    ByteLines(InputStream in) {
        this.in = in;
    }

    /**
     * Moves to the next line that is not blank (spaces, tabs and CR only), skipping what is left of
     * the current one. False at the end of the input.
     */
    boolean nextNonBlank() throws IOException {
        line.drain();
        while (position < limit || fill()) {
            byte b = buffer[position];
            if (b == '\n') {
                newlines++;
            } else if (b != ' ' && b != '\t' && b != '\r') {
                lineNumber = newlines + 1;
                line.ended = false;
                return true;
            }
            position++;
        }
        return false;
    }

    /** The number of the current line, counting from 1. */
    int lineNumber() {
        return lineNumber;
    }

    /** The rest of the current line (without its line break); closing it does nothing. */
    InputStream line() {
        return line;
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

    private final class LineStream extends InputStream {

        private boolean ended = true;

        @Override
        public int read() throws IOException {
            byte[] one = new byte[1];
            return read(one, 0, 1) < 0 ? -1 : one[0] & 0xff;
        }

        @Override
        public int read(byte[] target, int offset, int length) throws IOException {
            if (ended) {
                return -1;
            }
            if (length == 0) {
                return 0;
            }
            if (position == limit && !fill()) {
                ended = true;
                return -1;
            }
            int end = Math.min(limit, position + length);
            int stop = position;
            while (stop < end && buffer[stop] != '\n') {
                stop++;
            }
            int count = stop - position;
            System.arraycopy(buffer, position, target, offset, count);
            position = stop;
            if (stop < limit && buffer[stop] == '\n') {
                position++;
                newlines++;
                ended = true;
            }
            return count == 0 && ended ? -1 : count;
        }

        @Override
        public void close() {
            // the line belongs to the file; the file is closed by its owner
        }

        void drain() throws IOException {
            byte[] skip = new byte[4096];
            while (read(skip, 0, skip.length) >= 0) {
                // discard the rest of the line
            }
        }
    }
}
