package org.qfleet.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ServiceConfigTest {

    @TempDir
    Path dir;

    @Test
    void commandLineWinsOverEnvironmentWhichWinsOverTheFile() throws Exception {
        Path file = Files.writeString(dir.resolve("qfleet.properties"), """
                bootstrap.servers=file:9092
                application.id=from-file
                threads=3
                topic.sweeps=file.sweeps
                """);
        Map<String, String> env = Map.of("QFLEET_APPLICATION_ID", "from-env", "QFLEET_THREADS", "4", "HOME", "/nowhere");
        Map<String, String> cli = Map.of("threads", "5");

        ServiceConfig config = ServiceConfig.from(ConfigSources.merge(file, env, cli));

        assertThat(config.bootstrapServers()).isEqualTo("file:9092");
        assertThat(config.stream().applicationId()).isEqualTo("from-env");
        assertThat(config.stream().threads()).isEqualTo(5);
        assertThat(config.stream().topics().sweeps()).isEqualTo("file.sweeps");
        assertThat(config.stream().topics().results()).isEqualTo("qfleet.results");
        assertThat(config.embedded()).isFalse();
        assertThat(config.createTopics()).isFalse();
        assertThat(config.replicationFactor()).isEmpty();
    }

    @Test
    void kafkaSettingsPassThroughFromEverySourceAndOverrideTheServiceDefaults() throws Exception {
        Path file = Files.writeString(dir.resolve("q.properties"), "kafka.security.protocol=SSL\nkafka.ssl.truststore.location=/etc/t.jks\n");
        Map<String, String> env = Map.of("QFLEET_KAFKA_SASL_MECHANISM", "PLAIN");
        Map<String, String> cli = Map.of("kafka.processing.guarantee", "at_least_once", "bootstrap.servers", "b:9093");

        ServiceConfig config = ServiceConfig.from(ConfigSources.merge(file, env, cli));

        assertThat(config.stream().kafka()).containsEntry("security.protocol", "SSL")
                .containsEntry("ssl.truststore.location", "/etc/t.jks")
                .containsEntry("sasl.mechanism", "PLAIN")
                .containsEntry("bootstrap.servers", "b:9093");
        assertThat(config.stream().streamsProperties()).containsEntry("processing.guarantee", "at_least_once")
                .containsEntry("security.protocol", "SSL");
    }

    @Test
    void withoutBootstrapServersTheEmbeddedBrokerIsUsedWithItsDefaults() throws Exception {
        ServiceConfig config = ServiceConfig.from(ConfigSources.merge(null, Map.of(), Map.of()));

        assertThat(config.embedded()).isTrue();
        assertThat(config.createTopics()).isTrue();
        assertThat(config.brokerPort()).isEqualTo(9092);
        assertThat(config.dataDir()).isEqualTo(Path.of("qfleet-data"));
        assertThat(config.replicationFactor()).isEqualTo(Optional.of((short) 1));
        assertThat(config.stream().applicationId()).isEqualTo("qfleet");
        assertThat(config.stream().streamsProperties()).containsEntry("processing.guarantee", "exactly_once_v2")
                .doesNotContainKey("bootstrap.servers");
        assertThat(config.partitionsByTopic()).containsEntry("qfleet.sweeps", 6).containsEntry("qfleet.results", 6)
                .containsEntry("qfleet.rejects", 1);
    }

    @Test
    void unusableSettingsNameTheSettingAndWhereItCameFrom() throws Exception {
        Path file = Files.writeString(dir.resolve("bad.properties"), "threads=many\n");
        assertThatThrownBy(() -> ServiceConfig.from(ConfigSources.merge(file, Map.of(), Map.of())))
                .isInstanceOf(ConfigException.class)
                .hasMessage("setting 'threads' (from " + file + ") is not a whole number: 'many'");
        assertThatThrownBy(() -> ServiceConfig.from(ConfigSources.merge(null, Map.of("QFLEET_TOPIC_PARTITIONS", "0"), Map.of())))
                .hasMessage("setting 'topic.partitions' (from environment variable QFLEET_TOPIC_PARTITIONS) must be at least 1: '0'");
        assertThatThrownBy(() -> ServiceConfig.from(ConfigSources.merge(null, Map.of(), Map.of("clean.start", "maybe"))))
                .hasMessageContaining("'clean.start' (from command line) must be true or false");
        assertThatThrownBy(() -> ServiceConfig.from(ConfigSources.merge(null, Map.of(), Map.of("max.points", "3"))))
                .hasMessageContaining("must be at least 7");
    }

    @Test
    void unknownSettingsAreRefusedSoATypoIsNotIgnored() throws Exception {
        Path file = Files.writeString(dir.resolve("typo.properties"), "bootstrap.server=x:9092\n");

        assertThatThrownBy(() -> ServiceConfig.from(ConfigSources.merge(file, Map.of(), Map.of())))
                .hasMessageStartingWith("unknown setting 'bootstrap.server' (from " + file + "); known settings: ")
                .hasMessageContaining("bootstrap.servers");
    }

    @Test
    void topicsMustDiffer() {
        assertThatThrownBy(() -> ServiceConfig.from(ConfigSources.merge(null, Map.of(),
                Map.of("topic.results", "same", "topic.rejects", "same"))))
                .hasMessageContaining("four different names");
    }

    @Test
    void environmentVariableNamesFollowTheKeys() {
        assertThat(ConfigSources.envName("bootstrap.servers")).isEqualTo("QFLEET_BOOTSTRAP_SERVERS");
        assertThat(ConfigSources.fromEnvironment(Map.of("QFLEET_KAFKA_SECURITY_PROTOCOL", "SSL", "PATH", "/bin")))
                .containsExactly(Map.entry("kafka.security.protocol", "SSL"));
    }
}
