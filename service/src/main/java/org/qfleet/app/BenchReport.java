package org.qfleet.app;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** The figures of a {@code bench} run as a plain text table for people and as JSON for tools. */
final class BenchReport {

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
    private static final double MB = 1024.0 * 1024.0;

    private BenchReport() {
    }

    /** The table, the service/raw ratio and the machine, one line each. */
    static List<String> table(BenchFigures f) {
        List<String> lines = new ArrayList<>();
        lines.add(String.format(Locale.ROOT, "%-8s %8s %8s %10s %8s %8s %6s %12s %15s",
                "phase", "sweeps", "seconds", "sweeps/s", "p50 ms", "p99 ms", "CPU %", "CPU ms/sweep", "heap MB gc/max"));
        for (BenchFigures.Phase p : f.phases()) {
            BenchFigures.Latency l = p.latency();
            lines.add(String.format(Locale.ROOT, "%-8s %8d %8.1f %10.1f %8s %8s %6s %12s %15s", p.name(), p.sweeps(), p.seconds(),
                    p.sweepsPerSecond(), l == null ? "-" : number(l.p50Millis()), l == null ? "-" : number(l.p99Millis()),
                    number(p.resources().cpuPercent()), number(p.cpuMillisPerSweep()),
                    String.format(Locale.ROOT, "%.0f/%.0f", p.resources().heapAfterGcBytes() / MB, p.resources().heapMaxUsedBytes() / MB)));
        }
        Double ratio = f.serviceToRaw();
        lines.add("service / raw: " + (ratio == null ? "- (no raw phase)" : String.format(Locale.ROOT, "%.2f", ratio)));
        for (BenchFigures.Phase p : f.phases()) {
            BenchFigures.Accounting a = p.accounting();
            if (a != null) {
                lines.add(String.format(Locale.ROOT, "%s: %d sweeps, %d results, %d rejects, %d lost, %d duplicates%s", p.name(),
                        a.expected(), a.results(), a.rejects(), a.lost(), a.duplicates(), latencyDetail(p.latency(), f.settings())));
            }
        }
        BenchFigures.Settings s = f.settings();
        lines.add(String.format(Locale.ROOT, "settings: broker %s, %d points, %d partitions, %d stream threads, %d distinct sweeps of %.0f bytes, "
                + "%d warm-up sweeps", s.broker(), s.points(), s.partitions(), s.threads(), s.distinctSweeps(), s.meanMessageBytes(),
                s.warmUpSweeps()));
        BenchFigures.Machine m = f.machine();
        lines.add(String.format(Locale.ROOT, "machine: %d cores (%s), %s, %s, heap bound %.0f MB, load average %s at the end",
                m.cores(), m.cpuModel(), m.jvm(), m.os(), m.maxHeapBytes() / MB, m.loadAverage() >= 0 ? number(m.loadAverage()) : "unknown"));
        return lines;
    }

    private static String latencyDetail(BenchFigures.Latency l, BenchFigures.Settings s) {
        if (l == null) {
            return "";
        }
        return String.format(Locale.ROOT, "; %.1f/s offered, %.1f/s sent; latency p50 %s p90 %s p99 %s p99.9 %s max %s ms; %d later than %.0f ms",
                l.offeredPerSecond(), l.achievedPerSecond(), number(l.p50Millis()), number(l.p90Millis()), number(l.p99Millis()),
                number(l.p999Millis()), number(l.maxMillis()), l.late(), s.lateAfterMillis());
    }

    private static String number(double v) {
        if (Double.isNaN(v)) {
            return "-";
        }
        return v >= 100 ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%.1f", v);
    }

