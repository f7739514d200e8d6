package org.qfleet.app;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Function;
import org.qfleet.app.http.HttpAddress;
import org.qfleet.stream.StreamSettings;
import org.qfleet.stream.Topics;
import org.qfleet.sweep.SweepLimits;

/**
 * The settings of {@code run}, validated, from the merged sources ({@link ConfigSources}).
 *
 * @param stream             what the topology is told (its Kafka settings hold the bootstrap
 *                           servers only when some were configured)
 * @param embedded           whether to start the in-process broker (no bootstrap servers configured)
 * @param brokerPort         port of the embedded broker on localhost
 * @param dataDir            data directory of the embedded broker
 * @param cleanStart         wipe the data directory before starting the embedded broker
 * @param createTopics       create missing topics (always with the embedded broker)
 * @param streamPartitions   partitions of the sweeps and results topics when created
 * @param otherPartitions    partitions of the rejects and alerts topics when created
 * @param replicationFactor  replication factor of created topics; empty for the broker's default
 * @param productsFile       the product catalogue, or null for the built-in one of the demo plant
 * @param httpAddress        where the metrics and health endpoints listen; empty when turned off
 */
record ServiceConfig(
        StreamSettings stream,
        boolean embedded,
        int brokerPort,
        Path dataDir,
        boolean cleanStart,
        boolean createTopics,
        int streamPartitions,
        int otherPartitions,
        Optional<Short> replicationFactor,
        Path productsFile,
        Optional<HttpAddress> httpAddress) {

    static final String BOOTSTRAP_SERVERS = "bootstrap.servers";
    /** Kafka Streams' setting for where it keeps its local state. */
    static final String STREAMS_STATE_DIR = "state.dir";
    static final String APPLICATION_ID = "application.id";
    static final String THREADS = "threads";
    static final String TOPIC_SWEEPS = "topic.sweeps";
    static final String TOPIC_RESULTS = "topic.results";
    static final String TOPIC_REJECTS = "topic.rejects";
    static final String TOPIC_ALERTS = "topic.alerts";
    static final String PARTITIONS = "topic.partitions";
    static final String REPLICATION_FACTOR = "topic.replication.factor";
    static final String CREATE_TOPICS = "create.topics";
    static final String MAX_POINTS = "max.points";
    static final String MAX_SWEEP_BYTES = "max.sweep.bytes";
    static final String REJECT_PAYLOAD_BYTES = "reject.payload.max.bytes";
    static final String PRODUCTS_FILE = "products.file";
    static final String BROKER_PORT = "broker.port";
    static final String DATA_DIR = "data.dir";
    static final String CLEAN_START = "clean.start";
    static final String HTTP_ADDRESS = "http.address";
    /** Keys starting with this pass through to Kafka without it: {@code kafka.security.protocol}. */
    static final String KAFKA_PREFIX = "kafka.";

    static final Set<String> KEYS = new TreeSet<>(List.of(BOOTSTRAP_SERVERS, APPLICATION_ID, THREADS, TOPIC_SWEEPS,
            TOPIC_RESULTS, TOPIC_REJECTS, TOPIC_ALERTS, PARTITIONS, REPLICATION_FACTOR, CREATE_TOPICS, MAX_POINTS,
            MAX_SWEEP_BYTES, REJECT_PAYLOAD_BYTES, PRODUCTS_FILE, BROKER_PORT, DATA_DIR, CLEAN_START,
            HTTP_ADDRESS));

    static final int DEFAULT_PORT = 9092;
    static final String DEFAULT_DATA_DIR = "qfleet-data";
    static final int DEFAULT_PARTITIONS = 6;

    /** Validates the merged settings; unknown keys and unusable values are errors naming their origin. */
    static ServiceConfig from(Map<String, ConfigSources.Setting> settings) throws ConfigException {
        Reader r = new Reader(settings);
        Map<String, String> kafka = new LinkedHashMap<>();
        settings.forEach((key, setting) -> {
            if (key.startsWith(KAFKA_PREFIX) && key.length() > KAFKA_PREFIX.length()) {
                kafka.put(key.substring(KAFKA_PREFIX.length()), setting.value());
            }
        });
        for (Map.Entry<String, ConfigSources.Setting> e : settings.entrySet()) {
            if (!KEYS.contains(e.getKey()) && !e.getKey().startsWith(KAFKA_PREFIX)) {
                throw new ConfigException("unknown setting '" + e.getKey() + "' (from " + e.getValue().origin()
                        + "); known settings: " + String.join(", ", KEYS) + ", and kafka.* for Kafka's own");
            }
        }
        String bootstrap = r.text(BOOTSTRAP_SERVERS, null);
        if (bootstrap != null && bootstrap.isBlank()) {
            bootstrap = null;
        }
        if (bootstrap != null) {
            kafka.put(BOOTSTRAP_SERVERS, bootstrap);
        }
        Path dataDir = Path.of(r.text(DATA_DIR, DEFAULT_DATA_DIR));
        // Kafka Streams' own default is a folder under the OS temp directory, shared by every run on the
        // machine: a state left there by an earlier broker looks corrupted to the next one. Keep the
        // state next to the broker's data, so that both start clean or resume together.
        kafka.putIfAbsent(STREAMS_STATE_DIR, dataDir.resolve("streams").toAbsolutePath().normalize().toString());
        Topics topics;
        try {
            topics = new Topics(r.text(TOPIC_SWEEPS, Topics.DEFAULT.sweeps()), r.text(TOPIC_RESULTS, Topics.DEFAULT.results()),
                    r.text(TOPIC_REJECTS, Topics.DEFAULT.rejects()), r.text(TOPIC_ALERTS, Topics.DEFAULT.alerts()));
        } catch (IllegalArgumentException e) {
            throw new ConfigException("topic names: " + e.getMessage());
        }
        int minPoints = SweepLimits.DEFAULT.minPoints();
        SweepLimits limits = new SweepLimits(minPoints, r.integer(MAX_POINTS, SweepLimits.DEFAULT.maxPoints(), minPoints));
        String applicationId = r.text(APPLICATION_ID, StreamSettings.DEFAULT_APPLICATION_ID);
        if (applicationId.isBlank()) {
            throw new ConfigException("setting '" + APPLICATION_ID + "' is blank");
        }
        StreamSettings stream = new StreamSettings(topics, applicationId,
                r.integer(THREADS, StreamSettings.DEFAULT_THREADS, 1), limits,
                r.integer(MAX_SWEEP_BYTES, StreamSettings.DEFAULT_MAX_SWEEP_BYTES, 1),
                r.integer(REJECT_PAYLOAD_BYTES, StreamSettings.DEFAULT_MAX_REJECT_PAYLOAD_BYTES, 0), kafka);
        boolean embedded = bootstrap == null;
        int port = r.integer(BROKER_PORT, DEFAULT_PORT, 0);
        if (port > 65535) {
            throw new ConfigException("setting '" + BROKER_PORT + "' must be a port number (0 to 65535), got " + port);
        }
        int partitions = r.integer(PARTITIONS, DEFAULT_PARTITIONS, 1);
        Optional<Short> replication = settings.containsKey(REPLICATION_FACTOR)
                ? Optional.of((short) r.integer(REPLICATION_FACTOR, 1, 1))
                : embedded ? Optional.of((short) 1) : Optional.empty();
        String products = r.text(PRODUCTS_FILE, null);
        Optional<HttpAddress> http = settings.containsKey(HTTP_ADDRESS)
                ? r.parse(HTTP_ADDRESS, null, HttpAddress::parse)
                : Optional.of(HttpAddress.DEFAULT);
        return new ServiceConfig(stream, embedded, port, dataDir,
                r.flag(CLEAN_START), embedded || r.flag(CREATE_TOPICS), partitions, 1, replication,
                products == null || products.isBlank() ? null : Path.of(products), http);
    }

    /** Where clients connect; for the embedded broker, known only once it runs. */
    String bootstrapServers() {
        return stream.bootstrapServers();
    }

    /** Partitions of each topic when created. */
    Map<String, Integer> partitionsByTopic() {
        Topics t = stream.topics();
        return Map.of(t.sweeps(), streamPartitions, t.results(), streamPartitions, t.rejects(), otherPartitions,
                t.alerts(), otherPartitions);
    }

    /** Reads typed values, naming the setting and its origin when one is unusable. */
    private record Reader(Map<String, ConfigSources.Setting> settings) {

        String text(String key, String fallback) {
            ConfigSources.Setting s = settings.get(key);
            return s == null ? fallback : s.value();
        }

        int integer(String key, int fallback, int min) throws ConfigException {
            return parse(key, fallback, v -> {
                int value = Integer.parseInt(v);
                if (value < min) {
                    throw new IllegalArgumentException("must be at least " + min);
                }
                return value;
            });
        }

        boolean flag(String key) throws ConfigException {
            return parse(key, false, v -> switch (v.toLowerCase(java.util.Locale.ROOT)) {
                case "true", "yes", "1" -> true;
                case "false", "no", "0", "" -> false;
                default -> throw new IllegalArgumentException("must be true or false");
            });
        }

        <T> T parse(String key, T fallback, Function<String, T> parser) throws ConfigException {
            ConfigSources.Setting s = settings.get(key);
            if (s == null) {
                return fallback;
            }
            try {
                return parser.apply(s.value().trim());
            } catch (IllegalArgumentException e) {
                String why = e instanceof NumberFormatException ? "is not a whole number" : e.getMessage();
                throw new ConfigException("setting '" + key + "' (from " + s.origin() + ") " + why + ": '" + s.value() + "'");
            }
        }
    }
}
