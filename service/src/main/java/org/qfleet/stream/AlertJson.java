package org.qfleet.stream;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.json.JsonWriteFeature;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.time.Instant;
import java.util.Map;
import java.util.TreeMap;
import org.qfleet.drift.Alert;
import org.qfleet.drift.Baseline;
import org.qfleet.drift.Breakdown;
import org.qfleet.drift.Rule;

/**
 * Writes alert messages ({@code schemas/alert.schema.json}). Numbers that are not finite are
 * written as null. Thread-safe.
 */
public final class AlertJson {

    private final JsonFactory factory = JsonFactory.builder().enable(JsonWriteFeature.ESCAPE_NON_ASCII).build();

    public byte[] write(Alert a) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(512);
        try (JsonGenerator g = factory.createGenerator(out)) {
            g.writeStartObject();
            g.writeStringField("key", a.key());
            g.writeStringField("kind", a.kind().code());
            g.writeStringField("product", a.product());
            g.writeStringField("subject", a.subject());
            g.writeNumberField("episode", a.episode());
            g.writeStringField("status", a.status().code());
            g.writeNumberField("revision", a.revision());
            g.writeStringField("severity", a.severity().code());
            g.writeArrayFieldStart("rules");
            for (Rule r : a.rules()) {
                g.writeString(r.code());
            }
            g.writeEndArray();
            if (a.clearedBy() == null) {
                g.writeNullField("clearedBy");
            } else {
                g.writeStringField("clearedBy", a.clearedBy());
            }
            g.writeStringField("eventTime", Instant.ofEpochMilli(a.eventTime()).toString());
            g.writeObjectFieldStart("figures");
            for (Map.Entry<String, Double> f : new TreeMap<>(a.figures()).entrySet()) {
                number(g, f.getKey(), f.getValue());
            }
            g.writeEndObject();
            g.writeArrayFieldStart("breakdown");
            for (Breakdown b : a.breakdown()) {
                g.writeStartObject();
                g.writeStringField("id", b.id());
                g.writeNumberField("n", b.n());
                number(g, "mean", b.mean());
                g.writeEndObject();
            }
            g.writeEndArray();
            writeBaseline(g, a.baseline());
            g.writeEndObject();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write JSON to memory", e);
        }
        return out.toByteArray();
    }

    private static void writeBaseline(JsonGenerator g, Baseline b) throws IOException {
        if (b == null) {
            g.writeNullField("baseline");
            return;
        }
        g.writeObjectFieldStart("baseline");
        g.writeStringField("origin", b.origin());
        g.writeNumberField("units", b.units());
        number(g, "qUnloadedMean", b.quMean());
        number(g, "qUnloadedSigma", b.quSigma());
        number(g, "f0MeanHz", b.f0MeanHz());
        number(g, "f0SigmaHz", b.f0SigmaHz());
        number(g, "insertionLossMeanDb", b.levelMeanDb());
        number(g, "insertionLossSigmaDb", b.levelSigmaDb());
        number(g, "lotLimit", b.lotLimit());
        g.writeEndObject();
    }

    private static void number(JsonGenerator g, String name, Double value) throws IOException {
        if (value != null && Double.isFinite(value)) {
            g.writeNumberField(name, value);
        } else {
            g.writeNullField(name);
        }
    }
}
