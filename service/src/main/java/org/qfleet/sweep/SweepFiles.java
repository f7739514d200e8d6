package org.qfleet.sweep;

import java.nio.file.Path;
import java.util.List;

/**
 * Reads sweeps from files, choosing the reader by extension: {@code .s1p}/{@code .s2p}
 * (Touchstone 1.1 and 2.0), {@code .json} (one sweep message) and {@code .jsonl} (one per line).
 */
public final class SweepFiles {

    private final SweepLimits limits;

    public SweepFiles(SweepLimits limits) {
        this.limits = limits;
    }

    /** Never throws for bad content: every problem becomes a failed outcome with a clear reason. */
    public List<ReadOutcome> read(Path file) {
        throw new UnsupportedOperationException("SweepFiles.read: to be written");
    }
}
