package org.qfleet.sweep;

import java.nio.charset.StandardCharsets;
import java.util.HashSet;
import java.util.Set;

/**
 * The fast path of {@link SweepJsonReader} for messages given as bytes: reads a sweep message in one
 * pass over its bytes into {@link SweepMessageFields}, converting numbers straight from the bytes
 * with {@link DecimalParser}, without a general JSON parser.
 *
 * <p>It reads a strict, simple subset only: one object with nothing but JSON whitespace around it,
 * field names and string values of printable ASCII without escapes, numbers in RFC 8259's grammar,
 * every known field with its expected type and a trace form {@link TraceFields} accepts, and unknown
 * fields whose values are JSON in printable ASCII (escapes allowed there), nested at most
 * {@value #MAX_DEPTH} deep. On anything else,
 * valid or not (escapes, other bytes, a byte-order mark or another encoding, a duplicate field, a
 * wrong type, a value its field refuses, an empty array, a non-finite number, more than the allowed
 * points, content after the object, ...), it gives up and returns null, having built nothing but the
 * arrays read so far, and the full parser reads the message: results and error messages are then
 * the full parser's own. What it does return is exactly what the full parser would have read.
 */
final class SweepBytesReader {

    private static final int MAX_DEPTH = 32;
    /** Far below the full parser's limits on names, strings and numbers, which are then its to report. */
    private static final int MAX_STRING_BYTES = 10_000;
    private static final int MAX_NUMBER_BYTES = 100;
    private static final GiveUp GIVE_UP = new GiveUp();

    private final byte[] json;
    private final int maxPoints;
    private final DecimalParser decimal = new DecimalParser();
    private final SweepMessageFields fields = new SweepMessageFields();
    private Set<String> otherFields;
    private int at;
    /** Length of the last array read: the arrays after the first are filled without growing. */
    private int lastLength;

    private SweepBytesReader(byte[] json, int maxPoints) {
        this.json = json;
        this.maxPoints = maxPoints;
    }

    /** The message's fields, or null when the message is not in the subset read here. */
    static SweepMessageFields read(byte[] json, int maxPoints) {
        SweepBytesReader reader = new SweepBytesReader(json, maxPoints);
        try {
            reader.message();
            return reader.fields;
        } catch (GiveUp | InvalidSweepException e) {
            return null;
        }
    }

    private void message() throws InvalidSweepException {
        expect('{');
        if (!next('}')) {
            do {
                field();
            } while (next(','));
            expect('}');
        }
        skipWhitespace();
        if (at != json.length) {
            throw GIVE_UP;
        }
    }

    private void field() throws InvalidSweepException {
        String name = plainString();
        expect(':');
        SweepField field = SweepField.of(name);
        if (field == null) {
            other(name);
            return;
        }
        if (!fields.firstTime(field)) {
            throw GIVE_UP;
        }
        switch (field.kind()) {
            case TEXT -> fields.text(field, plainString());
            case NUMBER -> fields.number(field, number());
            case NUMBERS -> fields.numbers(field, numbers());
            case TRACE -> fields.trace(field, trace(name));
        }
    }

    private void other(String name) {
        if (otherFields == null) {
            otherFields = new HashSet<>();
        }
        if (!otherFields.add(name)) {
            throw GIVE_UP;
        }
        skipValue(1);
    }

    /** A trace object: known keys, each once, each with an array of numbers. */
    private Trace trace(String name) throws InvalidSweepException {
        expect('{');
        TraceFields trace = new TraceFields(name);
        if (!next('}')) {
            do {
                TraceFields.Key key = TraceFields.Key.of(plainString());
                expect(':');
                if (key == null || trace.has(key)) {
                    throw GIVE_UP;
                }
                trace.put(key, numbers());
            } while (next(','));
            expect('}');
        }
        return trace.toTrace();
    }

    /** A non-empty array of finite numbers, at most {@code maxPoints} of them. */
    private double[] numbers() {
        expect('[');
        DoubleBuffer buffer = lastLength > 0 ? new DoubleBuffer(maxPoints, lastLength) : new DoubleBuffer(maxPoints);
        do {
            if (!buffer.add(number())) {
                throw GIVE_UP;
            }
        } while (next(','));
        expect(']');
        lastLength = buffer.size();
        return buffer.toArray();
    }

