package org.qfleet.app;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.qfleet.app.plot.PlotDirectory;
import org.qfleet.fit.FitOptions;
import org.qfleet.sim.DemoPlant;
import org.qfleet.sim.DemoProduct;
import org.qfleet.sweep.SweepLimits;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code qfleet demo}: writes sweeps of the invented demo plant as Touchstone files, then fits the
 * folder exactly as {@code qfleet fit --plot DIR/plots DIR} does, and closes with a short summary.
 */
@Command(name = "demo",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = {
            "Generate sweeps of the invented demo plant as Touchstone files in DIR, then fit them",
            "as 'fit --plot DIR/plots DIR' does: one JSON line per sweep on stdout, a summary on stderr.",
            "Sweep files and plots of an earlier demo in DIR are replaced; other files are left alone."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {
            "0:every sweep gave a result",
            "1:some sweep gave an error line, or the files could not be written",
            "2:usage error"})
final class DemoCommand implements Callable<Integer> {

    static final int MAX_COUNT = 10_000;

    @Option(names = "--count", paramLabel = "N", defaultValue = "24",
            description = "Number of sweeps to generate, 1 to " + MAX_COUNT + " (default: ${DEFAULT-VALUE}).")
    int count;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1",
            description = "Seed of the simulated plant; the same seed gives the same sweeps (default: ${DEFAULT-VALUE}).")
    long seed;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "qfleet-demo",
            description = "Folder for the sweep files, created if needed; plots go to DIR/plots (default: ${DEFAULT-VALUE}).")
    Path folder;

    @Mixin
    DebugOption debug;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        if (count < 1 || count > MAX_COUNT) {
            throw new ParameterException(spec.commandLine(), "--count must lie between 1 and " + MAX_COUNT + ", got " + count);
        }
        PrintWriter err = spec.commandLine().getErr();
        Path plotFolder = folder.resolve("plots");
        PlotDirectory plots = createFolders(plotFolder);
        Map<String, DemoProduct> written;
        try {
            DemoSweepFiles.removeEarlierRun(folder, plotFolder);
            written = new DemoSweepFiles().write(new DemoPlant(seed, Clock.systemUTC()), count, folder);
        } catch (IOException | RuntimeException e) {
            err.println("qfleet demo: cannot write the demo sweeps to " + folder + ": " + e);
            if (debug.enabled) {
                e.printStackTrace(err);
            }
            err.flush();
            return 1;
        }
        DemoSummary summary = new DemoSummary(written);
        FitRunner runner = FitRunner.forFiles(SweepLimits.DEFAULT, FitOptions.AUTOMATIC,
                new FitRunner.Settings(null, plots, debug.enabled), spec.commandLine().getOut(), err, summary);
        boolean allFitted = runner.run(List.of(folder));
        summary.print(err, folder, plotFolder);
        return allFitted ? 0 : 1;
    }

    /** The sweep folder and its plot folder, created if needed; failing that, a usage error. */
    private PlotDirectory createFolders(Path plotFolder) {
        try {
            Files.createDirectories(folder);
            return new PlotDirectory(plotFolder);
        } catch (IOException | RuntimeException e) {
            throw new ParameterException(spec.commandLine(), "--out: cannot create the folder " + plotFolder + ": " + e.getMessage());
        }
    }
}
