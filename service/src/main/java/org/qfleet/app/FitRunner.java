package org.qfleet.app;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.function.LongSupplier;
import org.qfleet.app.InputFiles.Input;
import org.qfleet.app.plot.PlotDirectory;
import org.qfleet.codec.ErrorCodes;
import org.qfleet.codec.ResultJson;
import org.qfleet.fit.FitException;
import org.qfleet.fit.FitOptions;
import org.qfleet.fit.ResonanceAnalyzer;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.InvalidSweepException;
import org.qfleet.sweep.ReadOutcome;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepFiles;
import org.qfleet.sweep.SweepLimits;
import org.qfleet.sweep.SweepValidator;
import org.qfleet.sweep.Topology;

/**
 * The work behind the {@code fit} command, free of the command-line library: read each input,
 * fit each sweep, print one JSON line per sweep (a result or an error) and go on with the next.
 */
final class FitRunner {

    /**
     * @param topology topology forced by the user, or null to use the sweep's own
     * @param plots    where to draw each fit, or null for no plots
     * @param debug    print stack traces of unexpected failures on stderr
     */
    record Settings(Topology topology, PlotDirectory plots, boolean debug) {
    }

    private final SweepSource source;
    private final SweepFitter fitter;
    private final Settings settings;
    private final PrintWriter out;
    private final PrintWriter err;
    private final LongSupplier nanoClock;
    private final FitListener listener;
    private final ResultJson json = new ResultJson();

    FitRunner(SweepSource source, SweepFitter fitter, Settings settings, PrintWriter out, PrintWriter err,
            LongSupplier nanoClock) {
        this(source, fitter, settings, out, err, nanoClock, FitListener.NONE);
    }

    FitRunner(SweepSource source, SweepFitter fitter, Settings settings, PrintWriter out, PrintWriter err,
            LongSupplier nanoClock, FitListener listener) {
        this.source = source;
        this.fitter = fitter;
        this.settings = settings;
        this.out = out;
        this.err = err;
        this.nanoClock = nanoClock;
        this.listener = listener;
    }

    /** The runner for files on disk, read within {@code limits} and fitted with {@code options}. */
    static FitRunner forFiles(SweepLimits limits, FitOptions options, Settings settings, PrintWriter out,
            PrintWriter err, FitListener listener) {
        SweepFiles files = new SweepFiles(limits);
        ResonanceAnalyzer analyzer = new ResonanceAnalyzer();
        return new FitRunner(files::read, sweep -> analyzer.analyze(sweep, options), settings, out, err,
                System::nanoTime, listener);
    }

    /** Processes every argument (files and folders); true when every input gave a result. */
    boolean run(List<Path> arguments) {
        List<Input> inputs = InputFiles.expand(arguments);
        ProgressMeter progress = new ProgressMeter(inputs.size(), err, nanoClock);
        boolean allFitted = true;
        int done = 0;
        for (Input input : inputs) {
            allFitted &= process(input);
            progress.advanced(++done);
        }
        progress.finished(done);
        return allFitted;
    }

    private boolean process(Input input) {
        String name = input.path().toString();
        if (!input.usable()) {
            return error(name, input.problem(), input.code());
        }
        List<ReadOutcome> outcomes;
        try {
            outcomes = source.read(input.path());
        } catch (RuntimeException e) {
            return unexpected(name, e);
        }
        if (outcomes.isEmpty()) {
            return error(name, "the file holds no sweeps", ErrorCodes.NO_SWEEPS);
        }
        boolean allFitted = true;
        for (ReadOutcome outcome : outcomes) {
            allFitted &= handle(outcome);
        }
        return allFitted;
    }

    private boolean handle(ReadOutcome outcome) {
        if (!outcome.ok()) {
            InvalidSweepException e = outcome.error();
            return e == null ? error(outcome.source(), "unreadable input", ErrorCodes.UNREADABLE)
                    : error(outcome.source(), e.getMessage(), e.error().code());
        }
        Sweep sweep = TopologyChoice.apply(outcome.sweep(), settings.topology());
        ResonanceResult result;
        try {
            SweepValidator.validateTopology(sweep);
            result = fitter.fit(sweep);
        } catch (InvalidSweepException e) {
            return error(sweep.source(), e.getMessage(), e.error().code());
        } catch (FitException e) {
            return error(sweep.source(), e.getMessage(), ErrorCodes.FIT_FAILED);
        } catch (RuntimeException e) {
            return unexpected(sweep.source(), e);
        }
        printLine(json.resultLine(sweep, result));
        listener.fitted(sweep, result);
        return settings.plots() == null || plot(sweep, result);
    }

    /** The result line is already out, so a failed plot is reported on stderr only. */
    private boolean plot(Sweep sweep, ResonanceResult result) {
        try {
            settings.plots().write(sweep, result);
            return true;
        } catch (IOException | RuntimeException e) {
            err.println("qfleet: cannot write the plot for " + sweep.source() + ": " + e);
            debugTrace(e);
            err.flush();
            return false;
        }
    }

    private boolean error(String source, String reason, String code) {
        printLine(json.errorLine(source, reason, code));
        listener.failed(source, code);
        return false;
    }

    private boolean unexpected(String source, RuntimeException e) {
        String detail = e.getMessage() == null ? "" : ": " + e.getMessage();
        String hint = settings.debug() ? "" : " (rerun with --debug for details)";
        debugTrace(e);
        return error(source, "internal error, " + e.getClass().getSimpleName() + detail + hint, ErrorCodes.INTERNAL_ERROR);
    }

    private void debugTrace(Exception e) {
        if (settings.debug()) {
            e.printStackTrace(err);
            err.flush();
        }
    }

    private void printLine(String line) {
        out.print(line);
        out.print('\n');
        out.flush();
    }
}
