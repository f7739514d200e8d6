package org.qfleet.app;

import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepFiles;
import org.qfleet.sweep.Topology;

/**
 * Decides how a sweep is fitted: the command-line option wins, then the topology the sweep states
 * itself, then the readers' default for files that do not say ({@link SweepFiles#defaultTopology}).
 */
final class TopologyChoice {

    private TopologyChoice() {
    }

    /** The sweep with its topology settled; {@code option} may be null. */
    static Sweep apply(Sweep sweep, Topology option) {
        if (option != null) {
            return sweep.topology() == option ? sweep : sweep.withTopology(option);
        }
        if (sweep.topology() != null) {
            return sweep;
        }
        return sweep.withTopology(SweepFiles.defaultTopology(sweep));
    }
}
