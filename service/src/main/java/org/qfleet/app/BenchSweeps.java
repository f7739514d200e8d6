package org.qfleet.app;

import java.nio.charset.StandardCharsets;
import java.time.Clock;
import java.time.Duration;
import java.util.List;
import java.util.Locale;
import org.qfleet.codec.SweepMessageWriter;
import org.qfleet.codec.TraceForm;
import org.qfleet.sim.DemoPlant;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepInfo;

/**
 * The sweep messages of {@code bench}, made before anything is measured: a pool of distinct
 * simulated sweeps of the demo plant, written once as messages, then published over and over with
 * a new sweep id each time ({@code <prefix>0000000042}), so every published sweep can be told
 * apart in the results while publishing costs no simulation or JSON writing. The pool comes from
 * several plants at once, so its sweeps spread over many lots and their keys over the partitions.
 */
final class BenchSweeps {

    /** Plants that make the pool; each has one open lot per product, so 2 x 16 lots in all. */
    static final int PLANTS = 16;
    private static final int ID_DIGITS = 10;

    private final String idPrefix;
    private final byte[][] keys;
    private final byte[][] values;
    private final int[] idOffsets;

    private BenchSweeps(String idPrefix, byte[][] keys, byte[][] values, int[] idOffsets) {
        this.idPrefix = idPrefix;
        this.keys = keys;
        this.values = values;
        this.idOffsets = idOffsets;
    }

    /**
     * Simulates {@code distinct} sweeps of {@code points} points and writes them as messages with
     * the trace forms in turn.
     *
     * @param runTag makes this run's sweep ids its own, e.g. {@code k3x9}
     */
    static BenchSweeps generate(int distinct, int points, List<TraceForm> forms, long seed, String runTag) {
        String prefix = "bench-" + runTag + "-";
        String placeholder = prefix + "0".repeat(ID_DIGITS);
        byte[] placeholderBytes = placeholder.getBytes(StandardCharsets.US_ASCII);
        List<SweepMessageWriter> writers = forms.stream().map(SweepMessageWriter::new).toList();
        DemoPlant[] plants = new DemoPlant[PLANTS];
        for (int p = 0; p < PLANTS; p++) {
            // A clock a few seconds apart gives each plant ids (and lot ids) of its own.
            plants[p] = new DemoPlant(seed + p, Clock.offset(Clock.systemUTC(), Duration.ofSeconds(p)), points);
        }
        byte[][] keys = new byte[distinct][];
        byte[][] values = new byte[distinct][];
        int[] offsets = new int[distinct];
        for (int i = 0; i < distinct; i++) {
            Sweep sweep = plants[i % PLANTS].next().sweep();
            SweepInfo info = sweep.info();
            Sweep renamed = new Sweep(sweep.source(), new SweepInfo(placeholder, info.stationId(), info.product(), info.lot(),
                    info.unit(), info.measuredAt(), info.fixtureId(), info.temperatureC()),
                    sweep.topology(), sweep.frequencyHz(), sweep.traces(), sweep.referenceOhms());
            keys[i] = info.lot().getBytes(StandardCharsets.UTF_8);
            values[i] = writers.get(i % writers.size()).write(renamed);
            offsets[i] = indexOf(values[i], placeholderBytes) + prefix.length();
        }
        return new BenchSweeps(prefix, keys, values, offsets);
    }

    /** The message of the {@code sequence}-th published sweep (from 0): a pool message with its own id. */
    SweepPublisher.Outgoing message(long sequence) {
        int i = (int) (sequence % values.length);
        byte[] value = values[i].clone();
        long digits = sequence;
        for (int d = ID_DIGITS - 1; d >= 0; d--) {
            value[idOffsets[i] + d] = (byte) ('0' + digits % 10);
            digits /= 10;
        }
        return new SweepPublisher.Outgoing(keys[i], value);
    }

    /** The sweep id of the {@code sequence}-th published sweep. */
    String sweepId(long sequence) {
        return idPrefix + String.format(Locale.ROOT, "%0" + ID_DIGITS + "d", sequence);
    }

    /** The sequence number a sweep id of this run carries, or -1 for any other id. */
    long sequenceOf(String sweepId) {
        if (sweepId == null || sweepId.length() != idPrefix.length() + ID_DIGITS || !sweepId.startsWith(idPrefix)) {
            return -1;
        }
        long n = 0;
        for (int i = idPrefix.length(); i < sweepId.length(); i++) {
            char c = sweepId.charAt(i);
            if (c < '0' || c > '9') {
                return -1;
            }
            n = n * 10 + (c - '0');
        }
        return n;
    }

    int distinct() {
        return values.length;
    }

    /** The pool's messages as they were written (with the placeholder id), e.g. to warm up a reader. */
    List<byte[]> poolMessages() {
        return List.of(values);
    }

    double meanMessageBytes() {
        long total = 0;
        for (byte[] v : values) {
            total += v.length;
        }
        return (double) total / values.length;
    }

    private static int indexOf(byte[] haystack, byte[] needle) {
        outer:
        for (int i = 0; i + needle.length <= haystack.length; i++) {
            for (int j = 0; j < needle.length; j++) {
                if (haystack[i + j] != needle[j]) {
                    continue outer;
                }
            }
            return i;
        }
        throw new IllegalStateException("the written message does not carry its sweep id");
    }
}
