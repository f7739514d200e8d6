package org.qfleet.app;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.qfleet.app.broker.DataDirectory;
import org.qfleet.app.plot.PlotDirectory;
import org.qfleet.codec.TraceForm;
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
 * {@code qfleet demo}: the streaming service on an embedded broker with the invented demo plant
 * publishing sweeps to it, summed up on the console every few seconds. With {@code --offline}, the
 * file-based demo instead: sweeps written as Touchstone files, then fitted exactly as
 * {@code qfleet fit --plot DIR/plots DIR} does, with a short summary.
 */
@Command(name = "demo",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = {
            "Run the streaming service on a Kafka broker started in this process, with the invented",
            "demo plant publishing sweeps to it, and sum up results, rejects, latency, open lots and",
            "the latest unit of each station every few seconds, until --duration or Ctrl-C.",
            "With --offline: generate sweeps as Touchstone files in DIR, then fit them as",
            "'fit --plot DIR/plots DIR' does: one JSON line per sweep on stdout, a summary on stderr.",
            "Sweep files and plots of an earlier demo in DIR are replaced; other files are left alone."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {
            "0:every sweep gave a result (offline), or every published sweep came out (live)",
            "1:some sweep gave an error line, the files could not be written, or the service failed",
            "2:usage error"})
final class DemoCommand implements Callable<Integer> {

    static final int MAX_COUNT = 10_000;

    @Option(names = "--offline", description = "The file-based demo: no Kafka, sweeps as Touchstone files in --out.")
    boolean offline;

    @Option(names = "--count", paramLabel = "N", defaultValue = "24",
            description = "With --offline: number of sweeps to generate, 1 to " + MAX_COUNT + " (default: ${DEFAULT-VALUE}).")
    int count;

    @Option(names = "--duration", paramLabel = "TIME", converter = DurationConverter.class,
            description = "How long the live demo runs, e.g. 30s, 5m (default: until Ctrl-C).")
    Duration duration;

    @Option(names = "--rate", paramLabel = "PER_SECOND", defaultValue = "50",
            description = "Sweeps per second the plant publishes in the live demo (default: ${DEFAULT-VALUE}).")
    double rate;

    @Option(names = "--form", paramLabel = "FORM[,FORM...]", defaultValue = "re-im", split = ",",
            converter = TraceFormConverter.class, completionCandidates = TraceFormConverter.Names.class,
            description = "How the live demo writes traces: ${COMPLETION-CANDIDATES}; several are used in turn (default: ${DEFAULT-VALUE}).")
    List<TraceForm> forms;

    @Option(names = "--every", paramLabel = "TIME", defaultValue = "5s", converter = DurationConverter.class,
            description = "Time between two summaries of the live demo (default: ${DEFAULT-VALUE}).")
    Duration every;

    @Mixin
    ServiceOptions service;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1",
            description = "Seed of the simulated plant; the same seed gives the same sweeps (default: ${DEFAULT-VALUE}).")
    long seed;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "qfleet-demo",
            description = "With --offline: folder for the sweep files, created if needed; plots go to DIR/plots (default: ${DEFAULT-VALUE}).")
    Path folder;

    @Mixin
    DebugOption debug;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        return offline ? offline() : live();
    }

    private Integer live() throws IOException {
        if (!(rate > 0) || Double.isInfinite(rate)) {
            throw new ParameterException(spec.commandLine(), "--rate must be a positive number of sweeps per second, got " + rate);
        }
        Path temporary = service.dataDir == null && service.bootstrapServers == null
                ? Files.createTempDirectory("qfleet-demo-data-") : null;
        Map<String, String> defaults = new HashMap<>();
        defaults.put(ServiceConfig.APPLICATION_ID, "qfleet-demo");
        if (temporary != null) {
            defaults.put(ServiceConfig.DATA_DIR, temporary.toString());
        }
        ServiceConfig config = service.config(spec, defaults);
        PrintWriter err = spec.commandLine().getErr();
        try {
            return RunCommand.runUntilStopped(LiveDemo.PREFIX, config, service.catalogue(spec, config), err, true,
                    new LiveDemo(err, duration, rate, seed, forms, every));
        } finally {
            if (temporary != null) {
                DataDirectory.wipe(temporary);
            }
        }
    }

    private Integer offline() {
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
