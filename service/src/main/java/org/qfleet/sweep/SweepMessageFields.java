package org.qfleet.sweep;

import java.time.OffsetDateTime;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The known fields of one sweep message as a reader finds them, and the checked sweep they make.
 * Both readers of messages ({@link SweepMessageParser} on Jackson's streaming parser and the
 * byte-level {@link SweepBytesReader}) fill one, so each value is checked by the same rules, and the
 * required fields, the lengths and {@link SweepValidator} are applied in one place.
 */
final class SweepMessageFields {

    private final Set<SweepField> seen = EnumSet.noneOf(SweepField.class);
    private final Map<SParameter, Trace> traces = new EnumMap<>(SParameter.class);
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

    /** Notes that the field was found; false when it was found before (a duplicate). */
    boolean firstTime(SweepField field) {
        return seen.add(field);
    }

    /** The message's sweepId, once it has been read. */
    String sweepId() {
        return sweepId;
    }

    /**
     * Sets a string field: the identifying fields must not be blank, the timestamp must be an RFC 3339
     * date-time with offset, the topology one we know.
     */
    void text(SweepField field, String text) throws InvalidSweepException {
        switch (field) {
            case SWEEP_ID -> sweepId = required(field, text);
            case STATION_ID -> stationId = required(field, text);
            case PRODUCT -> product = required(field, text);
            case LOT -> lot = required(field, text);
            case UNIT -> unit = required(field, text);
            case MEASURED_AT -> measuredAt = timestamp(field, text);
            case TOPOLOGY -> topology = topology(text);
            case FIXTURE_ID -> fixtureId = text;
            default -> throw new IllegalArgumentException(field + " is not a string field");
        }
    }

    /** Sets a number field (the temperature). */
    void number(SweepField field, double value) {
        require(field, SweepField.Kind.NUMBER);
        temperatureC = value;
    }

    /** Sets an array field (the frequencies). */
    void numbers(SweepField field, double[] values) {
        require(field, SweepField.Kind.NUMBERS);
        frequencyHz = values;
    }

    void trace(SweepField field, Trace trace) {
        require(field, SweepField.Kind.TRACE);
        traces.put(field.parameter(), trace);
    }

    /** The sweep, once every field was read: checks the required fields and lengths, then validates. */
    Sweep build(String source, SweepLimits limits) throws InvalidSweepException {
        List<String> missing = new ArrayList<>();
        for (SweepField field : SweepField.REQUIRED) {
            if (!seen.contains(field)) {
                missing.add(field.wireName());
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

    private static void require(SweepField field, SweepField.Kind kind) {
        if (field.kind() != kind) {
            throw new IllegalArgumentException(field + " is not a field of kind " + kind);
        }
    }

    private static String required(SweepField field, String text) throws InvalidSweepException {
        if (text.isBlank()) {
            throw new InvalidSweepException(SweepError.MISSING_FIELD, "field " + field.wireName() + " is empty");
        }
        return text;
    }

    private static String timestamp(SweepField field, String text) throws InvalidSweepException {
        try {
            OffsetDateTime.parse(text, DateTimeFormatter.ISO_OFFSET_DATE_TIME);
        } catch (DateTimeParseException e) {
            throw new InvalidSweepException(SweepError.WRONG_TYPE, "field " + field.wireName()
                    + " must be an RFC 3339 date-time with offset, such as 2024-05-17T09:30:00Z; found '"
                    + JsonValues.shorten(text) + "'");
        }
        return text;
    }

    private static Topology topology(String text) throws InvalidSweepException {
        return Topology.fromWireName(text).orElseThrow(() -> new InvalidSweepException(SweepError.UNKNOWN_TOPOLOGY,
                "unknown topology '" + JsonValues.shorten(text) + "'; expected transmission, notch or reflection"));
    }
}
