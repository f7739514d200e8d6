package org.qfleet.app.plot;

import java.util.List;
import org.qfleet.sweep.SParameter;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.Topology;
import org.qfleet.sweep.Trace;

/** The trace a result describes: S11 for a one-port sweep, S21 for the two-port topologies. */
record MainTrace(SParameter parameter, Trace trace) {

    private static final List<SParameter> FALLBACK = List.of(SParameter.S21, SParameter.S11, SParameter.S22, SParameter.S12);

    /** The main trace of the sweep, or the first one present when the expected one is missing. */
    static MainTrace of(Sweep sweep) {
        SParameter expected = sweep.topology() == Topology.REFLECTION ? SParameter.S11 : SParameter.S21;
        if (sweep.has(expected)) {
            return new MainTrace(expected, sweep.trace(expected).orElseThrow());
        }
        for (SParameter p : FALLBACK) {
            if (sweep.has(p)) {
                return new MainTrace(p, sweep.trace(p).orElseThrow());
            }
        }
        return null;
    }

    /** The parameter as written on axes, e.g. {@code S21}. */
    String label() {
        return parameter.name();
    }
}
