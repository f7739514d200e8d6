package org.qfleet.app;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.qfleet.app.plot.PlotDirectory;
import org.qfleet.fit.FitOptions;
import org.qfleet.sweep.SweepLimits;
import org.qfleet.sweep.Topology;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code qfleet fit}: fits sweeps from files offline and prints one JSON line per sweep. */
@Command(name = "fit",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = {
            "Fit sweep files offline: one JSON line per sweep on stdout.",
            "Each line is a result, or an error line saying why that input could not be fitted.",
            "Files: Touchstone .s1p/.s2p (1.1 and 2.0), sweep messages .json and .jsonl.",
            "A folder stands for the sweep files directly inside it."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {
            "0:every input gave a result",
            "1:some input gave an error line (or a plot could not be written)",
            "2:usage error"})
final class FitCommand implements Callable<Integer> {

    @Option(names = "--topology", paramLabel = "TOPOLOGY", converter = TopologyConverter.class,
            completionCandidates = TopologyConverter.Names.class,
            description = "How the resonator is connected: ${COMPLETION-CANDIDATES}. "
                    + "Default: what the sweep says, else reflection for S11-only files, else transmission.")
    Topology topology;

    @Option(names = "--method", paramLabel = "METHOD", converter = MethodConverter.class, defaultValue = MethodConverter.AUTO,
            completionCandidates = MethodConverter.Names.class,
            description = "Estimator of f0 and QL: ${COMPLETION-CANDIDATES}. Default: ${DEFAULT-VALUE}, "
                    + "the complex-circle fit when the data carry phase, else the Lorentzian fit.")
    FitOptions fitOptions;

    @Option(names = "--plot", paramLabel = "DIR",
            description = "Also write one SVG plot per sweep into DIR (created if needed).")
    Path plotDirectory;

    @Option(names = "--max-points", paramLabel = "N", defaultValue = "" + SweepLimits.DEFAULT_MAX_POINTS,
            description = "Reject sweeps with more than N points (default: ${DEFAULT-VALUE}).")
    int maxPoints;

    @Mixin
    DebugOption debug;

    @Parameters(paramLabel = "FILE", arity = "1..*", description = "Sweep files or folders of them.")
    List<Path> inputs;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        SweepLimits limits = limits();
        FitRunner.Settings settings = new FitRunner.Settings(topology, plots(), debug.enabled);
        FitRunner runner = FitRunner.forFiles(limits, fitOptions, settings,
                spec.commandLine().getOut(), spec.commandLine().getErr(), FitListener.NONE);
        return runner.run(inputs) ? 0 : 1;
    }

    private SweepLimits limits() {
        int minPoints = SweepLimits.DEFAULT.minPoints();
        if (maxPoints < minPoints) {
            throw new ParameterException(spec.commandLine(),
                    "--max-points must be at least " + minPoints + ", got " + maxPoints);
        }
        return new SweepLimits(minPoints, maxPoints);
    }

    private PlotDirectory plots() {
        if (plotDirectory == null) {
            return null;
        }
        try {
            return new PlotDirectory(plotDirectory);
        } catch (IOException | RuntimeException e) {
            throw new ParameterException(spec.commandLine(),
                    "--plot: cannot create the directory " + plotDirectory + ": " + e.getMessage());
        }
    }
}
