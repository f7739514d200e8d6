package org.qfleet.app;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.stream.Stream;
import org.apache.kafka.clients.admin.Admin;
import org.apache.kafka.clients.admin.AdminClientConfig;
import org.apache.kafka.common.KafkaException;
import org.qfleet.app.broker.BrokerException;
import org.qfleet.app.broker.EmbeddedBroker;
import org.qfleet.codec.TraceForm;
import org.qfleet.sweep.SweepLimits;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code qfleet bench}: measures, in one run on one broker, how fast a plain consumer can read and
 * decode sweep messages (the raw ceiling), how fast the full service with exactly-once works
 * through the same messages (saturation), and its end-to-end latency at a fixed offered rate;
 * with CPU and heap for each phase. Prints a table and writes the figures as JSON.
 */
@Command(name = "bench",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = {
            "Measure throughput and latency: publish simulated sweeps into fresh topics,",
            "read and decode them with a plain consumer (the raw ceiling), let the full",
            "service with exactly-once work through them (saturation), then offer sweeps",
            "at a fixed rate and record end-to-end latency; CPU and heap for each phase.",
            "Without --bootstrap-servers, a Kafka broker is started in this process.",
            "Prints a table on stdout and writes the figures as JSON to --output."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {
            "0:measured, and every sweep came out exactly once",
            "1:some sweeps were lost or duplicated, or the run failed",
            "2:usage error"})
final class BenchCommand implements Callable<Integer> {

    /** As few points as the service accepts ({@link SweepLimits#DEFAULT}). */
    static final int MIN_POINTS = 7;
    static final int MAX_POINTS = 10_001;
    static final long MAX_SWEEPS = 50_000_000;
    /** Distinct sweeps simulated for 401 points; fewer for longer sweeps, to bound the memory they take. */
    static final int DISTINCT_AT_401 = 500;
    private static final Duration REACH_TIMEOUT = Duration.ofSeconds(10);
    private static final long FINISH_TIMEOUT_SECONDS = 60;

    @Option(names = "--bootstrap-servers", paramLabel = "HOST:PORT[,...]",
            description = "Kafka brokers to measure against. Without them, a broker is started in this process.")
    String bootstrapServers;

    @Option(names = "--kafka", paramLabel = "KEY=VALUE",
            description = "A Kafka client or Streams setting for every client of the run (repeatable), e.g. --kafka security.protocol=SSL.")
    Map<String, String> kafka;

    @Option(names = "--sweeps", paramLabel = "N", defaultValue = "50000",
            description = "Sweeps for the raw and saturation phases (default: ${DEFAULT-VALUE}).")
    long sweeps;

    @Option(names = "--warm-up", paramLabel = "N", defaultValue = "30000",
            description = "Sweeps published, read and worked through once, unmeasured, before the measured phases, "
                    + "so that the JIT has compiled the clients, the broker and the service; 0 for none (default: ${DEFAULT-VALUE}).")
    long warmUp;

    @Option(names = "--rate", paramLabel = "PER_SECOND", defaultValue = "200",
            description = "Offered rate of the latency phase (default: ${DEFAULT-VALUE}).")
    double rate;

    @Option(names = "--rate-duration", paramLabel = "TIME", defaultValue = "20s", converter = DurationConverter.class,
            description = "How long the latency phase publishes (default: ${DEFAULT-VALUE}).")
    Duration rateDuration;

    @Option(names = "--points", paramLabel = "N", defaultValue = "401",
            description = "Points per sweep, " + MIN_POINTS + " to " + MAX_POINTS + " (default: ${DEFAULT-VALUE}).")
    int points;

    @Option(names = "--form", paramLabel = "FORM[,FORM...]", defaultValue = "re-im", split = ",",
            converter = TraceFormConverter.class, completionCandidates = TraceFormConverter.Names.class,
            description = "How traces are written: ${COMPLETION-CANDIDATES}; several are used in turn (default: ${DEFAULT-VALUE}).")
    List<TraceForm> forms;

    @Option(names = "--partitions", paramLabel = "N",
            description = "Partitions of the sweeps and results topics (default: the number of cores).")
    Integer partitions;

    @Option(names = "--threads", paramLabel = "N", defaultValue = "2",
            description = "Stream threads of the service (default: ${DEFAULT-VALUE}).")
    int threads;

    @Option(names = "--late-after", paramLabel = "TIME", defaultValue = "250ms", converter = DurationConverter.class,
            description = "In the latency phase, results slower than this count as late (default: ${DEFAULT-VALUE}).")
    Duration lateAfter;

    @Option(names = "--stall-timeout", paramLabel = "TIME", defaultValue = "60s", converter = DurationConverter.class,
            description = "Give up on a phase when nothing has come out for this long; what is missing counts as lost (default: ${DEFAULT-VALUE}).")
    Duration stallTimeout;

    @Option(names = "--skip-raw", description = "Leave out the raw consume-and-decode phase.")
    boolean skipRaw;

    @Option(names = "--skip-latency", description = "Leave out the phase at a fixed offered rate.")
    boolean skipLatency;

    @Option(names = "--output", paramLabel = "FILE", defaultValue = "bench.json",
            description = "Where to write the figures as JSON; '-' for stdout (the table then goes to stderr) (default: ${DEFAULT-VALUE}).")
    String output;

    @Option(names = "--keep-topics", description = "On a given cluster, keep the run's topics (deleted by default).")
    boolean keepTopics;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Seed of the simulated sweeps (default: ${DEFAULT-VALUE}).")
    long seed;

    @Mixin
    DebugOption debug;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws InterruptedException {
        BenchRun.Plan plan = validatedPlan(Map.of());
        Path jsonFile = outputFile();
        PrintWriter err = spec.commandLine().getErr();
        AtomicBoolean stop = new AtomicBoolean();
        CountDownLatch finished = new CountDownLatch(1);
        Thread hook = new Thread(() -> {
            stop.set(true);
            try {
                finished.await(FINISH_TIMEOUT_SECONDS, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }, "qfleet-bench-stop");
        Runtime.getRuntime().addShutdownHook(hook);
        Path temporary = null;
        EmbeddedBroker broker = null;
        try (BenchProgress progress = new BenchProgress(err, System::nanoTime)) {
            temporary = Files.createTempDirectory("qfleet-bench-");
            Map<String, String> settings = new LinkedHashMap<>();
            settings.put(ServiceConfig.STREAMS_STATE_DIR, temporary.resolve("streams").toString());
            if (kafka != null) {
                settings.putAll(kafka);
            }
            if (bootstrapServers == null) {
                say(err, "starting a Kafka broker in this process (data in " + temporary + ")");
                broker = EmbeddedBroker.start(temporary.resolve("broker"), 0, false);
                settings.put(AdminClientConfig.BOOTSTRAP_SERVERS_CONFIG, broker.bootstrapServers());
            } else {
                settings.put(AdminClientConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrapServers);
                checkReachable(settings);
            }
            plan = validatedPlan(settings);
            BenchRun run = new BenchRun(plan, err, progress, stop::get);
            BenchFigures figures;
            try {
                figures = run.run();
            } finally {
                if (broker == null && !keepTopics) {
                    deleteTopics(settings, run, err);
                }
            }
            report(figures, jsonFile, err);
            return figures.allAccounted() ? 0 : 1;
        } catch (BenchException | BrokerException e) {
            say(err, e.getMessage());
            if (debug.enabled) {
                e.printStackTrace(err);
            }
            return 1;
        } catch (InterruptedException e) {
            say(err, "stopped on request");
            return 1;
        } catch (IOException e) {
            say(err, "cannot write " + jsonFile + ": " + e.getMessage());
            return 1;
        } finally {
            if (broker != null) {
                broker.close();
            }
            if (temporary != null) {
                deleteTree(temporary);
            }
            finished.countDown();
            try {
                Runtime.getRuntime().removeShutdownHook(hook);
            } catch (IllegalStateException e) {
                // Already shutting down: the hook is running.
            }
        }
    }

    /** The plan from the options, or a usage error naming the option. */
    private BenchRun.Plan validatedPlan(Map<String, String> settings) {
        if (sweeps < 1 || sweeps > MAX_SWEEPS) {
            throw usage("--sweeps must lie between 1 and " + MAX_SWEEPS + ", got " + sweeps);
        }
        if (warmUp < 0 || warmUp > MAX_SWEEPS) {
            throw usage("--warm-up must lie between 0 and " + MAX_SWEEPS + ", got " + warmUp);
        }
        if (!(rate > 0) || Double.isInfinite(rate)) {
            throw usage("--rate must be a positive number of sweeps per second, got " + rate);
        }
        if (!skipLatency && rate * rateDuration.toNanos() / 1e9 > MAX_SWEEPS) {
            throw usage("--rate times --rate-duration must stay below " + MAX_SWEEPS + " sweeps");
        }
        if (points < MIN_POINTS || points > MAX_POINTS) {
            throw usage("--points must lie between " + MIN_POINTS + " and " + MAX_POINTS + ", got " + points);
        }
        int cores = Runtime.getRuntime().availableProcessors();
        int topicPartitions = partitions == null ? cores : partitions;
        if (topicPartitions < 1 || topicPartitions > 10_000) {
            throw usage("--partitions must lie between 1 and 10000, got " + topicPartitions);
        }
        if (threads < 1 || threads > 64) {
            throw usage("--threads must lie between 1 and 64, got " + threads);
        }
        if (bootstrapServers != null && bootstrapServers.isBlank()) {
            throw usage("--bootstrap-servers is blank; leave it out to start a broker in this process");
        }
        int distinct = (int) Math.min(sweeps, Math.max(16, (long) DISTINCT_AT_401 * 401 / Math.max(points, 401)));
        Optional<Short> replication = bootstrapServers == null ? Optional.of((short) 1) : Optional.empty();
        return new BenchRun.Plan(bootstrapServers == null ? "embedded" : bootstrapServers, settings, replication, sweeps, warmUp, points,
                distinct, forms, topicPartitions, threads, rate, rateDuration, lateAfter, stallTimeout, skipRaw, skipLatency, seed);
    }

    /** Where the JSON goes, or null for stdout; a folder that does not exist is a usage error. */
    private Path outputFile() {
        if ("-".equals(output)) {
            return null;
        }
        if (output.isBlank()) {
            throw usage("--output is blank; give a file name, or '-' for stdout");
        }
        Path file = Path.of(output).toAbsolutePath();
        if (Files.isDirectory(file)) {
            throw usage("--output " + output + " is a folder; give a file name");
        }
        if (file.getParent() != null && !Files.isDirectory(file.getParent())) {
            throw usage("--output: the folder " + file.getParent() + " does not exist");
        }
        return file;
    }

    private ParameterException usage(String message) {
        return new ParameterException(spec.commandLine(), message);
    }

    private void report(BenchFigures figures, Path jsonFile, PrintWriter err) throws IOException {
        PrintWriter table = jsonFile == null ? err : spec.commandLine().getOut();
        BenchReport.table(figures).forEach(table::println);
        table.flush();
        String json = BenchReport.json(figures);
        if (jsonFile == null) {
            spec.commandLine().getOut().println(json);
            spec.commandLine().getOut().flush();
        } else {
            Files.writeString(jsonFile, json + "\n", StandardCharsets.UTF_8);
            say(err, "figures written to " + jsonFile);
        }
    }

    private static void checkReachable(Map<String, String> settings) throws BenchException, InterruptedException {
        Admin admin = Admin.create(Map.copyOf(settings));
        try {
            admin.describeCluster().nodes().get(REACH_TIMEOUT.toMillis(), TimeUnit.MILLISECONDS);
        } catch (ExecutionException | TimeoutException | KafkaException e) {
            throw new BenchException("cannot reach Kafka at " + settings.get(AdminClientConfig.BOOTSTRAP_SERVERS_CONFIG)
                    + " within " + REACH_TIMEOUT.toSeconds() + " s: " + BenchException.reason(e), e);
        } finally {
            // Do not wait for the call that timed out.
            admin.close(Duration.ZERO);
        }
    }

    /** Deletes the run's topics and the service's internal ones from a given cluster. */
    private static void deleteTopics(Map<String, String> settings, BenchRun run, PrintWriter err) {
        try (Admin admin = Admin.create(Map.copyOf(settings))) {
            List<String> ours = admin.listTopics().names().get(REACH_TIMEOUT.toMillis(), TimeUnit.MILLISECONDS).stream()
                    .filter(run::owns).toList();
            admin.deleteTopics(ours).all().get(REACH_TIMEOUT.toMillis(), TimeUnit.MILLISECONDS);
        } catch (ExecutionException | TimeoutException | KafkaException e) {
            say(err, "could not delete the run's topics (" + BenchException.reason(e) + "); they start with qfleet-bench-");
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    private static void deleteTree(Path dir) {
        try (Stream<Path> paths = Files.walk(dir)) {
            paths.sorted(Comparator.reverseOrder()).forEach(p -> {
                try {
                    Files.deleteIfExists(p);
                } catch (IOException e) {
                    // Best effort: a temporary folder.
                }
            });
        } catch (IOException e) {
            // Best effort: a temporary folder.
        }
    }

    private static void say(PrintWriter err, String message) {
        err.println(BenchProgress.PREFIX + message);
        err.flush();
    }
}
