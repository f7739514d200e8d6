package org.qfleet.app;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicBoolean;
import org.apache.kafka.clients.producer.ProducerConfig;
import org.qfleet.codec.SweepMessageWriter;
import org.qfleet.codec.TraceForm;
import org.qfleet.sim.DemoPlant;
import org.qfleet.sweep.Sweep;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** {@code qfleet simulate}: publishes sweeps of the invented demo plant to any Kafka broker. */
@Command(name = "simulate",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = {
            "Publish sweep messages of the invented demo plant (two products, eight stations, lots of",
            "200 to 400 units) to a Kafka topic at a steady rate, keyed by lot id.",
            "With --out DIR: write them as files DIR/<sweepId>.json instead, one message each."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {
            "0:every sweep was published",
            "1:publishing failed",
            "2:usage error"})
final class SimulateCommand implements Callable<Integer> {

    @Option(names = "--bootstrap-servers", paramLabel = "HOST:PORT[,...]", defaultValue = "localhost:9092",
            description = "Kafka brokers (default: ${DEFAULT-VALUE}).")
    String bootstrapServers;

    @Option(names = "--topic", paramLabel = "TOPIC", defaultValue = "qfleet.sweeps",
            description = "Topic to publish to (default: ${DEFAULT-VALUE}).")
    String topic;

    @Option(names = "--rate", paramLabel = "PER_SECOND", defaultValue = "50",
            description = "Sweeps per second; 0 for as fast as possible (default: ${DEFAULT-VALUE}).")
    double rate;

    @Option(names = "--count", paramLabel = "N", defaultValue = "1000",
            description = "Sweeps to publish; 0 to go on until Ctrl-C (default: ${DEFAULT-VALUE}).")
    long count;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Seed of the simulated plant (default: ${DEFAULT-VALUE}).")
    long seed;

    @Option(names = "--form", paramLabel = "FORM[,FORM...]", defaultValue = "re-im", split = ",",
            converter = TraceFormConverter.class, completionCandidates = TraceFormConverter.Names.class,
            description = "How traces are written: ${COMPLETION-CANDIDATES}; several are used in turn (default: ${DEFAULT-VALUE}).")
    List<TraceForm> forms;

    @Option(names = "--kafka", paramLabel = "KEY=VALUE", description = "A Kafka producer setting, passed through (repeatable).")
    Map<String, String> kafka;

    @Option(names = "--out", paramLabel = "DIR",
            description = "Write the messages as files DIR/<sweepId>.json (created if needed) instead of publishing them.")
    Path out;

    @Mixin
    DebugOption debug;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws InterruptedException {
        if (!(rate >= 0) || Double.isInfinite(rate)) {
            throw new ParameterException(spec.commandLine(), "--rate must be a number of sweeps per second, 0 or more, got " + rate);
        }
        if (count < 0) {
            throw new ParameterException(spec.commandLine(), "--count must be 0 or more, got " + count);
        }
        PrintWriter err = spec.commandLine().getErr();
        if (out != null) {
            return writeFiles(err);
        }
        Map<String, Object> config = new HashMap<>();
        config.put(ProducerConfig.BOOTSTRAP_SERVERS_CONFIG, bootstrapServers);
        if (kafka != null) {
            config.putAll(kafka);
        }
        AtomicBoolean stop = new AtomicBoolean();
        Thread hook = new Thread(() -> stop.set(true), "qfleet-simulate-stop");
        Runtime.getRuntime().addShutdownHook(hook);
        long start = System.nanoTime();
        long sent;
        SweepPublisher publisher = new SweepPublisher(config, topic, new DemoPlant(seed, Clock.systemUTC()), forms);
        try (publisher) {
            err.println("qfleet simulate: publishing " + (count == 0 ? "sweeps until Ctrl-C" : count + " sweeps")
                    + " of the invented demo plant to " + topic + " on " + bootstrapServers
                    + (rate > 0 ? String.format(Locale.ROOT, " at %.1f/s", rate) : " as fast as possible"));
            err.flush();
            sent = publisher.publish(count, rate, stop::get);
        } finally {
            try {
                Runtime.getRuntime().removeShutdownHook(hook);
            } catch (IllegalStateException e) {
                // Shutting down already.
            }
        }
        double seconds = (System.nanoTime() - start) / 1e9;
        if (publisher.failure() != null) {
            err.println("qfleet simulate: publishing failed after " + publisher.acknowledged() + " sweeps: " + publisher.failure().getMessage());
            return 1;
        }
        err.println(String.format(Locale.ROOT, "qfleet simulate: published %d sweeps to %s in %.1f s (%.1f/s)",
                publisher.acknowledged(), topic, seconds, publisher.acknowledged() / seconds));
        err.flush();
        return publisher.acknowledged() == sent ? 0 : 1;
    }

    private int writeFiles(PrintWriter err) {
        if (count == 0) {
            throw new ParameterException(spec.commandLine(), "--out needs a --count above 0");
        }
        DemoPlant plant = new DemoPlant(seed, Clock.systemUTC());
        List<SweepMessageWriter> writers = forms.stream().map(SweepMessageWriter::new).toList();
        try {
            Files.createDirectories(out);
            for (long i = 0; i < count; i++) {
                Sweep sweep = plant.next().sweep();
                Files.write(out.resolve(sweep.info().sweepId() + ".json"), writers.get((int) (i % writers.size())).write(sweep));
            }
        } catch (IOException e) {
            err.println("qfleet simulate: cannot write the sweep messages to " + out + ": " + e.getMessage());
            return 1;
        }
        err.println("qfleet simulate: wrote " + count + " sweep messages of the invented demo plant to " + out);
        return 0;
    }
}
