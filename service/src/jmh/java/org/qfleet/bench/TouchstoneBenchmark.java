package org.qfleet.bench;

import java.io.StringReader;
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
import org.qfleet.sweep.FrequencyUnit;
import org.qfleet.sweep.InvalidSweepException;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.TouchstoneFormat;
import org.qfleet.sweep.TouchstoneReader;
import org.qfleet.sweep.TouchstoneWriter;

/** Parsing the text of a two-port Touchstone file (GHz, real/imaginary pairs, four traces). */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class TouchstoneBenchmark {

    @Param({"401"})
    public int points;

    private final TouchstoneReader reader = new TouchstoneReader();
    private String text;

    @Setup
    public void write() throws InvalidSweepException {
        text = new TouchstoneWriter(FrequencyUnit.GHZ, TouchstoneFormat.RI).toText(BenchSweeps.transmission(points, 1));
        reader.read("bench.s2p", new StringReader(text), 2); // fails the run now if the text is not valid
    }

    @Benchmark
    public Sweep readS2p() throws InvalidSweepException {
        return reader.read("bench.s2p", new StringReader(text), 2);
    }
}
