package org.qfleet.app;

import java.nio.file.Path;
import java.util.List;
import org.qfleet.sweep.ReadOutcome;

/** Reads the sweeps in one file; bad content becomes failed outcomes, never an exception. */
@FunctionalInterface
interface SweepSource {

    List<ReadOutcome> read(Path file);
}
