package org.qfleet.app;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.qfleet.verdict.ProductCatalogue;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * {@code qfleet run}: the streaming service. Settings come from the command line, then
 * {@code QFLEET_*} environment variables, then a properties file, in that order of precedence.
 * Without bootstrap servers it starts a single-node Kafka broker in this JVM.
 */
@Command(name = "run",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = {
            "Run the streaming service: fit every sweep message on the sweeps topic, write one result",
            "per sweep to the results topic and one reject per unusable message to the rejects topic,",
            "exactly once. Without bootstrap servers, start a Kafka broker in this process on localhost.",
            "Settings: options here, then QFLEET_* environment variables, then the --config file."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {
            "0:stopped on request (Ctrl-C or SIGTERM)",
            "1:could not start, or the stream stopped after an error",
            "2:usage error or unusable settings"})
final class RunCommand implements Callable<Integer> {

    static final String PREFIX = "qfleet run: ";
    private static final long FINISH_TIMEOUT_SECONDS = 60;

    @Mixin
    ServiceOptions options;

    @Mixin
    DebugOption debug;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        ServiceConfig config = options.config(spec);
        ProductCatalogue catalogue = options.catalogue(spec, config);
        return runUntilStopped(PREFIX, config, catalogue, spec.commandLine().getErr(), false, null);
    }

    /**
     * Starts the service, prints the ready line, and waits until the process is asked to stop
     * (shutdown hook) or the stream fails.
     *
     * @param httpFallback when the HTTP port is taken, serve metrics and health on a free one instead of failing
     * @param whileRunning work to do once ready, in this thread, or null to just wait; when it
     *                     returns, the service is stopped
     */
    static int runUntilStopped(String prefix, ServiceConfig config, ProductCatalogue catalogue, PrintWriter err,
            boolean httpFallback, WhileRunning whileRunning) {
        ServiceRunner runner = new ServiceRunner(prefix, err, httpFallback);
        CountDownLatch stopRequested = new CountDownLatch(1);
        CountDownLatch finished = new CountDownLatch(1);
        // On Ctrl-C or SIGTERM: ask the work to end, give it time to finish and report, then close.
        Thread hook = new Thread(() -> {
            stopRequested.countDown();
            try {
                finished.await(FINISH_TIMEOUT_SECONDS, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            runner.close();
        }, "qfleet-shutdown");
        Runtime.getRuntime().addShutdownHook(hook);
        try {
            runner.start(config, catalogue, () -> stopRequested.getCount() == 0);
            err.println(runner.readyLine());
            runner.endpointsLine().ifPresent(err::println);
            err.flush();
            if (whileRunning != null) {
                return whileRunning.run(runner, stopRequested);
            }
            while (!stopRequested.await(1, TimeUnit.SECONDS)) {
                if (runner.failed()) {
                    err.println(prefix + "the stream stopped after an error; see the log above");
                    return 1;
                }
            }
            return 0;
        } catch (ServiceException e) {
            err.println(prefix + e.getMessage());
            return 1;
        } catch (InterruptedException e) {
            return 0;
        } finally {
            runner.close();
            err.println(prefix + "stopped");
            err.flush();
            finished.countDown();
            try {
                Runtime.getRuntime().removeShutdownHook(hook);
            } catch (IllegalStateException e) {
                // Already shutting down: the hook is running.
            }
        }
    }

    /** Work done while the service runs, e.g. the demo's simulated plant. */
    @FunctionalInterface
    interface WhileRunning {
        /** @param stopRequested counted down when the process is asked to stop */
        int run(ServiceRunner runner, CountDownLatch stopRequested) throws InterruptedException;
    }
}
