package org.qfleet.app;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;

class ProgressMeterTest {

    private final StringWriter err = new StringWriter();
    private final AtomicLong now = new AtomicLong(TimeUnit.SECONDS.toNanos(100));

    @Test
    void shortRunsStaySilent() {
        ProgressMeter meter = new ProgressMeter(ProgressMeter.THRESHOLD, new PrintWriter(err), now::get);
        for (int i = 1; i <= ProgressMeter.THRESHOLD; i++) {
            now.addAndGet(TimeUnit.SECONDS.toNanos(10));
            meter.advanced(i);
        }
        meter.finished(ProgressMeter.THRESHOLD);

        assertThat(err.toString()).isEmpty();
    }

    @Test
    void longRunsReportAtIntervalsWithCountAndRate() {
        ProgressMeter meter = new ProgressMeter(400, new PrintWriter(err), now::get);
        now.addAndGet(TimeUnit.SECONDS.toNanos(2));
        meter.advanced(40);
        now.addAndGet(TimeUnit.SECONDS.toNanos(3));
        meter.advanced(100);
        now.addAndGet(TimeUnit.SECONDS.toNanos(1));
        meter.advanced(120);
        now.addAndGet(TimeUnit.SECONDS.toNanos(4));
        meter.finished(400);

        // 100 files after 5 s is 20 files/s; 400 files after 10 s is 40 files/s.
        assertThat(err.toString().lines()).containsExactly(
                "qfleet: 100 of 400 files, 20.0 files/s",
                "qfleet: 400 files in 10.0 s, 40.0 files/s");
    }
}
