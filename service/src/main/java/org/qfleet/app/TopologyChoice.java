package org.qfleet.app;

import org.qfleet.sweep.SParameter;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.Topology;

/**
 * Decides how a sweep is fitted: the command-line option wins, then the topology the sweep states
 * itself, then a default from its traces (reflection for a file with S11 and no S21, else
 * transmission).
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
        return sweep.withTopology(fromTraces(sweep));
    }

    /** The default for sources that do not say; the same rule as the sweep readers' default. */
    static Topology fromTraces(Sweep sweep) {
        return sweep.has(SParameter.S11) && !sweep.has(SParameter.S21) ? Topology.REFLECTION : Topology.TRANSMISSION;
    }
}
