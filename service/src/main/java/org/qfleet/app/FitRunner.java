package org.qfleet.app;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.ThreadFactory;
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
    private final int threads;
    private final ResultJson json = new ResultJson();

    FitRunner(SweepSource source, SweepFitter fitter, Settings settings, PrintWriter out, PrintWriter err,
            LongSupplier nanoClock) {
        this(source, fitter, settings, out, err, nanoClock, FitListener.NONE);
    }

    FitRunner(SweepSource source, SweepFitter fitter, Settings settings, PrintWriter out, PrintWriter err,
            LongSupplier nanoClock, FitListener listener) {
        this(source, fitter, settings, out, err, nanoClock, listener, 1);
    }

    /**
     * @param threads how many inputs are read and fitted at once; the source and the fitter must be
     *                thread-safe when more than one
     */
    FitRunner(SweepSource source, SweepFitter fitter, Settings settings, PrintWriter out, PrintWriter err,
            LongSupplier nanoClock, FitListener listener, int threads) {
        this.threads = Math.max(1, threads);
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
        // The readers and the analyzer are stateless, so every core can take an input.
        return new FitRunner(files::read, sweep -> analyzer.analyze(sweep, options), settings, out, err,
                System::nanoTime, listener, Runtime.getRuntime().availableProcessors());
    }

    /** Processes every argument (files and folders); true when every input gave a result. */
    boolean run(List<Path> arguments) {
        List<Input> inputs = InputFiles.expand(arguments);
        ProgressMeter progress = new ProgressMeter(inputs.size(), err, nanoClock);
        boolean allFitted = true;
        int done = 0;
        int workers = Math.min(threads, inputs.size());
        if (workers <= 1) {
            for (Input input : inputs) {
                allFitted &= emit(process(input));
                progress.advanced(++done);
            }
        } else {
            // Inputs are read and fitted on every core; their lines still come out in input order.
            ExecutorService pool = Executors.newFixedThreadPool(workers, daemonThreads());
            try {
                Deque<Future<List<Line>>> inFlight = new ArrayDeque<>();
                int next = 0;
                while (next < inputs.size() || !inFlight.isEmpty()) {
                    while (next < inputs.size() && inFlight.size() < 4 * workers) {
                        Input input = inputs.get(next++);
                        inFlight.add(pool.submit(() -> process(input)));
                    }
                    allFitted &= emit(await(inFlight.poll()));
                    progress.advanced(++done);
                }
            } finally {
                pool.shutdownNow();
            }
        }
        progress.finished(done);
        return allFitted;
    }

    private static ThreadFactory daemonThreads() {
        return task -> {
            Thread t = new Thread(task, "qfleet-fit");
            t.setDaemon(true);
            return t;
        };
    }

    private static List<Line> await(Future<List<Line>> future) {
        try {
            return future.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while fitting", e);
        } catch (ExecutionException e) {
            throw new IllegalStateException("a fit failed unexpectedly", e.getCause());
        }
    }

    /**
     * One output line of an input: a result (with its sweep, for listeners and plots) or an error.
     */
    private record Line(String json, Sweep sweep, ResonanceResult result, String failedSource, String failedCode) {

        static Line result(String json, Sweep sweep, ResonanceResult result) {
            return new Line(json, sweep, result, null, null);
        }

        static Line error(String json, String source, String code) {
            return new Line(json, null, null, source, code);
        }
    }

    /** Prints the lines of one input in order; true when all of them are results with their plots. */
    private boolean emit(List<Line> lines) {
        boolean allFitted = true;
        for (Line line : lines) {
            printLine(line.json());
            if (line.result() == null) {
                listener.failed(line.failedSource(), line.failedCode());
                allFitted = false;
                continue;
            }
            listener.fitted(line.sweep(), line.result());
            if (settings.plots() != null) {
                allFitted &= plot(line.sweep(), line.result());
            }
        }
        return allFitted;
    }

    private List<Line> process(Input input) {
        String name = input.path().toString();
        if (!input.usable()) {
            return List.of(error(name, input.problem(), input.code()));
        }
        List<ReadOutcome> outcomes;
        try {
            outcomes = source.read(input.path());
        } catch (RuntimeException e) {
            return List.of(unexpected(name, e));
        }
        if (outcomes.isEmpty()) {
            return List.of(error(name, "the file holds no sweeps", ErrorCodes.NO_SWEEPS));
        }
        List<Line> lines = new ArrayList<>(outcomes.size());
        for (ReadOutcome outcome : outcomes) {
            lines.add(handle(outcome));
        }
        return lines;
    }

    private Line handle(ReadOutcome outcome) {
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
        return Line.result(json.resultLine(sweep, result), sweep, result);
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

    private Line error(String source, String reason, String code) {
        return Line.error(json.errorLine(source, reason, code), source, code);
    }

    private Line unexpected(String source, RuntimeException e) {
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
