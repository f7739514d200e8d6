package org.qfleet.stream;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.qfleet.drift.Measurement;

class DecodedStatesTest {

    private final DecodedStates<Measurement> states = new DecodedStates<>(Measurement.class, 2);

    private static Measurement unit(String id, double qu) {
        return new Measurement("p", "l", "s", id, 1L, qu, 1e10, 20, List.of());
    }

    @Test
    void aStateWrittenIsReusedWhileTheStoreHoldsTheSameBytes() {
        Measurement written = unit("u1", 5000);
        byte[] stored = states.write("k", written);

        assertThat(states.read("k", Arrays.copyOf(stored, stored.length))).isSameAs(written);
    }

    @Test
    void otherBytesUnderTheKeyAreDecodedAfresh() {
        states.write("k", unit("u1", 5000));
        byte[] other = DriftJson.write(unit("u2", 6000));

        assertThat(states.read("k", other)).isEqualTo(unit("u2", 6000));
        assertThat(states.read("k", null)).isNull();
    }

    @Test
    void aRemovedOrEvictedStateIsDecodedAgain() {
        Measurement written = unit("u1", 5000);
        byte[] stored = states.write("a", written);
        states.remove("a");
        assertThat(states.read("a", stored)).isEqualTo(written).isNotSameAs(written);

        Measurement b = unit("b", 1);
        byte[] bBytes = states.write("b", b);
        states.write("c", unit("c", 2));
        states.write("d", unit("d", 3));
        assertThat(states.read("b", bBytes)).isEqualTo(b).isNotSameAs(b);
    }
}
