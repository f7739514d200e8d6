package org.qfleet.stream;

import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
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

    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
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
     * station, unit, a measuredAt in RFC 3339). The
     * coupling level is the insertion loss (minus {@code resonanceDb}) of transmission results.
     */
    static Optional<Measurement> measurement(byte[] result) {
        JsonNode r;
        try {
            r = MAPPER.readTree(result);
        } catch (IOException | RuntimeException e) {
            return Optional.empty();
        }
        if (r == null || !r.isObject()) {
            return Optional.empty();
        }
        String product = text(r, "product");
        String lot = text(r, "lot");
        String station = text(r, "stationId");
        String unit = text(r, "unit");
        String measuredAt = text(r, "measuredAt");
        if (product == null || lot == null || station == null || unit == null || measuredAt == null) {
            return Optional.empty();
        }
        long at;
        try {
            at = OffsetDateTime.parse(measuredAt).toInstant().toEpochMilli();
        } catch (DateTimeParseException e) {
            return Optional.empty();
        }
        List<String> flags = new ArrayList<>();
        r.path("flags").forEach(f -> flags.add(f.asText()));
        double level = "transmission".equals(text(r, "topology")) ? -number(r, "resonanceDb") : Double.NaN;
        return Optional.of(new Measurement(product, lot, station, unit, at, number(r, "qUnloaded"), number(r, "f0Hz"), level, flags));
    }

    private static String text(JsonNode r, String field) {
        JsonNode n = r.get(field);
        return n != null && n.isTextual() && !n.asText().isBlank() ? n.asText() : null;
    }

    private static double number(JsonNode r, String field) {
        JsonNode n = r.get(field);
        return n != null && n.isNumber() ? n.asDouble() : Double.NaN;
    }
}
