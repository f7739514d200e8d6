package org.qfleet.app;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import org.qfleet.sweep.SweepLimits;
import org.qfleet.verdict.CatalogueFile;
import org.qfleet.verdict.InvalidCatalogueException;
import org.qfleet.verdict.ProductCatalogue;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;

/**
 * The service's command-line options, shared by {@code run} and {@code demo}. An option given
 * here wins over the same setting from the environment or the {@code --config} file; options not
 * given leave those alone.
 */
final class ServiceOptions {

    @Option(names = "--config", paramLabel = "FILE",
            description = "Properties file with settings (keys as in the README, kafka.* passed to Kafka).")
    Path configFile;

    @Option(names = "--bootstrap-servers", paramLabel = "HOST:PORT[,...]",
            description = "Kafka brokers to use. Without them, a broker is started in this process.")
    String bootstrapServers;

    @Option(names = "--application-id", paramLabel = "ID",
            description = "Kafka Streams application id; instances with the same id share the work (default: qfleet).")
    String applicationId;

    @Option(names = "--threads", paramLabel = "N", description = "Stream threads (default: 2).")
    Integer threads;

    @Option(names = "--sweeps-topic", paramLabel = "TOPIC", description = "Input topic (default: qfleet.sweeps).")
    String sweepsTopic;

    @Option(names = "--results-topic", paramLabel = "TOPIC", description = "Results topic (default: qfleet.results).")
    String resultsTopic;

    @Option(names = "--rejects-topic", paramLabel = "TOPIC", description = "Rejects topic (default: qfleet.rejects).")
    String rejectsTopic;

    @Option(names = "--alerts-topic", paramLabel = "TOPIC", description = "Alerts topic (default: qfleet.alerts).")
    String alertsTopic;

    @Option(names = "--create-topics", description = "Create missing topics (always done with the embedded broker).")
    Boolean createTopics;

    @Option(names = "--partitions", paramLabel = "N",
            description = "Partitions of the sweeps and results topics when created (default: 6).")
    Integer partitions;

    @Option(names = "--replication-factor", paramLabel = "N",
            description = "Replication factor of created topics (default: 1 embedded, else the broker's default).")
    Integer replicationFactor;

    @Option(names = "--max-points", paramLabel = "N", description = "Reject sweeps with more than N points (default: " + SweepLimits.DEFAULT_MAX_POINTS + ").")
    Integer maxPoints;

    @Option(names = "--products", paramLabel = "FILE",
            description = "Product catalogue (JSON) for the verdicts (default: the demo plant's products).")
    Path productsFile;

    @Option(names = "--broker-port", paramLabel = "PORT", description = "Port of the embedded broker on localhost (default: 9092).")
    Integer brokerPort;

    @Option(names = "--data-dir", paramLabel = "DIR", description = "Data directory of the embedded broker (default: qfleet-data).")
    Path dataDir;

    @Option(names = "--clean-start", description = "Delete the embedded broker's data first.")
    Boolean cleanStart;

    @Option(names = "--http-address", paramLabel = "HOST:PORT",
            description = "Where /metrics, /health/live and /health/ready listen (default: localhost:9464; port 0 for a free one; off to turn them off).")
    String httpAddress;

    @Option(names = "--kafka", paramLabel = "KEY=VALUE",
            description = "A Kafka client or Streams setting, passed through (repeatable), e.g. --kafka security.protocol=SSL.")
    Map<String, String> kafka;

    /** The settings given on the command line, under their configuration keys. */
    Map<String, String> asSettings() {
        Map<String, String> s = new LinkedHashMap<>();
        put(s, ServiceConfig.BOOTSTRAP_SERVERS, bootstrapServers);
        put(s, ServiceConfig.APPLICATION_ID, applicationId);
        put(s, ServiceConfig.THREADS, threads);
        put(s, ServiceConfig.TOPIC_SWEEPS, sweepsTopic);
        put(s, ServiceConfig.TOPIC_RESULTS, resultsTopic);
        put(s, ServiceConfig.TOPIC_REJECTS, rejectsTopic);
        put(s, ServiceConfig.TOPIC_ALERTS, alertsTopic);
        put(s, ServiceConfig.CREATE_TOPICS, createTopics);
        put(s, ServiceConfig.PARTITIONS, partitions);
        put(s, ServiceConfig.REPLICATION_FACTOR, replicationFactor);
        put(s, ServiceConfig.MAX_POINTS, maxPoints);
        put(s, ServiceConfig.PRODUCTS_FILE, productsFile);
        put(s, ServiceConfig.BROKER_PORT, brokerPort);
        put(s, ServiceConfig.DATA_DIR, dataDir);
        put(s, ServiceConfig.CLEAN_START, cleanStart);
        put(s, ServiceConfig.HTTP_ADDRESS, httpAddress);
        if (kafka != null) {
            kafka.forEach((k, v) -> s.put(ServiceConfig.KAFKA_PREFIX + k, v));
        }
        return s;
    }

    /** The merged, validated settings; unusable ones are usage errors. */
    ServiceConfig config(CommandSpec spec) {
        return config(spec, Map.of());
    }

    /** As {@link #config(CommandSpec)}, with {@code defaults} below every source (the demo's own). */
    ServiceConfig config(CommandSpec spec, Map<String, String> defaults) {
        try {
            Map<String, ConfigSources.Setting> merged = new LinkedHashMap<>();
            defaults.forEach((k, v) -> merged.put(k, new ConfigSources.Setting(v, "default")));
            merged.putAll(ConfigSources.merge(configFile, System.getenv(), asSettings()));
            return ServiceConfig.from(merged);
        } catch (ConfigException e) {
            throw new ParameterException(spec.commandLine(), e.getMessage());
        }
    }

    /** The product catalogue the settings name, or the built-in one. */
    ProductCatalogue catalogue(CommandSpec spec, ServiceConfig config) {
        if (config.productsFile() == null) {
            return ProductCatalogue.demoPlant();
        }
        try {
            return CatalogueFile.read(config.productsFile());
        } catch (InvalidCatalogueException e) {
            throw new ParameterException(spec.commandLine(), e.getMessage());
        }
    }

    private static void put(Map<String, String> settings, String key, Object value) {
        if (value != null) {
            settings.put(key, value.toString());
        }
    }
}
