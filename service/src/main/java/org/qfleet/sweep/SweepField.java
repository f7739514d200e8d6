package org.qfleet.sweep;

import java.util.EnumSet;
import java.util.Set;

/** The fields of a sweep message that the readers know (they skip the others), and what each holds. */
enum SweepField {
    SWEEP_ID("sweepId", Kind.TEXT),
    STATION_ID("stationId", Kind.TEXT),
    PRODUCT("product", Kind.TEXT),
    LOT("lot", Kind.TEXT),
    UNIT("unit", Kind.TEXT),
    MEASURED_AT("measuredAt", Kind.TEXT),
    TOPOLOGY("topology", Kind.TEXT),
    FREQUENCY_HZ("frequencyHz", Kind.NUMBERS),
    S11("s11", Kind.TRACE),
    S21("s21", Kind.TRACE),
    S12("s12", Kind.TRACE),
    S22("s22", Kind.TRACE),
    TEMPERATURE_C("temperatureC", Kind.NUMBER),
    FIXTURE_ID("fixtureId", Kind.TEXT);

    /** The JSON type of a field's value. */
    enum Kind {
        /** A string. */
        TEXT,
        /** A finite number. */
        NUMBER,
        /** A non-empty array of finite numbers. */
        NUMBERS,
        /** A trace object, such as {@code {"re":[..],"im":[..]}}. */
        TRACE
    }

    static final Set<SweepField> REQUIRED = EnumSet.range(SWEEP_ID, FREQUENCY_HZ);

    private static final SweepField[] ALL = values();

    private final String wireName;
    private final Kind kind;

    SweepField(String wireName, Kind kind) {
        this.wireName = wireName;
        this.kind = kind;
    }

    String wireName() {
        return wireName;
    }

    Kind kind() {
        return kind;
    }

    /** The S-parameter of a trace field. */
    SParameter parameter() {
        return SParameter.valueOf(name());
    }

    /** The field with this wire name, or null for a field the readers do not know. */
    static SweepField of(String name) {
        for (SweepField field : ALL) {
            if (field.wireName.equals(name)) {
                return field;
            }
        }
        return null;
    }
}
