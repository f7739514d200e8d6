package org.qfleet.codec;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.json.JsonWriteFeature;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import org.qfleet.fit.QualityFlag;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepInfo;

/**
 * Writes fit results and input errors as compact JSON objects with Jackson's streaming generator
 * (no reflection). The field names are the published contract ({@code schemas/fit-result.schema.json}
 * and {@code schemas/fit-error.schema.json}).
 *
 * <p>Numbers that are not finite (a quantity that does not apply, or could not be determined) are
 * written as {@code null}, never as {@code NaN} or {@code Infinity} tokens, and every numeric field is
 * always present. Non-ASCII characters are escaped, so the output is plain ASCII whatever the console.
 * The {@code write...Fields} methods add fields to an object the caller has opened, so other writers
 * (the stream's result message) can reuse them and add their own. Instances are thread-safe.
 */
public final class ResultJson {

    private final JsonFactory factory;

    public ResultJson() {
        this.factory = JsonFactory.builder()
                .enable(JsonWriteFeature.ESCAPE_NON_ASCII)
                .build();
    }

    /** One result as a JSON object on a single line, without the line break. */
    public String resultLine(Sweep sweep, ResonanceResult result) {
        return write(g -> writeResultFields(g, sweep, result));
    }

    /**
     * One error as a JSON object on a single line, without the line break.
     *
     * @param source where the input came from
     * @param reason a clear, specific reason
     * @param code   stable reason code such as {@code not-ascending}, or null for none
     */
    public String errorLine(String source, String reason, String code) {
        return write(g -> writeErrorFields(g, source, reason, code));
    }

    /** Writes the result fields into an object the caller has started. */
    public static void writeResultFields(JsonGenerator g, Sweep sweep, ResonanceResult r) throws IOException {
        g.writeStringField("source", sweep.source());
        writeInfo(g, sweep.info());
        number(g, "f0Hz", r.f0Hz());
        number(g, "f0UncertaintyHz", r.f0UncertaintyHz());
        number(g, "qLoaded", r.qLoaded());
        number(g, "qLoadedUncertainty", r.qLoadedUncertainty());
        number(g, "qUnloaded", r.qUnloaded());
        number(g, "qUnloadedUncertainty", r.qUnloadedUncertainty());
        number(g, "qExternal", r.qExternal());
        number(g, "coupling1", r.coupling1());
        number(g, "coupling2", r.coupling2());
        number(g, "resonanceDb", r.resonanceDb());
        string(g, "method", r.method() == null ? null : r.method().code());
        string(g, "route", r.route() == null ? null : r.route().code());
        number(g, "snrDb", r.snrDb());
        number(g, "residualRatio", r.residualRatio());
        g.writeArrayFieldStart("flags");
        for (QualityFlag flag : r.flags()) {
            g.writeString(flag.code());
        }
        g.writeEndArray();
        string(g, "topology", sweep.topology() == null ? null : sweep.topology().wireName());
        g.writeNumberField("points", sweep.size());
    }

    /** Writes the error fields into an object the caller has started. */
    public static void writeErrorFields(JsonGenerator g, String source, String reason, String code) throws IOException {
        g.writeStringField("source", source);
        g.writeStringField("error", reason == null || reason.isBlank() ? "unknown error" : reason);
        if (code != null) {
            g.writeStringField("code", code);
        }
    }

    /** The message's identifying fields; files read from disk have none and write none. */
    private static void writeInfo(JsonGenerator g, SweepInfo info) throws IOException {
        if (info == null || info == SweepInfo.NONE) {
            return; // by identity: a record's equals is slow on first use, and absent fields are skipped anyway
        }
        optional(g, "sweepId", info.sweepId());
        optional(g, "stationId", info.stationId());
        optional(g, "product", info.product());
        optional(g, "lot", info.lot());
        optional(g, "unit", info.unit());
        optional(g, "measuredAt", info.measuredAt());
        optional(g, "fixtureId", info.fixtureId());
        if (info.temperatureC() != null) {
            number(g, "temperatureC", info.temperatureC());
        }
    }

    private static void number(JsonGenerator g, String name, double value) throws IOException {
        if (Double.isFinite(value)) {
            g.writeNumberField(name, value);
        } else {
            g.writeNullField(name);
        }
    }

    private static void string(JsonGenerator g, String name, String value) throws IOException {
        if (value == null) {
            g.writeNullField(name);
        } else {
            g.writeStringField(name, value);
        }
    }

    private static void optional(JsonGenerator g, String name, String value) throws IOException {
        if (value != null) {
            g.writeStringField(name, value);
        }
    }

    private String write(FieldWriter fields) {
        StringWriter out = new StringWriter(512);
        try (JsonGenerator g = factory.createGenerator(out)) {
            g.writeStartObject();
            fields.write(g);
            g.writeEndObject();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write JSON to memory", e);
        }
        return out.toString();
    }

    @FunctionalInterface
    private interface FieldWriter {
        void write(JsonGenerator g) throws IOException;
    }
}
