package org.qfleet.app;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryMXBean;
import java.lang.management.OperatingSystemMXBean;

/**
 * What one phase of {@code bench} costs this process: CPU time over wall time, and heap in use
 * (sampled while the phase runs, and after a full collection at its end). With the embedded
 * broker that includes the broker.
 */
final class PhaseMeter {

    private static final MemoryMXBean MEMORY = ManagementFactory.getMemoryMXBean();
    private static final OperatingSystemMXBean OS = ManagementFactory.getOperatingSystemMXBean();

    private final long startNanos;
    private final long startCpuNanos;
    private volatile long maxHeapUsed;

    private PhaseMeter() {
        this.startNanos = System.nanoTime();
        this.startCpuNanos = processCpuNanos();
        sampleHeap();
    }

    static PhaseMeter start() {
        return new PhaseMeter();
    }

    /** Notes the heap in use now; called every fraction of a second while the phase runs. */
    void sampleHeap() {
        long used = MEMORY.getHeapMemoryUsage().getUsed();
        if (used > maxHeapUsed) {
            maxHeapUsed = used;
        }
    }

    /** Ends the phase: CPU over the phase, then the heap after a full collection. */
    Resources finish() {
        long wall = System.nanoTime() - startNanos;
        long cpu = processCpuNanos();
        sampleHeap();
        System.gc();
        long afterGc = MEMORY.getHeapMemoryUsage().getUsed();
        int cores = Runtime.getRuntime().availableProcessors();
        double coresBusy = cpu < 0 || startCpuNanos < 0 || wall <= 0 ? Double.NaN : (double) (cpu - startCpuNanos) / wall;
        return new Resources(coresBusy, 100 * coresBusy / cores, afterGc, maxHeapUsed);
    }

    /** CPU time of the whole process so far, or -1 where the JVM does not tell. */
    private static long processCpuNanos() {
        if (OS instanceof com.sun.management.OperatingSystemMXBean os) {
            return os.getProcessCpuTime();
        }
        return -1;
    }

    /**
     * @param coresBusy        process CPU time over wall time: 1.0 is one core busy all the time
     * @param cpuPercent       the same as a share of all cores, 0 to 100; NaN where unknown
     * @param heapAfterGcBytes heap in use after a full collection at the end of the phase
     * @param heapMaxUsedBytes most heap in use seen while the phase ran (garbage included)
     */
    record Resources(double coresBusy, double cpuPercent, long heapAfterGcBytes, long heapMaxUsedBytes) {
    }
}
