package org.qfleet.stream;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.StreamWriteFeature;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.time.OffsetDateTime;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.qfleet.drift.Measurement;

/**
 * JSON of the drift stages' internal records (state store values, repartitioned measurements and
 * station inputs), written from the drift records by Jackson's record support, and the reading of
 * a result message into a {@link Measurement}. Internal: only this service reads it. Thread-safe.
 */
final class DriftJson {

    /**
     * Numbers are written and read with Jackson's fast shortest-representation writer and fast
     * parser (the state records are mostly doubles); both round-trip every double exactly.
     */
    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
            .enable(StreamReadFeature.USE_FAST_DOUBLE_PARSER)
            .enable(StreamWriteFeature.USE_FAST_DOUBLE_WRITER)
            .build();

    private DriftJson() {
    }

    static byte[] write(Object value) {
        try {
            return MAPPER.writeValueAsBytes(value);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write drift state as JSON", e);
        }
    }

    static <T> T read(byte[] bytes, Class<T> type) {
        if (bytes == null) {
            return null;
        }
        try {
            return MAPPER.readValue(bytes, type);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read drift state of type " + type.getSimpleName(), e);
        }
    }

    /**
     * The drift view of a result message, or empty when it lacks what drift needs (product, lot,
     * station, unit, a measuredAt in RFC 3339). The coupling level is the insertion loss (minus
     * {@code resonanceDb}) of transmission results. Reads the message with the streaming parser
     * and keeps only these fields: the rest of the result is skipped, not built into a tree.
     */
    static Optional<Measurement> measurement(byte[] result) {
        ResultFields r = new ResultFields();
        try (JsonParser parser = MAPPER.getFactory().createParser(result)) {
            if (parser.nextToken() != JsonToken.START_OBJECT) {
                return Optional.empty();
            }
            JsonToken token;
            while ((token = parser.nextToken()) == JsonToken.FIELD_NAME) {
                String name = parser.currentName();
                parser.nextToken();
                r.read(name, parser);
            }
            if (token != JsonToken.END_OBJECT) {
                return Optional.empty();
            }
        } catch (IOException | RuntimeException e) {
            return Optional.empty();
        }
        if (r.product == null || r.lot == null || r.station == null || r.unit == null || r.measuredAt == null) {
            return Optional.empty();
        }
        long at;
        try {
            at = OffsetDateTime.parse(r.measuredAt).toInstant().toEpochMilli();
        } catch (DateTimeParseException e) {
            return Optional.empty();
        }
        double level = "transmission".equals(r.topology) ? -r.resonanceDb : Double.NaN;
        return Optional.of(new Measurement(r.product, r.lot, r.station, r.unit, at, r.qUnloaded, r.f0Hz, level, r.flags));
    }

    /** The fields of a result message that drift uses; a text field that is blank or not a string counts as absent. */
    private static final class ResultFields {
        String product;
        String lot;
        String station;
        String unit;
        String measuredAt;
        String topology;
        double qUnloaded = Double.NaN;
        double f0Hz = Double.NaN;
        double resonanceDb = Double.NaN;
        List<String> flags = List.of();

        void read(String name, JsonParser parser) throws IOException {
            switch (name) {
                case "product" -> product = text(parser);
                case "lot" -> lot = text(parser);
                case "stationId" -> station = text(parser);
                case "unit" -> unit = text(parser);
                case "measuredAt" -> measuredAt = text(parser);
                case "topology" -> topology = text(parser);
                case "qUnloaded" -> qUnloaded = number(parser);
                case "f0Hz" -> f0Hz = number(parser);
                case "resonanceDb" -> resonanceDb = number(parser);
                case "flags" -> flags = strings(parser);
                default -> parser.skipChildren();
            }
        }

        private static String text(JsonParser parser) throws IOException {
            if (parser.currentToken() != JsonToken.VALUE_STRING) {
                parser.skipChildren();
                return null;
            }
            String text = parser.getText();
            return text.isBlank() ? null : text;
        }

        private static double number(JsonParser parser) throws IOException {
            if (!parser.currentToken().isNumeric()) {
                parser.skipChildren();
                return Double.NaN;
            }
            return parser.getDoubleValue();
        }

        private static List<String> strings(JsonParser parser) throws IOException {
            if (parser.currentToken() != JsonToken.START_ARRAY) {
                parser.skipChildren();
                return List.of();
            }
            List<String> values = new ArrayList<>();
            JsonToken token;
            while ((token = parser.nextToken()) != JsonToken.END_ARRAY) {
                if (token.isStructStart()) {
                    parser.skipChildren();
                    values.add("");
                } else {
                    values.add(parser.getText());
                }
            }
            return values;
        }
    }
}