    /** The figures as one JSON document (field names documented in the README). */
    static String json(BenchFigures f) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("startedAt", f.startedAt());
        BenchFigures.Machine m = f.machine();
        ObjectNode machine = root.putObject("machine");
        machine.put("cores", m.cores());
        machine.put("cpuModel", m.cpuModel());
        machine.put("jvm", m.jvm());
        machine.put("os", m.os());
        machine.put("maxHeapBytes", m.maxHeapBytes());
        putFinite(machine, "loadAverage", m.loadAverage() >= 0 ? round(m.loadAverage(), 2) : Double.NaN);
        BenchFigures.Settings s = f.settings();
        ObjectNode settings = root.putObject("settings");
        settings.put("broker", s.broker());
        settings.put("sweeps", s.sweeps());
        settings.put("warmUpSweeps", s.warmUpSweeps());
        settings.put("points", s.points());
        settings.put("distinctSweeps", s.distinctSweeps());
        settings.put("meanMessageBytes", Math.round(s.meanMessageBytes()));
        s.forms().forEach(settings.putArray("forms")::add);
        settings.put("partitions", s.partitions());
        settings.put("threads", s.threads());
        settings.put("offeredPerSecond", s.offeredPerSecond());
        settings.put("offeredSeconds", s.offeredSeconds());
        settings.put("lateAfterMillis", s.lateAfterMillis());
        ObjectNode phases = root.putObject("phases");
        for (BenchFigures.Phase p : f.phases()) {
            phase(phases.putObject(p.name()), p);
        }
        Double ratio = f.serviceToRaw();
        if (ratio == null) {
            root.putNull("serviceToRawRatio");
        } else {
            root.put("serviceToRawRatio", round(ratio, 4));
        }
        root.put("allAccounted", f.allAccounted());
        try {
            return MAPPER.writeValueAsString(root);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write the bench figures as JSON", e);
        }
    }

    private static void phase(ObjectNode n, BenchFigures.Phase p) {
        n.put("sweeps", p.sweeps());
        n.put("seconds", round(p.seconds(), 3));
        n.put("sweepsPerSecond", round(p.sweepsPerSecond(), 1));
        PhaseMeter.Resources r = p.resources();
        putFinite(n, "cpuPercent", round(r.cpuPercent(), 1));
        putFinite(n, "coresBusy", round(r.coresBusy(), 3));
        putFinite(n, "cpuMillisPerSweep", round(p.cpuMillisPerSweep(), 3));
        n.put("heapAfterGcBytes", r.heapAfterGcBytes());
        n.put("heapMaxUsedBytes", r.heapMaxUsedBytes());
        if (p.decodeFailures() != null) {
            n.put("decodeFailures", p.decodeFailures());
        }
        if (p.startSeconds() != null) {
            putFinite(n, "startSeconds", round(p.startSeconds(), 3));
        }
        BenchFigures.Accounting a = p.accounting();
        if (a != null) {
            n.put("results", a.results());
            n.put("rejects", a.rejects());
            n.put("lost", a.lost());
            n.put("duplicates", a.duplicates());
        }
        BenchFigures.Latency l = p.latency();
        if (l != null) {
            n.put("offeredPerSecond", l.offeredPerSecond());
            n.put("achievedPerSecond", round(l.achievedPerSecond(), 1));
            n.put("late", l.late());
            ObjectNode ms = n.putObject("latencyMillis");
            ms.put("count", l.count());
            putFinite(ms, "p50", l.p50Millis());
            putFinite(ms, "p90", l.p90Millis());
            putFinite(ms, "p99", l.p99Millis());
            putFinite(ms, "p999", l.p999Millis());
            putFinite(ms, "max", l.maxMillis());
            putFinite(ms, "mean", round(l.meanMillis(), 3));
        }
    }

    /** A number, or null where it is unknown (JSON has no NaN). */
    private static void putFinite(ObjectNode n, String field, double v) {
        if (Double.isFinite(v)) {
            n.put(field, v);
        } else {
            n.putNull(field);
        }
    }

    private static double round(double v, int decimals) {
        if (!Double.isFinite(v)) {
            return v;
        }
        double scale = Math.pow(10, decimals);
        return Math.round(v * scale) / scale;
    }
}
