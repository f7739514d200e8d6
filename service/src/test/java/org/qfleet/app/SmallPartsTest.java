package org.qfleet.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.Duration;
import org.junit.jupiter.api.Test;
import picocli.CommandLine.TypeConversionException;

/** Latency percentiles and duration options of the live demo. */
class SmallPartsTest {

    @Test
    void percentilesFollowTheNearestRankMethod() {
        // Nearest-rank percentile: the value at rank ceil(p/100 * n) of the sorted samples (common practice).
        LatencyRecorder latencies = new LatencyRecorder();
        for (int i = 100; i >= 1; i--) {
            latencies.add(i);
        }
        assertThat(latencies.percentile(50)).isEqualTo(50);
        assertThat(latencies.percentile(99)).isEqualTo(99);
        assertThat(latencies.percentile(100)).isEqualTo(100);
        assertThat(new LatencyRecorder().percentile(50)).isEqualTo(-1);
    }

    @Test
    void theRecorderKeepsThreeSignificantDigitsAndStartsAfreshWhenCleared() {
        LatencyRecorder latencies = new LatencyRecorder();
        for (long v : new long[] {1_000_000, 1_000_000, 1, 2, 3}) {
            latencies.add(v);
        }
        assertThat(latencies.count()).isEqualTo(5);
        assertThat(latencies.percentile(40)).isEqualTo(2);
        // HdrHistogram keeps three significant digits: within 0.1 % of the value.
        assertThat(latencies.max()).isBetween(1_000_000L, 1_001_000L);
        latencies.add(-5);
        assertThat(latencies.percentile(0)).isZero();

        latencies.clear();
        latencies.add(7);
        assertThat(latencies.count()).isEqualTo(1);
        assertThat(latencies.percentile(100)).isEqualTo(7);
    }

    @Test
    void durationsReadAsPeopleWriteThem() {
        DurationConverter c = new DurationConverter();
        assertThat(c.convert("30s")).isEqualTo(Duration.ofSeconds(30));
        assertThat(c.convert("5m")).isEqualTo(Duration.ofMinutes(5));
        assertThat(c.convert("1h")).isEqualTo(Duration.ofHours(1));
        assertThat(c.convert("90")).isEqualTo(Duration.ofSeconds(90));
        assertThat(c.convert("500ms")).isEqualTo(Duration.ofMillis(500));
        assertThat(c.convert("PT2M")).isEqualTo(Duration.ofMinutes(2));
        assertThatThrownBy(() -> c.convert("soon")).isInstanceOf(TypeConversionException.class).hasMessageContaining("30s");
        assertThatThrownBy(() -> c.convert("0s")).isInstanceOf(TypeConversionException.class).hasMessageContaining("positive");
    }
}
