package org.qfleet.app;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.qfleet.sim.Impairments;
import org.qfleet.sim.ResonatorCircuit;
import org.qfleet.sim.SimulatedSweep;
import org.qfleet.sim.SweepPlan;
import org.qfleet.sim.SweepSimulator;
import org.qfleet.sweep.FrequencyUnit;
import org.qfleet.sweep.SParameter;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepInfo;
import org.qfleet.sweep.TouchstoneFormat;
import org.qfleet.sweep.TouchstoneWriter;
import org.qfleet.sweep.Trace;

/**
 * Sweep files for end-to-end tests of the command line: circuit-model sweeps from
 * {@link SweepSimulator} with known truth, written as Touchstone files or sweep messages.
 */
final class SimulatedFiles {

    /** Identifying fields of a message from the invented demo plant. */
    static final SweepInfo INFO = new SweepInfo("sim-t-000042", "st-03", "cav-x104", "X104-T-007",
            "X104-T-007-0042", "2025-03-14T09:26:53.589Z", "fx-03a", 23.4);

    private static final ObjectMapper MAPPER = new ObjectMapper();

    private SimulatedFiles() {
    }

    /** A weakly and slightly asymmetrically coupled cavity with S11, S21, S12, S22 at 40 dB SNR and some delay. */
    static SimulatedSweep transmission(long seed) {
        return simulate(seed, ResonatorCircuit.transmission(10.4e9, 6000, 0.05, 0.03), Impairments.noise(40).withDelay(2e-9));
    }

    /** A resonator side-coupled to a through line (S21 dips), S21 and S11, 40 dB SNR. */
    static SimulatedSweep notch(long seed) {
        return simulate(seed, ResonatorCircuit.notch(5.2e9, 20000, 0.8), Impairments.noise(40).withDelay(15e-9));
    }

    /** A one-port resonator (S11 only), 40 dB SNR. */
    static SimulatedSweep reflection(long seed, double beta) {
        return simulate(seed, ResonatorCircuit.reflection(2.4e9, 3000, beta), Impairments.noise(40).withDelay(3e-9));
    }

    static SimulatedSweep simulate(long seed, ResonatorCircuit circuit, Impairments impairments) {
        SweepPlan plan = SweepPlan.around(circuit.f0Hz(), circuit.qLoaded(), 10, 401);
        return new SweepSimulator(seed).simulate(circuit, plan, impairments);
    }

    /** Writes the sweep as a Touchstone 1.1 file; the name's extension must suit the sweep. */
    static Path touchstone(Path dir, String name, Sweep sweep, FrequencyUnit unit, TouchstoneFormat format) {
        return write(dir.resolve(name), new TouchstoneWriter(unit, format).toText(sweep));
    }

    static Path write(Path file, String text) {
        try {
            return Files.writeString(file, text);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The sweep as a sweep message with the given topology, every trace as re/im. */
    static String message(Sweep sweep, SweepInfo info, String topology) {
        ObjectNode m = header(sweep, info, topology);
        for (SParameter p : new SParameter[] {SParameter.S11, SParameter.S21, SParameter.S22}) {
            sweep.trace(p).ifPresent(t -> m.set(p.wireName(), complex(t)));
        }
        return m.toString();
    }

    /** The sweep's S21 as a magnitude-only message ({@code {"db": [...]}}), transmission. */
    static String magnitudeOnlyMessage(Sweep sweep, SweepInfo info) {
        ObjectNode m = header(sweep, info, "transmission");
        Trace s21 = sweep.trace(SParameter.S21).orElseThrow();
        ArrayNode db = MAPPER.createArrayNode();
        for (int i = 0; i < s21.size(); i++) {
            db.add(20 * Math.log10(s21.magnitude(i)));
        }
        m.putObject("s21").set("db", db);
        return m.toString();
    }

    private static ObjectNode header(Sweep sweep, SweepInfo info, String topology) {
        ObjectNode m = MAPPER.createObjectNode();
        m.put("sweepId", info.sweepId());
        m.put("stationId", info.stationId());
        m.put("product", info.product());
        m.put("lot", info.lot());
        m.put("unit", info.unit());
        m.put("measuredAt", info.measuredAt());
        m.put("fixtureId", info.fixtureId());
        m.put("temperatureC", info.temperatureC());
        m.put("topology", topology);
        m.set("frequencyHz", array(sweep.frequencyHz()));
        return m;
    }

    private static ObjectNode complex(Trace trace) {
        ObjectNode t = MAPPER.createObjectNode();
        t.set("re", array(trace.re()));
        t.set("im", array(trace.im()));
        return t;
    }

    private static ArrayNode array(double[] values) {
        ArrayNode a = MAPPER.createArrayNode();
        for (double v : values) {
            a.add(v);
        }
        return a;
    }
}
