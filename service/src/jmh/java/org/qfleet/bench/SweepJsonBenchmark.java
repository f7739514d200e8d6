package org.qfleet.bench;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.qfleet.sweep.InvalidSweepException;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepJsonReader;

/** Decoding one sweep message (S21 as re/im arrays) from its bytes, validation included. */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class SweepJsonBenchmark {

    @Param({"401"})
    public int points;

    private final SweepJsonReader reader = new SweepJsonReader();
    private byte[] message;

    @Setup
    public void encode() throws InvalidSweepException {
        message = BenchSweeps.message(BenchSweeps.transmission(points, 1));
        reader.read("bench", message); // fails the run now if the message is not valid
    }

    @Benchmark
    public Sweep readMessage() throws InvalidSweepException {
        return reader.read("bench", message);
    }
}
