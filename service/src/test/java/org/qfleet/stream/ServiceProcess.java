package org.qfleet.stream;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;

/**
 * {@code qfleet run} in a JVM of its own, started from the test class path, as an operator would
 * start it; its output goes to a file. It can be stopped cleanly or killed like {@code kill -9}.
 */
final class ServiceProcess implements AutoCloseable {

    private final Process process;
    private final Path log;

    private ServiceProcess(Process process, Path log) {
        this.process = process;
        this.log = log;
    }

    static ServiceProcess start(Path log, String... runArguments) throws IOException {
        List<String> command = new ArrayList<>(List.of(
                Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx256m", "-cp", System.getProperty("java.class.path"), "org.qfleet.app.Main", "run",
                // A free port for the metrics and health endpoints: the default one may be taken on a shared machine.
                "--http-address", "localhost:0"));
        command.addAll(List.of(runArguments));
        Process p = new ProcessBuilder(command).redirectErrorStream(true).redirectOutput(log.toFile()).start();
        return new ServiceProcess(p, log);
    }

    /** Waits for the ready line; fails with the output when it does not come. */
    void awaitReady(Duration timeout) throws IOException, InterruptedException {
        long deadline = System.nanoTime() + timeout.toNanos();
        while (System.nanoTime() < deadline) {
            if (output().contains("qfleet run: ready")) {
                return;
            }
            if (!process.isAlive()) {
                break;
            }
            Thread.sleep(100);
        }
        throw new AssertionError("the service did not say it was ready within " + timeout + "; its output:\n" + output());
    }

    String output() throws IOException {
        return Files.exists(log) ? Files.readString(log) : "";
    }

    /** Like {@code kill -9}: no shutdown hook, no commit, no goodbye. */
    void kill() throws InterruptedException {
        process.destroyForcibly();
        process.waitFor();
    }

    /** Like Ctrl-C or {@code kill}: SIGTERM, then waits for the clean exit. */
    int stop(Duration timeout) throws InterruptedException {
        process.destroy();
        if (!process.waitFor(timeout.toMillis(), java.util.concurrent.TimeUnit.MILLISECONDS)) {
            process.destroyForcibly();
            process.waitFor();
        }
        return process.exitValue();
    }

    @Override
    public void close() throws InterruptedException {
        if (process.isAlive()) {
            kill();
        }
    }
}