    private double number() {
        double value = anyNumber();
        if (!Double.isFinite(value)) {
            throw GIVE_UP;
        }
        return value;
    }

    /** A JSON number's value, infinite when it overflows. */
    private double anyNumber() {
        skipWhitespace();
        double value = decimal.scanJson(json, at, json.length);
        if (value != value || decimal.stop() - at > MAX_NUMBER_BYTES) {
            throw GIVE_UP;
        }
        at = decimal.stop();
        return value;
    }

    /** A string of printable ASCII characters without escapes. */
    private String plainString() {
        expect('"');
        int start = at;
        int end = Math.min(json.length, start + MAX_STRING_BYTES);
        while (at < end && json[at] >= ' ' && json[at] <= '~' && json[at] != '"' && json[at] != '\\') {
            at++;
        }
        if (at == end || json[at] != '"') {
            throw GIVE_UP;
        }
        return new String(json, start, at++ - start, StandardCharsets.ISO_8859_1);
    }

    /** The value of an unknown field, checked as JSON and dropped. */
    private void skipValue(int depth) {
        skipWhitespace();
        if (at == json.length) {
            throw GIVE_UP;
        }
        switch (json[at]) {
            case '{' -> skipObject(depth + 1);
            case '[' -> skipArray(depth + 1);
            case '"' -> skipString();
            case 't' -> literal("true");
            case 'f' -> literal("false");
            case 'n' -> literal("null");
            default -> anyNumber();
        }
    }

    private void skipObject(int depth) {
        checkDepth(depth);
        expect('{');
        if (!next('}')) {
            do {
                skipString();
                expect(':');
                skipValue(depth);
            } while (next(','));
            expect('}');
        }
    }

    private void skipArray(int depth) {
        checkDepth(depth);
        expect('[');
        if (!next(']')) {
            do {
                skipValue(depth);
            } while (next(','));
            expect(']');
        }
    }

    /** A string of printable ASCII characters, where the escapes of RFC 8259 (section 7) are allowed. */
    private void skipString() {
        expect('"');
        int end = Math.min(json.length, at + MAX_STRING_BYTES);
        while (at < end) {
            byte b = json[at++];
            if (b == '"') {
                return;
            }
            if (b < ' ' || b > '~') {
                throw GIVE_UP;
            }
            if (b == '\\') {
                skipEscape();
            }
        }
        throw GIVE_UP;
    }

    private void skipEscape() {
        byte b = at < json.length ? json[at++] : 0;
        if (b == 'u') {
            for (int k = 0; k < 4; k++) {
                if (at == json.length || Character.digit(json[at++], 16) < 0) {
                    throw GIVE_UP;
                }
            }
        } else if ("\"\\/bfnrt".indexOf(b) < 0) {
            throw GIVE_UP;
        }
    }

    private void literal(String word) {
        for (int k = 0; k < word.length(); k++) {
            if (at == json.length || json[at++] != word.charAt(k)) {
                throw GIVE_UP;
            }
        }
    }

    private static void checkDepth(int depth) {
        if (depth > MAX_DEPTH) {
            throw GIVE_UP;
        }
    }

    /** Skips whitespace; consumes {@code c} and returns true when it comes next. */
    private boolean next(char c) {
        skipWhitespace();
        if (at < json.length && json[at] == c) {
            at++;
            return true;
        }
        return false;
    }

    private void expect(char c) {
        if (!next(c)) {
            throw GIVE_UP;
        }
    }

    /** Skips the four whitespace characters of JSON (RFC 8259, section 2). */
    private void skipWhitespace() {
        while (at < json.length && (json[at] == ' ' || json[at] == '\n' || json[at] == '\r' || json[at] == '\t')) {
            at++;
        }
    }

    /** Thrown, without a stack trace, to leave the message to the full parser. */
    private static final class GiveUp extends RuntimeException {
        private static final long serialVersionUID = 1L;

        GiveUp() {
            super("outside the subset the fast path reads", null, false, false);
        }
    }
}
