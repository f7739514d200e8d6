package org.qfleet.codec;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.json.JsonWriteFeature;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.Objects;
import org.qfleet.sweep.SParameter;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepInfo;
import org.qfleet.sweep.Topology;
import org.qfleet.sweep.Trace;

/**
 * Writes a sweep as a sweep message ({@code schemas/sweep.schema.json}), the input contract of the
 * sweeps topic, with every trace in one chosen form. Numbers are written with Java's shortest
 * round-trip representation, so re/im traces read back bit for bit. Thread-safe.
 */
public final class SweepMessageWriter {

    private static final SParameter[] WRITTEN = {SParameter.S21, SParameter.S11, SParameter.S22};

    private final JsonFactory factory = JsonFactory.builder().enable(JsonWriteFeature.ESCAPE_NON_ASCII).build();
    private final TraceForm form;

    public SweepMessageWriter(TraceForm form) {
        this.form = Objects.requireNonNull(form, "form");
    }

    /**
     * The message's bytes (UTF-8). The sweep needs a topology and the required identifying fields;
     * its S21, S11 and S22 are written when present (S12 is not part of the contract).
     */
    public byte[] write(Sweep sweep) {
        SweepInfo info = sweep.info();
        Topology topology = Objects.requireNonNull(sweep.topology(), "a sweep message needs a topology");
        ByteArrayOutputStream out = new ByteArrayOutputStream(64 + 60 * sweep.size() * (1 + 2 * sweep.traces().size()));
        try (JsonGenerator g = factory.createGenerator(out)) {
            g.writeStartObject();
            g.writeStringField("sweepId", info.sweepId());
            g.writeStringField("stationId", info.stationId());
            g.writeStringField("product", info.product());
            g.writeStringField("lot", info.lot());
            g.writeStringField("unit", info.unit());
            g.writeStringField("measuredAt", info.measuredAt());
            if (info.fixtureId() != null) {
                g.writeStringField("fixtureId", info.fixtureId());
            }
            if (info.temperatureC() != null) {
                g.writeNumberField("temperatureC", info.temperatureC());
            }
            g.writeStringField("topology", topology.wireName());
            g.writeFieldName("frequencyHz");
            array(g, sweep.frequencyHz());
            for (SParameter p : WRITTEN) {
                Trace trace = sweep.traces().get(p);
                if (trace != null) {
                    g.writeFieldName(p.wireName());
                    trace(g, trace);
                }
            }
            g.writeEndObject();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write JSON to memory", e);
        }
        return out.toByteArray();
    }

    private void trace(JsonGenerator g, Trace t) throws IOException {
        int n = t.size();
        if (!t.phaseKnown() && form.hasPhase()) {
            throw new IllegalArgumentException("a magnitude-only trace cannot be written as " + form.code());
        }
        g.writeStartObject();
        switch (form) {
            case RE_IM -> {
                g.writeFieldName("re");
                array(g, t.re());
                g.writeFieldName("im");
                array(g, t.im());
            }
            case MAG_DEG -> {
                g.writeFieldName("mag");
                array(g, each(n, t::magnitude));
                g.writeFieldName("deg");
                array(g, degrees(t));
            }
            case DB_DEG -> {
                g.writeFieldName("db");
                array(g, decibels(t));
                g.writeFieldName("deg");
                array(g, degrees(t));
            }
            case DB -> {
                g.writeFieldName("db");
                array(g, decibels(t));
            }
            default -> throw new IllegalStateException("unknown trace form " + form);
        }
        g.writeEndObject();
    }

    private static double[] decibels(Trace t) {
        return each(t.size(), i -> 20 * Math.log10(t.magnitude(i)));
    }

    private static double[] degrees(Trace t) {
        return each(t.size(), i -> Math.toDegrees(Math.atan2(t.im()[i], t.re()[i])));
    }

    private static double[] each(int n, java.util.function.IntToDoubleFunction f) {
        double[] values = new double[n];
        for (int i = 0; i < n; i++) {
            values[i] = f.applyAsDouble(i);
        }
        return values;
    }

    private static void array(JsonGenerator g, double[] values) throws IOException {
        g.writeArray(values, 0, values.length);
    }
}
