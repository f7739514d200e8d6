package org.qfleet.app;

import java.util.List;

/**
 * What one {@code bench} run measured.
 *
 * @param startedAt when the run began (RFC 3339)
 * @param machine   where it ran
 * @param settings  what it was asked to do
 * @param phases    the phases in the order they ran: publish, raw (unless skipped), service,
 *                  latency (unless skipped)
 */
record BenchFigures(String startedAt, Machine machine, Settings settings, List<Phase> phases) {

    static final String PUBLISH = "publish";
    static final String RAW = "raw";
    static final String SERVICE = "service";
    static final String LATENCY = "latency";

    BenchFigures {
        phases = List.copyOf(phases);
    }

    Phase phase(String name) {
        return phases.stream().filter(p -> p.name().equals(name)).findFirst().orElse(null);
    }

    /** Sustained sweeps/s of the full service over the raw read-and-decode ceiling; null without both. */
    Double serviceToRaw() {
        Phase raw = phase(RAW);
        Phase service = phase(SERVICE);
        if (raw == null || service == null || !(raw.sweepsPerSecond() > 0)) {
            return null;
        }
        return service.sweepsPerSecond() / raw.sweepsPerSecond();
    }

    /** Whether every published sweep came out exactly once, as a result or a reject. */
    boolean allAccounted() {
        return phases.stream().map(Phase::accounting).filter(a -> a != null)
                .allMatch(a -> a.lost() == 0 && a.duplicates() == 0);
    }

    /**
     * @param cores      processors available to the JVM
     * @param cpuModel   from {@code /proc/cpuinfo}, or "unknown"
     * @param jvm        JVM name and version
     * @param os         operating system name, version and architecture
     * @param maxHeapBytes the JVM's heap bound
     * @param loadAverage  the system's load average over the last minute when the run ended (all
     *                     processes, this one included; NaN where unknown): well above the
     *                     number of cores means other work shared the machine
     */
    record Machine(int cores, String cpuModel, String jvm, String os, long maxHeapBytes, double loadAverage) {
    }

    /**
     * @param broker           "embedded" or the bootstrap servers
     * @param sweeps           sweeps of the saturation phases
     * @param points           points per sweep
     * @param distinctSweeps   distinct simulated sweeps the messages were made from
     * @param meanMessageBytes mean size of a sweep message
     * @param forms            trace forms of the messages
     * @param partitions       partitions of the sweeps and results topics
     * @param threads          stream threads of the service
     * @param offeredPerSecond offered rate of the latency phase
     * @param offeredSeconds   how long the latency phase publishes
     * @param lateAfterMillis  results slower than this count as late
     */
    record Settings(String broker, long sweeps, long warmUpSweeps, int points, int distinctSweeps, double meanMessageBytes, List<String> forms,
            int partitions, int threads, double offeredPerSecond, double offeredSeconds, double lateAfterMillis) {

        Settings {
            forms = List.copyOf(forms);
        }
    }

    /**
     * One phase.
     *
     * @param name            publish, raw, service or latency
     * @param sweeps          sweeps the phase handled
     * @param seconds         how long it took (see {@link #sweepsPerSecond})
     * @param sweepsPerSecond publish: acknowledged sweeps over the time to publish them all; raw and
     *                        service: sweeps between the first and the last one read, over that
     *                        time; latency: sweeps sent over the time to send them
     * @param resources       CPU and heap of the process during the phase
     * @param decodeFailures  raw only: messages the reader refused (0 expected)
     * @param startSeconds    service only: from starting the service to its first visible result
     * @param accounting      service and latency: what came out
     * @param latency         latency only: end-to-end latencies
     */
    record Phase(String name, long sweeps, double seconds, double sweepsPerSecond, PhaseMeter.Resources resources,
            Long decodeFailures, Double startSeconds, Accounting accounting, Latency latency) {

        /**
         * CPU time of the process per sweep, in milliseconds: cores busy over sweeps per second.
         * Less sensitive than the rate to other work on a shared machine.
         */
        double cpuMillisPerSweep() {
            return sweepsPerSecond > 0 ? 1000 * resources.coresBusy() / sweepsPerSecond : Double.NaN;
        }
    }

    /**
     * @param expected   sweeps published in the phase
     * @param results    of them, those that came out as results
     * @param rejects    those that came out as rejects
     * @param duplicates results or rejects seen more than once
     */
    record Accounting(long expected, long results, long rejects, long duplicates) {

        /** Sweeps that did not come out before the run gave up waiting. */
        long lost() {
            return expected - results - rejects;
        }
    }

    /**
     * End-to-end latencies, from handing a sweep to the producer to its result being visible to
     * a {@code read_committed} consumer, in milliseconds (HdrHistogram, three significant digits).
     *
     * @param offeredPerSecond  the rate asked for
     * @param achievedPerSecond the rate sent
     * @param count             latencies recorded
     * @param late              results slower than the run's late bound
     */
    record Latency(double offeredPerSecond, double achievedPerSecond, long count, double p50Millis, double p90Millis,
            double p99Millis, double p999Millis, double maxMillis, double meanMillis, long late) {
    }
}
