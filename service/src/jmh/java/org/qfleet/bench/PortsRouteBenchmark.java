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
import org.qfleet.fit.CouplingRoute;
import org.qfleet.fit.FitException;
import org.qfleet.fit.ResonanceAnalyzer;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.Sweep;

/**
 * The automatic fit of a full two-port sweep (S11, S21, S12, S22, as in an .s2p file): complex
 * circles of S21, S11 and S22, combined on the two-port route.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class PortsRouteBenchmark {

    @Param({"101", "401", "1601"})
    public int points;

    private final ResonanceAnalyzer analyzer = new ResonanceAnalyzer();
    private Sweep sweep;

    @Setup
    public void simulate() throws FitException {
        sweep = BenchSweeps.transmission(points, 1);
        CouplingRoute route = analyzer.analyze(sweep).route();
        if (route != CouplingRoute.TRANSMISSION_PORTS) {
            throw new IllegalStateException("expected the two-port route, the fit took " + route);
        }
    }

    @Benchmark
    public ResonanceResult analyzeTwoPort() throws FitException {
        return analyzer.analyze(sweep);
    }
}
