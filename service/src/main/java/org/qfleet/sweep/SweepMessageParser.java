package org.qfleet.sweep;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.time.OffsetDateTime;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Reads one sweep message from a streaming JSON parser (the state of one {@link SweepJsonReader}
 * call). Arrays go straight into bounded primitive buffers; unknown fields are skipped unread.
 */
final class SweepMessageParser {

    private static final int MAX_SHOWN = 40;

    /** The fields the reader knows; the others are skipped. */
    private enum Field {
        SWEEP_ID("sweepId"), STATION_ID("stationId"), PRODUCT("product"), LOT("lot"), UNIT("unit"),
        MEASURED_AT("measuredAt"), TOPOLOGY("topology"), FREQUENCY_HZ("frequencyHz"),
        S11("s11"), S21("s21"), S12("s12"), S22("s22"), TEMPERATURE_C("temperatureC"), FIXTURE_ID("fixtureId");

        private static final Field[] ALL = values();
        private static final Set<Field> REQUIRED = EnumSet.range(SWEEP_ID, FREQUENCY_HZ);

        final String wireName;

        Field(String wireName) {
            this.wireName = wireName;
        }

        static Field of(String name) {
            for (Field field : ALL) {
                if (field.wireName.equals(name)) {
                    return field;
                }
            }
            return null;
        }
    }

    private final JsonParser parser;
    private final SweepLimits limits;
    private final String source;
    private final Set<Field> seen = EnumSet.noneOf(Field.class);
    private final Map<SParameter, Trace> traces = new EnumMap<>(SParameter.class);
    private Set<String> otherFields;
    private String sweepId;
    private String stationId;
    private String product;
    private String lot;
    private String unit;
    private String measuredAt;
    private String fixtureId;
    private Double temperatureC;
    private Topology topology;
    private double[] frequencyHz;

    SweepMessageParser(String source, JsonParser parser, SweepLimits limits) {
        this.source = source;
        this.parser = parser;
        this.limits = limits;
    }

    /** The message's sweepId, once it has been read. */
    String sweepId() {
        return sweepId;
    }

    Sweep parse() throws IOException, InvalidSweepException {
        JsonToken token = parser.nextToken();
        if (token == null) {
            throw new InvalidSweepException(SweepError.INVALID_JSON, "invalid JSON: the input is empty");
        }
        if (token != JsonToken.START_OBJECT) {
            throw new InvalidSweepException(SweepError.WRONG_TYPE,
                    "a sweep message must be a JSON object, found " + describe(token));
        }
        while ((token = parser.nextToken()) == JsonToken.FIELD_NAME) {
            String name = parser.currentName();
            value();
            field(name);
        }
        if (token != JsonToken.END_OBJECT) {
            throw endOfInput();
        }
        if (parser.nextToken() != null) {
            throw new InvalidSweepException(SweepError.INVALID_JSON,
                    "invalid JSON: more content after the end of the sweep object");
        }
        return build();
    }

    private void field(String name) throws IOException, InvalidSweepException {
        Field field = Field.of(name);
        if (field == null) {
            if (otherFields == null) {
                otherFields = new HashSet<>();
            }
            if (!otherFields.add(name)) {
                throw duplicate(name);
            }
            parser.skipChildren();
            return;
        }
        if (!seen.add(field)) {
            throw duplicate(name);
        }
        switch (field) {
            case SWEEP_ID -> sweepId = requiredText(name);
            case STATION_ID -> stationId = requiredText(name);
            case PRODUCT -> product = requiredText(name);
            case LOT -> lot = requiredText(name);
            case UNIT -> unit = requiredText(name);
            case MEASURED_AT -> measuredAt = timestamp(name);
            case TOPOLOGY -> topology = topology(name);
            case FREQUENCY_HZ -> frequencyHz = numbers(name, null);
            case S11 -> traces.put(SParameter.S11, trace(name));
            case S21 -> traces.put(SParameter.S21, trace(name));
            case S12 -> traces.put(SParameter.S12, trace(name));
            case S22 -> traces.put(SParameter.S22, trace(name));
            case TEMPERATURE_C -> temperatureC = number(name);
            case FIXTURE_ID -> fixtureId = text(name);
        }
    }

    private Sweep build() throws InvalidSweepException {
        List<String> missing = new ArrayList<>();
        for (Field field : Field.REQUIRED) {
            if (!seen.contains(field)) {
                missing.add(field.wireName);
            }
        }
        if (!missing.isEmpty()) {
            throw new InvalidSweepException(SweepError.MISSING_FIELD,
                    (missing.size() == 1 ? "missing field " : "missing fields ") + String.join(", ", missing));
        }
        SParameter needed = SweepValidator.requiredParameter(topology);
        if (!traces.containsKey(needed)) {
            throw new InvalidSweepException(SweepError.MISSING_FIELD,
                    "missing field " + needed.wireName() + " (required for topology " + topology.wireName() + ")");
        }
        for (Map.Entry<SParameter, Trace> entry : traces.entrySet()) {
            if (entry.getValue().size() != frequencyHz.length) {
                throw new InvalidSweepException(SweepError.LENGTH_MISMATCH, entry.getKey().wireName() + " has "
                        + entry.getValue().size() + " values but frequencyHz has " + frequencyHz.length);
            }
        }
        SweepInfo info = new SweepInfo(sweepId, stationId, product, lot, unit, measuredAt, fixtureId, temperatureC);
        Sweep sweep = new Sweep(source, info, topology, frequencyHz, traces, 50.0);
        SweepValidator.validate(sweep, limits);
        return sweep;
    }

