package org.qfleet.app.http;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;

class HttpAddressTest {

    @Test
    void readsHostAndPort() {
        assertThat(HttpAddress.parse("localhost:9464")).contains(new HttpAddress("localhost", 9464));
        assertThat(HttpAddress.parse(" 0.0.0.0:0 ")).contains(new HttpAddress("0.0.0.0", 0));
        assertThat(HttpAddress.parse("[::1]:8080")).contains(new HttpAddress("::1", 8080));
        assertThat(HttpAddress.parse("OFF")).isEmpty();
    }

    @Test
    void writesWhatItReads() {
        assertThat(new HttpAddress("::1", 80)).hasToString("[::1]:80");
        assertThat(HttpAddress.DEFAULT).hasToString("localhost:9464");
    }

    @Test
    void refusesWhatIsNotHostColonPort() {
        assertThatThrownBy(() -> HttpAddress.parse("localhost")).hasMessageContaining("HOST:PORT");
        assertThatThrownBy(() -> HttpAddress.parse(":9464")).hasMessageContaining("HOST:PORT");
        assertThatThrownBy(() -> HttpAddress.parse("localhost:")).hasMessageContaining("HOST:PORT");
        assertThatThrownBy(() -> HttpAddress.parse("localhost:http")).hasMessageContaining("'http' is not a whole number");
        assertThatThrownBy(() -> HttpAddress.parse("localhost:65536")).hasMessageContaining("between 0 and 65535");
        assertThatThrownBy(() -> HttpAddress.parse("::1:80")).hasMessageContaining("brackets");
    }
}
