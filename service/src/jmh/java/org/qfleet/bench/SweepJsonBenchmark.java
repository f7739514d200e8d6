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
import org.qfleet.codec.TraceForm;
import org.qfleet.sweep.InvalidSweepException;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepJsonReader;

/**
 * Decoding one sweep message from its bytes, validation included: {@code s21} is a transmission
 * sweep with S21 only, {@code plant} the demo plant's messages with S21, S11 and S22 (the stream's
 * input), both as re/im.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class SweepJsonBenchmark {

    @Param({"401"})
    public int points;

    @Param({"s21", "plant"})
    public String message;

    private final SweepJsonReader reader = new SweepJsonReader();
    private byte[] bytes;

    @Setup
    public void encode() throws InvalidSweepException {
        bytes = message.equals("s21") ? BenchSweeps.message(BenchSweeps.transmission(points, 1))
                : BenchSweeps.plantMessages(1, TraceForm.RE_IM)[0];
        reader.read("bench", bytes); // fails the run now if the message is not valid
    }

    @Benchmark
    public Sweep readMessage() throws InvalidSweepException {
        return reader.read("bench", bytes);
    }
}
