package org.qfleet.stream;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.json.JsonWriteFeature;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import org.qfleet.codec.ResultJson;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.Sweep;
import org.qfleet.verdict.Verdict;
import org.qfleet.verdict.VerdictReason;

/**
 * Writes result messages ({@code schemas/result-message.schema.json}): every field of the
 * command line's result line, under the same names, plus the verdict against the product's
 * limits. UTF-8 bytes, ASCII in practice. Thread-safe.
 */
public final class ResultMessageJson {

    private final JsonFactory factory = JsonFactory.builder().enable(JsonWriteFeature.ESCAPE_NON_ASCII).build();

    public byte[] write(Sweep sweep, ResonanceResult result, Verdict verdict) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(1024);
        try (JsonGenerator g = factory.createGenerator(out)) {
            g.writeStartObject();
            ResultJson.writeResultFields(g, sweep, result);
            g.writeObjectFieldStart("verdict");
            g.writeStringField("status", verdict.status().code());
            g.writeArrayFieldStart("reasons");
            for (VerdictReason reason : verdict.reasons()) {
                g.writeString(reason.code());
            }
            g.writeEndArray();
            g.writeEndObject();
            g.writeEndObject();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write JSON to memory", e);
        }
        return out.toByteArray();
    }
}