    private Trace trace(String name) throws IOException, InvalidSweepException {
        if (parser.currentToken() != JsonToken.START_OBJECT) {
            throw wrongType(name, "an object such as {\"re\":[..],\"im\":[..]}");
        }
        TraceFields fields = new TraceFields(name);
        JsonToken token;
        while ((token = parser.nextToken()) == JsonToken.FIELD_NAME) {
            String keyName = parser.currentName();
            TraceFields.Key key = TraceFields.Key.of(keyName);
            if (key == null) {
                throw new InvalidSweepException(SweepError.UNKNOWN_TRACE_FORM, "'" + name + "' has an unknown key '"
                        + shorten(keyName) + "'; expected " + TraceFields.FORMS);
            }
            if (fields.has(key)) {
                throw duplicate(name + "." + keyName);
            }
            value();
            fields.put(key, numbers(name, keyName));
        }
        if (token != JsonToken.END_OBJECT) {
            throw endOfInput();
        }
        return fields.toTrace();
    }

    /** Reads an array of finite numbers into a bounded buffer, failing as soon as it grows past maxPoints. */
    private double[] numbers(String name, String key) throws IOException, InvalidSweepException {
        if (parser.currentToken() != JsonToken.START_ARRAY) {
            throw wrongType(label(name, key), "an array of numbers");
        }
        DoubleBuffer buffer = new DoubleBuffer(limits.maxPoints());
        JsonToken token;
        while ((token = parser.nextToken()) != JsonToken.END_ARRAY) {
            if (token != JsonToken.VALUE_NUMBER_FLOAT && token != JsonToken.VALUE_NUMBER_INT) {
                if (token == null) {
                    throw endOfInput();
                }
                throw wrongType(label(name, key) + "[" + buffer.size() + "]", "a number");
            }
            double value = parser.getDoubleValue();
            if (!Double.isFinite(value)) {
                throw new InvalidSweepException(SweepError.NON_FINITE, label(name, key) + "[" + buffer.size()
                        + "] is not a finite number (" + shorten(parser.getText()) + ")");
            }
            if (!buffer.add(value)) {
                throw new InvalidSweepException(SweepError.TOO_MANY_POINTS,
                        label(name, key) + " has more than " + limits.maxPoints() + " values");
            }
        }
        if (buffer.size() == 0) {
            throw new InvalidSweepException(SweepError.EMPTY_ARRAY, label(name, key) + " is empty");
        }
        return buffer.toArray();
    }

    private double number(String name) throws IOException, InvalidSweepException {
        JsonToken token = parser.currentToken();
        if (token != JsonToken.VALUE_NUMBER_FLOAT && token != JsonToken.VALUE_NUMBER_INT) {
            throw wrongType(name, "a number");
        }
        double value = parser.getDoubleValue();
        if (!Double.isFinite(value)) {
            throw new InvalidSweepException(SweepError.NON_FINITE,
                    name + " is not a finite number (" + shorten(parser.getText()) + ")");
        }
        return value;
    }

    private String text(String name) throws IOException, InvalidSweepException {
        if (parser.currentToken() != JsonToken.VALUE_STRING) {
            throw wrongType(name, "a string");
        }
        return parser.getText();
    }

    private String requiredText(String name) throws IOException, InvalidSweepException {
        String text = text(name);
        if (text.isBlank()) {
            throw new InvalidSweepException(SweepError.MISSING_FIELD, "field " + name + " is empty");
        }
        return text;
    }

    private String timestamp(String name) throws IOException, InvalidSweepException {
        String text = text(name);
        try {
            OffsetDateTime.parse(text, DateTimeFormatter.ISO_OFFSET_DATE_TIME);
        } catch (DateTimeParseException e) {
            throw new InvalidSweepException(SweepError.WRONG_TYPE, "field " + name + " must be an RFC 3339 date-time"
                    + " with offset, such as 2024-05-17T09:30:00Z; found '" + shorten(text) + "'");
        }
        return text;
    }

    private Topology topology(String name) throws IOException, InvalidSweepException {
        String text = text(name);
        return Topology.fromWireName(text).orElseThrow(() -> new InvalidSweepException(SweepError.UNKNOWN_TOPOLOGY,
                "unknown topology '" + shorten(text) + "'; expected transmission, notch or reflection"));
    }

    /** Moves to the value of the field just read. */
    private void value() throws IOException, InvalidSweepException {
        if (parser.nextToken() == null) {
            throw endOfInput();
        }
    }

    private InvalidSweepException wrongType(String what, String expected) {
        return new InvalidSweepException(SweepError.WRONG_TYPE,
                "field " + what + " must be " + expected + ", found " + describe(parser.currentToken()));
    }

    private static InvalidSweepException duplicate(String name) {
        return new InvalidSweepException(SweepError.INVALID_JSON, "invalid JSON: duplicate field " + shorten(name));
    }

    private static InvalidSweepException endOfInput() {
        return new InvalidSweepException(SweepError.INVALID_JSON, "invalid JSON: unexpected end of input");
    }

    private static String label(String name, String key) {
        return key == null ? name : name + "." + key;
    }

    static String shorten(String text) {
        return text.length() <= MAX_SHOWN ? text : text.substring(0, MAX_SHOWN) + "...";
    }

    private static String describe(JsonToken token) {
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
}
