package org.qfleet.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.qfleet.app.http.HttpAddress;

/** The {@code http.address} setting: default, every source, off, and unusable values. */
class ServiceConfigHttpTest {

    @TempDir
    Path dir;

    @Test
    void theEndpointsListenOnLocalhostByDefault() throws Exception {
        ServiceConfig config = ServiceConfig.from(ConfigSources.merge(null, Map.of(), Map.of()));
        assertThat(config.httpAddress()).contains(new HttpAddress("localhost", 9464));
    }

    @Test
    void theAddressComesFromTheFileTheEnvironmentOrTheCommandLine() throws Exception {
        Path file = Files.writeString(dir.resolve("q.properties"), "http.address=0.0.0.0:9500\n");
        assertThat(ServiceConfig.from(ConfigSources.merge(file, Map.of(), Map.of())).httpAddress())
                .contains(new HttpAddress("0.0.0.0", 9500));
        Map<String, String> env = Map.of("QFLEET_HTTP_ADDRESS", "127.0.0.1:0");
        assertThat(ServiceConfig.from(ConfigSources.merge(file, env, Map.of())).httpAddress())
                .contains(new HttpAddress("127.0.0.1", 0));
        assertThat(ServiceConfig.from(ConfigSources.merge(file, env, Map.of("http.address", "[::1]:9600"))).httpAddress())
                .contains(new HttpAddress("::1", 9600));
    }

    @Test
    void offTurnsTheEndpointsOff() throws Exception {
        assertThat(ServiceConfig.from(ConfigSources.merge(null, Map.of("QFLEET_HTTP_ADDRESS", "off"), Map.of())).httpAddress())
                .isEmpty();
    }

    @Test
    void anUnusableAddressNamesTheSettingAndItsOrigin() {
        assertThatThrownBy(() -> ServiceConfig.from(ConfigSources.merge(null, Map.of(), Map.of("http.address", "9464"))))
                .isInstanceOf(ConfigException.class)
                .hasMessageContaining("'http.address' (from command line)")
                .hasMessageContaining("HOST:PORT");
        assertThatThrownBy(() -> ServiceConfig.from(ConfigSources.merge(null, Map.of("QFLEET_HTTP_ADDRESS", "localhost:70000"),
                Map.of())))
                .isInstanceOf(ConfigException.class)
                .hasMessageContaining("environment variable QFLEET_HTTP_ADDRESS")
                .hasMessageContaining("65535");
    }
}
