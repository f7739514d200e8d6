package org.qfleet.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.charset.StandardCharsets;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.qfleet.codec.TraceForm;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepJsonReader;
import org.qfleet.sweep.SweepLimits;

/** The pieces of {@code bench} that need no broker: its messages, how it reads ids back, its rates. */
class BenchPartsTest {

    @Test
    void everyPublishedSweepIsAValidMessageWithAnIdOfItsOwn() throws Exception {
        BenchSweeps sweeps = BenchSweeps.generate(20, 101, List.of(TraceForm.RE_IM, TraceForm.DB), 3, "t1");
        SweepJsonReader reader = new SweepJsonReader(SweepLimits.DEFAULT);
        Set<String> ids = new HashSet<>();
        Set<String> lots = new HashSet<>();
        for (long n : new long[] {0, 1, 19, 20, 21, 12_345_678_901L % 10_000_000_000L}) {
            SweepPublisher.Outgoing message = sweeps.message(n);
            Sweep sweep = reader.read("test", message.value());
            assertThat(sweep.size()).isEqualTo(101);
            assertThat(sweep.info().sweepId()).isEqualTo(sweeps.sweepId(n));
            assertThat(sweeps.sequenceOf(sweep.info().sweepId())).isEqualTo(n);
            assertThat(new String(message.key(), StandardCharsets.UTF_8)).isEqualTo(sweep.info().lot());
            ids.add(sweep.info().sweepId());
        }
        for (long n = 0; n < sweeps.distinct(); n++) {
            lots.add(new String(sweeps.message(n).key(), StandardCharsets.UTF_8));
        }
        assertThat(ids).hasSize(6);
        // Sixteen plants, one open lot per product each: the first 20 sweeps come from 16 lots.
        assertThat(lots).hasSize(BenchSweeps.PLANTS);
        assertThat(sweeps.sequenceOf("sim-abc-00000001")).isEqualTo(-1);
        assertThat(sweeps.sequenceOf(sweeps.sweepId(7).replace("7", "x"))).isEqualTo(-1);
        // Trace forms are used in turn: the second pool message is magnitude only.
        assertThat(reader.read("test", sweeps.message(1).value()).traces().values())
                .allMatch(t -> !t.phaseKnown());
    }

    @Test
    void resultsAndRejectsGiveTheirSweepId() {
        assertThat(BenchResultWatcher.sweepId(bytes("{\"source\":\"s/0@1\",\"flags\":[\"a\"],\"verdict\":{\"sweepId\":\"no\"},\"sweepId\":\"b-1\"}")))
                .isEqualTo("b-1");
        assertThat(BenchResultWatcher.sweepId(bytes("{\"code\":\"invalid-json\",\"sweepId\":null}"))).isNull();
        assertThat(BenchResultWatcher.sweepId(bytes("not json"))).isNull();
        assertThat(BenchResultWatcher.sweepId(null)).isNull();
    }

    @Test
    void steadyRatesLeaveOutTheFirstBatch() {
        // 1000 sweeps, 100 of them in the first batch at t = 1 s, the last at t = 10 s: 900 in 9 s.
        BenchRun.Span span = BenchRun.Span.of(1000, 100, 0, 1_000_000_000L, 10_000_000_000L);
        assertThat(span.rate()).isCloseTo(100, within(1e-9));
        assertThat(span.seconds()).isCloseTo(9, within(1e-9));
        // Everything in one batch: all of it over the time since the phase began.
        assertThat(BenchRun.Span.of(50, 50, 0, 2_000_000_000L, 2_000_000_000L).rate()).isCloseTo(25, within(1e-9));
        assertThat(BenchRun.Span.of(0, 0, 0, -1, -1).rate()).isZero();
    }

    @Test
    void theCpuModelComesFromItsLine() {
        assertThat(BenchMachine.cpuModel(List.of("processor\t: 0", "vendor_id\t: Acme", "model name\t: Acme Zen 9 7000", "model name\t: other")))
                .isEqualTo("Acme Zen 9 7000");
        assertThat(BenchMachine.cpuModel(List.of("processor\t: 0"))).isEqualTo("unknown");
    }

    @Test
    void progressLinesSayPhaseCountAndRate() {
        assertThat(BenchProgress.line("service", 500, 2000, 5_000_000_000L))
                .isEqualTo("qfleet bench: service: 500 of 2000, 100/s over 5 s");
    }

    private static byte[] bytes(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }
}
