package org.qfleet.app;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/** Describes the machine a {@code bench} run measured, for its figures. */
final class BenchMachine {

    private static final Path CPU_INFO = Path.of("/proc/cpuinfo");

    private BenchMachine() {
    }

    static BenchFigures.Machine describe() {
        return new BenchFigures.Machine(Runtime.getRuntime().availableProcessors(), cpuModel(),
                System.getProperty("java.vm.name") + " " + System.getProperty("java.runtime.version"),
                System.getProperty("os.name") + " " + System.getProperty("os.version") + " " + System.getProperty("os.arch"),
                Runtime.getRuntime().maxMemory(), ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
    }

    /** The {@code model name} line of {@code /proc/cpuinfo} (Linux), or "unknown". */
    static String cpuModel() {
        try {
            return cpuModel(Files.readAllLines(CPU_INFO));
        } catch (IOException | RuntimeException e) {
            return "unknown";
        }
    }

    static String cpuModel(List<String> cpuInfo) {
        for (String line : cpuInfo) {
            int colon = line.indexOf(':');
            if (colon > 0 && line.substring(0, colon).trim().equals("model name")) {
                return line.substring(colon + 1).trim();
            }
        }
        return "unknown";
    }
}
