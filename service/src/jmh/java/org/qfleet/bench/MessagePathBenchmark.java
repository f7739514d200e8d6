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
import org.qfleet.stream.StreamSettings;
import org.qfleet.stream.SweepHandler;
import org.qfleet.stream.SweepOutcome;
import org.qfleet.verdict.ProductCatalogue;

/**
 * The stream's whole work on one sweep message, without Kafka: {@link SweepHandler#handle} decodes,
 * validates, fits (S21, S11 and S22 circles), judges and writes the result message. The messages
 * are the demo plant's (401 points, S11, S21 and S22, about 53 kB as re/im), taken in turn.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class MessagePathBenchmark {

    private static final int MESSAGES = 64;

    @Param({"RE_IM", "DB_DEG"})
    public TraceForm form;

    private final SweepHandler handler = new SweepHandler(StreamSettings.defaults("localhost:9092"),
            ProductCatalogue.demoPlant());
    private byte[][] messages;
    private int next;

    @Setup
    public void publish() {
        messages = BenchSweeps.plantMessages(MESSAGES, form);
        for (int i = 0; i < MESSAGES; i++) {
            // Fails the run now if a message would not give a result.
            if (!(handler.handle("bench", messages[i]) instanceof SweepOutcome.Fitted)) {
                throw new IllegalStateException("message " + i + " gave no result: " + handler.handle("bench", messages[i]));
            }
        }
    }

    @Benchmark
    public SweepOutcome handle() {
        byte[] message = messages[next];
        next = (next + 1) % MESSAGES;
        return handler.handle("qfleet.sweeps/0@0", message);
    }
}
