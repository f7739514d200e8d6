package org.qfleet.stream;

import java.nio.charset.StandardCharsets;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.qfleet.codec.SweepMessageWriter;
import org.qfleet.codec.TraceForm;
import org.qfleet.sim.DemoPlant;
import org.qfleet.sim.Impairments;
import org.qfleet.sim.ResonatorCircuit;
import org.qfleet.sim.SweepPlan;
import org.qfleet.sim.SweepSimulator;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepInfo;

/**
 * Sweep messages for the stream tests, simulated with known circuits: mostly the invented demo
 * plant's transmission sweeps, with a notch and a reflection sweep every ten, each written in one
 * of the four trace forms of the contract in turn.
 */
final class StreamSweeps {

    /** One message to publish: its key (the lot), its sweep id and its bytes. */
    record Message(String key, String sweepId, byte[] value) {
    }

    private StreamSweeps() {
    }

    static List<Message> mixed(int count, long seed, String idPrefix) {
        DemoPlant plant = new DemoPlant(seed, Clock.fixed(Instant.parse("2025-03-14T09:00:00Z"), ZoneOffset.UTC));
        SweepSimulator lab = new SweepSimulator(seed + 1);
        TraceForm[] forms = TraceForm.values();
        List<Message> messages = new ArrayList<>(count);
        for (int i = 0; i < count; i++) {
            Sweep sweep = switch (i % 10) {
                case 3 -> labSweep(lab, ResonatorCircuit.notch(5.2e9, 20000, 0.8), idPrefix, i);
                case 7 -> labSweep(lab, ResonatorCircuit.reflection(2.4e9, 3000, 0.7), idPrefix, i);
                default -> renamed(plant.next().sweep(), idPrefix + "-" + i);
            };
            byte[] bytes = new SweepMessageWriter(forms[i % forms.length]).write(sweep);
            messages.add(new Message(sweep.info().lot(), sweep.info().sweepId(), bytes));
        }
        return messages;
    }

    /** A valid sweep message as text, with the given id, for tests that tamper with it. */
    static String validText(String sweepId) {
        return new String(mixed(1, 11, "x").get(0).value(), StandardCharsets.UTF_8)
                .replaceFirst("\"sweepId\":\"[^\"]*\"", "\"sweepId\":\"" + sweepId + "\"");
    }

    /** A valid transmission sweep message with {@code points} points. */
    static byte[] longSweep(String sweepId, int points) {
        ResonatorCircuit circuit = ResonatorCircuit.transmission(10.4e9, 6000, 0.05, 0.05);
        SweepInfo info = new SweepInfo(sweepId, "st-01", "cav-x104", "X104-LONG", "X104-LONG-0001",
                "2025-03-14T09:00:00Z", null, null);
        SweepPlan plan = SweepPlan.around(circuit.f0Hz(), circuit.qLoaded(), 10, points);
        Sweep sweep = new SweepSimulator(1).simulate(circuit, plan, Impairments.noise(40), info).sweep();
        return new SweepMessageWriter(TraceForm.RE_IM).write(sweep);
    }

    private static Sweep labSweep(SweepSimulator lab, ResonatorCircuit circuit, String idPrefix, int i) {
        SweepInfo info = new SweepInfo(idPrefix + "-" + i, "lab-1", "lab-" + circuit.topology().wireName(), "LAB-001",
                String.format(Locale.ROOT, "LAB-001-%04d", i), "2025-03-14T09:00:00Z", null, null);
        SweepPlan plan = SweepPlan.around(circuit.f0Hz(), circuit.qLoaded(), 10, 401);
        return lab.simulate(circuit, plan, Impairments.noise(40).withDelay(3e-9), info).sweep();
    }

    private static Sweep renamed(Sweep sweep, String sweepId) {
        SweepInfo i = sweep.info();
        SweepInfo info = new SweepInfo(sweepId, i.stationId(), i.product(), i.lot(), i.unit(), i.measuredAt(),
                i.fixtureId(), i.temperatureC());
        return new Sweep(sweep.source(), info, sweep.topology(), sweep.frequencyHz(), sweep.traces(), sweep.referenceOhms());
    }
}
