package org.qfleet.bench;

import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.qfleet.codec.ResultJson;
import org.qfleet.fit.FitException;
import org.qfleet.fit.ResonanceAnalyzer;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.ReadOutcome;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepFiles;
import org.qfleet.sweep.SweepLimits;

/**
 * The {@code fit} command's work on a folder of {@value #FILES} two-port .s2p files (one unit
 * each): read the file, fit it on the automatic route, write its result line. One invocation
 * processes the whole folder and counts as {@value #FILES} operations
 * ({@link OperationsPerInvocation}), so the score is the average time per file. The files stay in
 * the operating system's cache after the first pass; the lines go to a discarding stream, flushed
 * after each line as the command does.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class FitFolderBenchmark {

    static final int FILES = 200;

    @Param({"401"})
    public int points;

    private final SweepFiles reader = new SweepFiles(SweepLimits.DEFAULT);
    private final ResonanceAnalyzer analyzer = new ResonanceAnalyzer();
    private final ResultJson json = new ResultJson();
    private final PrintWriter out = new PrintWriter(
            new OutputStreamWriter(OutputStream.nullOutputStream(), StandardCharsets.UTF_8));
    private Path folder;
    private List<Path> files;

    @Setup
    public void writeFiles() throws IOException, FitException {
        folder = Files.createTempDirectory("qfleet-bench-");
        files = SweepFolder.write(folder, FILES, points, 7);
        if (fitAll() != FILES) { // fails the run now if any file gives no result
            throw new IllegalStateException("not every file of " + folder + " gave a result");
        }
    }

    @TearDown
    public void deleteFiles() throws IOException {
        SweepFolder.delete(folder);
    }

    @Benchmark
    @OperationsPerInvocation(FILES)
    public int fitFolder() throws FitException {
        return fitAll();
    }

    /** The number of result lines written. */
    private int fitAll() throws FitException {
        int lines = 0;
        for (Path file : files) {
            for (ReadOutcome outcome : reader.read(file)) {
                if (!outcome.ok()) {
                    throw new IllegalStateException(outcome.error().getMessage());
                }
                Sweep sweep = outcome.sweep().withTopology(SweepFiles.defaultTopology(outcome.sweep()));
                ResonanceResult result = analyzer.analyze(sweep);
                out.print(json.resultLine(sweep, result));
                out.print('\n');
                out.flush();
                lines++;
            }
        }
        return lines;
    }
}
