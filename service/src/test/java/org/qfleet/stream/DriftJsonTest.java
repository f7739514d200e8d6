package org.qfleet.stream;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.qfleet.drift.Measurement;

class DriftJsonTest {

    private static final String RESULT = """
            {"source":"qfleet.sweeps/0@7","sweepId":"s-1","stationId":"st-02","product":"cav-x104",
             "lot":"X104-a-001","unit":"X104-a-001-0007","measuredAt":"2024-05-17T09:30:00.125+02:00",
             "f0Hz":1.04E10,"f0UncertaintyHz":1200.0,"qLoaded":5400.5,"qUnloaded":5961.25,
             "coupling1":0.05,"coupling2":null,"resonanceDb":-24.5,"method":"complex-circle",
             "flags":["few-points-in-band","span-narrow"],"topology":"transmission","points":401,
             "verdict":{"status":"pass","reasons":[]},"extra":[{"a":[1,2,{"b":"product"}]}]}
            """;

    private static Optional<Measurement> measurement(String json) {
        return DriftJson.measurement(json.getBytes(StandardCharsets.UTF_8));
    }

    @Test
    void readsTheFieldsDriftUsesAndSkipsTheRest() {
        Measurement m = measurement(RESULT).orElseThrow();

        assertThat(m.product()).isEqualTo("cav-x104");
        assertThat(m.lot()).isEqualTo("X104-a-001");
        assertThat(m.station()).isEqualTo("st-02");
        assertThat(m.unit()).isEqualTo("X104-a-001-0007");
        assertThat(m.measuredAt()).isEqualTo(Instant.parse("2024-05-17T07:30:00.125Z").toEpochMilli());
        assertThat(m.qUnloaded()).isEqualTo(5961.25);
        assertThat(m.f0Hz()).isEqualTo(1.04e10);
        assertThat(m.levelDb()).isEqualTo(24.5);
        assertThat(m.flags()).containsExactly("few-points-in-band", "span-narrow");
    }

    @Test
    void aNotchHasNoCouplingLevelAndNullNumbersAreUnknown() {
        Measurement m = measurement(RESULT.replace("\"transmission\"", "\"notch\"")
                .replace("\"qUnloaded\":5961.25", "\"qUnloaded\":null")).orElseThrow();

        assertThat(m.levelDb()).isNaN();
        assertThat(m.qUnloaded()).isNaN();
        assertThat(m.f0Hz()).isEqualTo(1.04e10);
    }

    @Test
    void aResultWithoutWhatDriftNeedsGivesNothing() {
        assertThat(measurement(RESULT.replace("\"lot\":\"X104-a-001\",", ""))).isEmpty();
        assertThat(measurement(RESULT.replace("\"product\":\"cav-x104\"", "\"product\":\" \""))).isEmpty();
        assertThat(measurement(RESULT.replace("\"stationId\":\"st-02\"", "\"stationId\":2"))).isEmpty();
        assertThat(measurement(RESULT.replace("2024-05-17T09:30:00.125+02:00", "yesterday"))).isEmpty();
    }

    @Test
    void somethingThatIsNotAResultObjectGivesNothing() {
        assertThat(measurement("")).isEmpty();
        assertThat(measurement("[1,2]")).isEmpty();
        assertThat(measurement("{\"product\":")).isEmpty();
        assertThat(measurement(RESULT.substring(0, RESULT.length() / 2))).isEmpty();
    }

    @Test
    void statesReadBackBitForBit() {
        Measurement m = new Measurement("p", "l", "s", "u", 42L, 0.1 + 0.2, Double.MIN_VALUE, Double.NaN,
                List.of("low-snr"));

        Measurement back = DriftJson.read(DriftJson.write(m), Measurement.class);

        assertThat(back).isEqualTo(m);
        assertThat(Double.doubleToRawLongBits(back.qUnloaded())).isEqualTo(Double.doubleToRawLongBits(0.1 + 0.2));
        assertThat(back.f0Hz()).isEqualTo(Double.MIN_VALUE);
        assertThat(back.levelDb()).isNaN();
    }
}
