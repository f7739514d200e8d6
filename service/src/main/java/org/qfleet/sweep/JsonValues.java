package org.qfleet.sweep;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;

/**
 * Reads typed values from a streaming JSON parser positioned on them: strings, finite numbers and
 * arrays of finite numbers (into bounded primitive buffers, refused as soon as they grow too long).
 */
final class JsonValues {

    private static final int MAX_SHOWN = 40;

    private final JsonParser parser;
    private final int maxPoints;
    /** Length of the last array read: every array of a sweep message has as many values as the first. */
    private int lastLength;

    JsonValues(JsonParser parser, int maxPoints) {
        this.parser = parser;
        this.maxPoints = maxPoints;
    }

    /** Moves to the next token, which must exist. */
    JsonToken next() throws IOException, InvalidSweepException {
        JsonToken token = parser.nextToken();
        if (token == null) {
            throw endOfInput();
        }
        return token;
    }

    /**
     * An array of finite numbers; {@code name.key} (or {@code name}) labels it in errors. The buffer
     * starts at the length of the previous array, so the arrays after the first are filled in
     * place, without growing or a final copy.
     */
    double[] numbers(String name, String key) throws IOException, InvalidSweepException {
        if (parser.currentToken() != JsonToken.START_ARRAY) {
            throw wrongType(label(name, key), "an array of numbers");
        }
        DoubleBuffer buffer = lastLength > 0 ? new DoubleBuffer(maxPoints, lastLength) : new DoubleBuffer(maxPoints);
        JsonToken token;
        while ((token = next()) != JsonToken.END_ARRAY) {
            if (token != JsonToken.VALUE_NUMBER_FLOAT && token != JsonToken.VALUE_NUMBER_INT) {
                throw wrongType(label(name, key) + "[" + buffer.size() + "]", "a number");
            }
            double value = tokenValue();
            if (!Double.isFinite(value)) {
                throw nonFinite(label(name, key) + "[" + buffer.size() + "]");
            }
            if (!buffer.add(value)) {
                throw new InvalidSweepException(SweepError.TOO_MANY_POINTS,
                        label(name, key) + " has more than " + maxPoints + " values");
            }
        }
        if (buffer.size() == 0) {
            throw new InvalidSweepException(SweepError.EMPTY_ARRAY, label(name, key) + " is empty");
        }
        lastLength = buffer.size();
        return buffer.toArray();
    }

    /**
     * The current number token's value, converted from the parser's own characters by
     * {@link DecimalParser} (exactly {@link Double#parseDouble}'s result, several times faster than
     * the parser's conversion, which took a fifth of the service's time).
     */
    private double tokenValue() throws IOException {
        int offset = parser.getTextOffset();
        return DecimalParser.parse(parser.getTextCharacters(), offset, offset + parser.getTextLength());
    }

    double number(String name) throws IOException, InvalidSweepException {
        JsonToken token = parser.currentToken();
        if (token != JsonToken.VALUE_NUMBER_FLOAT && token != JsonToken.VALUE_NUMBER_INT) {
            throw wrongType(name, "a number");
        }
        double value = tokenValue();
        if (!Double.isFinite(value)) {
            throw nonFinite(name);
        }
        return value;
    }

    String text(String name) throws IOException, InvalidSweepException {
        if (parser.currentToken() != JsonToken.VALUE_STRING) {
            throw wrongType(name, "a string");
        }
        return parser.getText();
    }

    InvalidSweepException wrongType(String what, String expected) {
        return new InvalidSweepException(SweepError.WRONG_TYPE,
                "field " + what + " must be " + expected + ", found " + describe(parser.currentToken()));
    }

    static InvalidSweepException endOfInput() {
        return new InvalidSweepException(SweepError.INVALID_JSON, "invalid JSON: unexpected end of input");
    }

    static InvalidSweepException duplicate(String name) {
        return new InvalidSweepException(SweepError.INVALID_JSON, "invalid JSON: duplicate field " + shorten(name));
    }

    /** The text, cut to a length fit for an error message. */
    static String shorten(String text) {
        return text.length() <= MAX_SHOWN ? text : text.substring(0, MAX_SHOWN) + "...";
    }

    static String describe(JsonToken token) {
        if (token == null) {
            return "the end of the input";
        }
        return switch (token) {
            case START_OBJECT -> "an object";
            case START_ARRAY -> "an array";
            case VALUE_STRING -> "a string";
            case VALUE_NUMBER_INT, VALUE_NUMBER_FLOAT -> "a number";
            case VALUE_TRUE, VALUE_FALSE -> "a boolean";
            case VALUE_NULL -> "null";
            default -> token.name();
        };
    }

    private InvalidSweepException nonFinite(String what) throws IOException {
        return new InvalidSweepException(SweepError.NON_FINITE,
                what + " is not a finite number (" + shorten(parser.getText()) + ")");
    }

    private static String label(String name, String key) {
        return key == null ? name : name + "." + key;
    }
}
