package org.qfleet.sweep;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.util.HashSet;
import java.util.Set;

/**
 * Reads one sweep message from a streaming JSON parser (the state of one {@link SweepJsonReader}
 * call) into {@link SweepMessageFields}: each known field as it comes, unknown fields skipped unread.
 */
final class SweepMessageParser {

    private final JsonParser parser;
    private final JsonValues values;
    private final SweepMessageFields fields;
    private Set<String> otherFields;

    SweepMessageParser(JsonParser parser, SweepMessageFields fields, int maxPoints) {
        this.parser = parser;
        this.values = new JsonValues(parser, maxPoints);
        this.fields = fields;
    }

    /** Reads the whole message into the fields; the caller then builds the sweep from them. */
    void parse() throws IOException, InvalidSweepException {
        JsonToken token = parser.nextToken();
        if (token == null) {
            throw new InvalidSweepException(SweepError.INVALID_JSON, "invalid JSON: the input is empty");
        }
        if (token != JsonToken.START_OBJECT) {
            throw new InvalidSweepException(SweepError.WRONG_TYPE,
                    "a sweep message must be a JSON object, found " + JsonValues.describe(token));
        }
        while ((token = values.next()) == JsonToken.FIELD_NAME) {
            String name = parser.currentName();
            values.next();
            field(name);
        }
        if (parser.nextToken() != null) {
            throw new InvalidSweepException(SweepError.INVALID_JSON,
                    "invalid JSON: more content after the end of the sweep object");
        }
    }

    private void field(String name) throws IOException, InvalidSweepException {
        SweepField field = SweepField.of(name);
        if (field == null) {
            if (otherFields == null) {
                otherFields = new HashSet<>();
            }
            if (!otherFields.add(name)) {
                throw JsonValues.duplicate(name);
            }
            parser.skipChildren();
            return;
        }
        if (!fields.firstTime(field)) {
            throw JsonValues.duplicate(name);
        }
        switch (field.kind()) {
            case TEXT -> fields.text(field, values.text(name));
            case NUMBER -> fields.number(field, values.number(name));
            case NUMBERS -> fields.numbers(field, values.numbers(name, null));
            case TRACE -> fields.trace(field, trace(name));
        }
    }

    private Trace trace(String name) throws IOException, InvalidSweepException {
        if (parser.currentToken() != JsonToken.START_OBJECT) {
            throw values.wrongType(name, "an object such as {\"re\":[..],\"im\":[..]}");
        }
        TraceFields trace = new TraceFields(name);
        while (values.next() == JsonToken.FIELD_NAME) {
            String keyName = parser.currentName();
            TraceFields.Key key = TraceFields.Key.of(keyName);
            if (key == null) {
                throw new InvalidSweepException(SweepError.UNKNOWN_TRACE_FORM, "'" + name + "' has an unknown key '"
                        + JsonValues.shorten(keyName) + "'; expected " + TraceFields.FORMS);
            }
            if (trace.has(key)) {
                throw JsonValues.duplicate(name + "." + keyName);
            }
            values.next();
            trace.put(key, values.numbers(name, keyName));
        }
        return trace.toTrace();
    }
}
