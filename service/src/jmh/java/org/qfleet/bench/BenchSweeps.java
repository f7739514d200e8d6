package org.qfleet.bench;

import java.nio.charset.StandardCharsets;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.Map;
import java.util.SplittableRandom;
import org.qfleet.codec.SweepMessageWriter;
import org.qfleet.codec.TraceForm;
import org.qfleet.sim.DemoPlant;
import org.qfleet.sim.Impairments;
import org.qfleet.sim.ResonatorCircuit;
import org.qfleet.sim.SweepPlan;
import org.qfleet.sim.SweepSimulator;
import org.qfleet.sweep.SParameter;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.Topology;
import org.qfleet.sweep.Trace;

/**
 * Inputs of the benchmarks, all simulated: a cavity of the invented demo plant near 10.4 GHz
 * (Qu 6000, both couplings 0.05), 40 dB signal-to-noise and 3 ns of uncorrected cable delay.
 */
final class BenchSweeps {

    static final double F0_HZ = 10.4e9;
    static final double Q_UNLOADED = 6000;
    static final double COUPLING = 0.05;
    static final Impairments IMPAIRMENTS = Impairments.noise(40).withDelay(3e-9);

    /** Sweep width in half-power bandwidths. */
    private static final double WIDTHS = 10;
    /** Unit-to-unit spread of the folder's sweeps: f0 standard deviation, and Qu as a fraction. */
    private static final double F0_SIGMA_HZ = 0.5e6;
    private static final double QU_SIGMA_FRACTION = 0.015;

    private BenchSweeps() {
    }

    /** The full transmission sweep (S11, S21, S12, S22) of the nominal cavity. */
    static Sweep transmission(int points, long seed) {
        ResonatorCircuit circuit = ResonatorCircuit.transmission(F0_HZ, Q_UNLOADED, COUPLING, COUPLING);
        SweepPlan plan = SweepPlan.around(F0_HZ, circuit.qLoaded(), WIDTHS, points);
        return new SweepSimulator(seed).simulate(circuit, plan, IMPAIRMENTS).sweep();
    }

    /**
     * Sweeps of {@code count} different units, each as its station would measure it: the same
     * frequencies for every unit, f0 and Qu drawn around the nominal values.
     */
    static Sweep[] units(int count, int points, long seed) {
        SplittableRandom spread = new SplittableRandom(seed);
        SweepSimulator simulator = new SweepSimulator(seed);
        double qLoaded = Q_UNLOADED / (1 + 2 * COUPLING);
        SweepPlan plan = SweepPlan.around(F0_HZ, qLoaded, WIDTHS, points);
        Sweep[] sweeps = new Sweep[count];
        for (int i = 0; i < count; i++) {
            double f0 = F0_HZ + F0_SIGMA_HZ * spread.nextGaussian();
            double qu = Q_UNLOADED * (1 + QU_SIGMA_FRACTION * spread.nextGaussian());
            ResonatorCircuit circuit = ResonatorCircuit.transmission(f0, qu, COUPLING, COUPLING);
            sweeps[i] = simulator.simulate(circuit, plan, IMPAIRMENTS).sweep();
        }
        return sweeps;
    }

    /** The same sweep with S21 as its only trace, as a transmission fixture without port reflections. */
    static Sweep s21Only(Sweep sweep) {
        Trace s21 = sweep.trace(SParameter.S21).orElseThrow();
        return new Sweep(sweep.source(), sweep.info(), Topology.TRANSMISSION, sweep.frequencyHz(),
                Map.of(SParameter.S21, s21), sweep.referenceOhms());
    }

    /** A sweep message (the JSON contract of the sweeps topic) carrying the sweep's S21 as re/im. */
    static byte[] message(Sweep sweep) {
        Trace s21 = sweep.trace(SParameter.S21).orElseThrow();
        StringBuilder json = new StringBuilder(64 * sweep.size());
        json.append("{\"sweepId\":\"bench-00000001\",\"stationId\":\"st-01\",\"product\":\"cav-x104\",")
                .append("\"lot\":\"X104-bench-001\",\"unit\":\"X104-bench-001-0001\",")
                .append("\"measuredAt\":\"2024-05-17T09:30:00.125Z\",\"topology\":\"transmission\",")
                .append("\"frequencyHz\":");
        array(json, sweep.frequencyHz());
        json.append(",\"s21\":{\"re\":");
        array(json, s21.re());
        json.append(",\"im\":");
        array(json, s21.im());
        json.append("}}");
        return json.toString().getBytes(StandardCharsets.UTF_8);
    }

    /**
     * The first {@code count} sweep messages of the invented demo plant (seed 1), as its stations
     * publish them: 401 points, S21, S11 and S22 in the given form (about 53 kB each as re/im).
     */
    static byte[][] plantMessages(int count, TraceForm form) {
        DemoPlant plant = new DemoPlant(1, Clock.fixed(Instant.parse("2024-05-17T09:30:00Z"), ZoneOffset.UTC));
        SweepMessageWriter writer = new SweepMessageWriter(form);
        byte[][] messages = new byte[count][];
        for (int i = 0; i < count; i++) {
            messages[i] = writer.write(plant.next().sweep());
        }
        return messages;
    }

    private static void array(StringBuilder json, double[] values) {
        json.append('[');
        for (int i = 0; i < values.length; i++) {
            json.append(i == 0 ? "" : ",").append(values[i]);
        }
        json.append(']');
    }
}
