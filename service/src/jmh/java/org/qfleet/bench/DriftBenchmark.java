package org.qfleet.bench;

import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;
import org.qfleet.drift.DriftEngine;
import org.qfleet.drift.DriftSettings;
import org.qfleet.sim.DemoPlant;
import org.qfleet.sim.SimulatedSweep;
import org.qfleet.sim.Truth;
import org.qfleet.sweep.SweepInfo;

/**
 * The drift update per result: {@link DriftEngine#accept} on the demo plant's stream of units
 * (two products, eight stations, lots of 200 to 400 units, one unit a second), from an empty
 * engine: the product baselines are learned on the way, then every unit updates its lot and its
 * station's charts. One invocation takes the whole stream; the score is the time per unit.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class DriftBenchmark {

    private static final int UNITS = 3000;

    private org.qfleet.drift.Measurement[] units;

    @Setup
    public void simulate() {
        Instant start = Instant.parse("2024-05-17T09:30:00Z");
        DemoPlant plant = new DemoPlant(1, Clock.fixed(start, ZoneOffset.UTC));
        units = new org.qfleet.drift.Measurement[UNITS];
        for (int i = 0; i < UNITS; i++) {
            SimulatedSweep s = plant.next(start.plusSeconds(i));
            SweepInfo info = s.sweep().info();
            Truth truth = s.truth();
            // Insertion loss in dB of the transmission circle: -20 log10 |S21(f0)|.
            double levelDb = -20 * Math.log10(truth.circleDiameter());
            units[i] = new org.qfleet.drift.Measurement(info.product(), info.lot(), info.stationId(), info.unit(),
                    start.toEpochMilli() + 1000L * i, truth.qUnloaded(), truth.f0Hz(), levelDb, List.of());
        }
    }

    @Benchmark
    @OperationsPerInvocation(UNITS)
    public void acceptStream(Blackhole alerts) {
        DriftEngine engine = new DriftEngine(DriftSettings.DEFAULT);
        for (org.qfleet.drift.Measurement m : units) {
            alerts.consume(engine.accept(m));
        }
    }
}
