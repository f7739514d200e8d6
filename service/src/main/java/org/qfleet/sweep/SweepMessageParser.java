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
 * call): each known field as it comes, unknown fields skipped unread, then the whole checked.
 */
final class SweepMessageParser {

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
    private final JsonValues values;
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
        this.values = new JsonValues(parser, limits.maxPoints());
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
        return build();
    }

    private void field(String name) throws IOException, InvalidSweepException {
        Field field = Field.of(name);
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
        if (!seen.add(field)) {
            throw JsonValues.duplicate(name);
        }
        switch (field) {
            case SWEEP_ID -> sweepId = requiredText(name);
            case STATION_ID -> stationId = requiredText(name);
            case PRODUCT -> product = requiredText(name);
            case LOT -> lot = requiredText(name);
            case UNIT -> unit = requiredText(name);
            case MEASURED_AT -> measuredAt = timestamp(name);
            case TOPOLOGY -> topology = topology(name);
            case FREQUENCY_HZ -> frequencyHz = values.numbers(name, null);
            case S11 -> traces.put(SParameter.S11, trace(name));
            case S21 -> traces.put(SParameter.S21, trace(name));
            case S12 -> traces.put(SParameter.S12, trace(name));
            case S22 -> traces.put(SParameter.S22, trace(name));
            case TEMPERATURE_C -> temperatureC = values.number(name);
            case FIXTURE_ID -> fixtureId = values.text(name);
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
            throw values.wrongType(name, "an object such as {\"re\":[..],\"im\":[..]}");
        }
        TraceFields fields = new TraceFields(name);
        while (values.next() == JsonToken.FIELD_NAME) {
            String keyName = parser.currentName();
            TraceFields.Key key = TraceFields.Key.of(keyName);
            if (key == null) {
                throw new InvalidSweepException(SweepError.UNKNOWN_TRACE_FORM, "'" + name + "' has an unknown key '"
                        + JsonValues.shorten(keyName) + "'; expected " + TraceFields.FORMS);
            }
            if (fields.has(key)) {
                throw JsonValues.duplicate(name + "." + keyName);
            }
            values.next();
            fields.put(key, values.numbers(name, keyName));
        }
        return fields.toTrace();
    }

    private String requiredText(String name) throws IOException, InvalidSweepException {
        String text = values.text(name);
        if (text.isBlank()) {
            throw new InvalidSweepException(SweepError.MISSING_FIELD, "field " + name + " is empty");
        }
        return text;
    }

    private String timestamp(String name) throws IOException, InvalidSweepException {
        String text = values.text(name);
        try {
            OffsetDateTime.parse(text, DateTimeFormatter.ISO_OFFSET_DATE_TIME);
        } catch (DateTimeParseException e) {
            throw new InvalidSweepException(SweepError.WRONG_TYPE, "field " + name + " must be an RFC 3339 date-time"
                    + " with offset, such as 2024-05-17T09:30:00Z; found '" + JsonValues.shorten(text) + "'");
        }
        return text;
    }

    private Topology topology(String name) throws IOException, InvalidSweepException {
        String text = values.text(name);
        return Topology.fromWireName(text).orElseThrow(() -> new InvalidSweepException(SweepError.UNKNOWN_TOPOLOGY,
                "unknown topology '" + JsonValues.shorten(text) + "'; expected transmission, notch or reflection"));
    }
}
