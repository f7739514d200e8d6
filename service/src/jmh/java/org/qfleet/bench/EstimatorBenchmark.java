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
import org.qfleet.fit.FitException;
import org.qfleet.fit.FitOptions;
import org.qfleet.fit.Method;
import org.qfleet.fit.ResonanceAnalyzer;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.Sweep;

/**
 * One estimator on the S21 of a transmission sweep (no port reflections, so no port fits):
 * {@link ResonanceAnalyzer#analyze(Sweep, FitOptions)} from sweep to result, uncertainties and
 * quality flags included.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class EstimatorBenchmark {

    @Param({"101", "401", "1601"})
    public int points;

    @Param({"COMPLEX_CIRCLE", "LORENTZIAN", "HALF_POWER"})
    public Method method;

    private final ResonanceAnalyzer analyzer = new ResonanceAnalyzer();
    private Sweep sweep;
    private FitOptions options;

    @Setup
    public void simulate() throws FitException {
        sweep = BenchSweeps.s21Only(BenchSweeps.transmission(points, 1));
        options = new FitOptions(method);
        analyzer.analyze(sweep, options); // fails the run now if this sweep cannot be fitted
    }

    @Benchmark
    public ResonanceResult analyzeS21() throws FitException {
        return analyzer.analyze(sweep, options);
    }
}
