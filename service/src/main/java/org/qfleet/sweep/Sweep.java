package org.qfleet.sweep;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;
import java.util.Optional;

/**
 * One frequency sweep of one unit: strictly ascending frequencies and the traces measured at them.
 *
 * @param source      where the sweep came from (file name, or topic/partition/offset)
 * @param info        the message's identifying fields, or {@link SweepInfo#NONE}
 * @param topology    how the resonator is connected; null when the source does not say
 * @param frequencyHz sweep frequencies in hertz, strictly ascending
 * @param traces      the measured S-parameters, each with one sample per frequency
 * @param referenceOhms reference impedance of the data (50 unless the file says otherwise)
 */
public record Sweep(
        String source,
        SweepInfo info,
        Topology topology,
        double[] frequencyHz,
        Map<SParameter, Trace> traces,
        double referenceOhms) {

    public Sweep {
        EnumMap<SParameter, Trace> copy = new EnumMap<>(SParameter.class);
        copy.putAll(traces);
        traces = Collections.unmodifiableMap(copy);
    }

    public int size() {
        return frequencyHz.length;
    }

    public Optional<Trace> trace(SParameter parameter) {
        return Optional.ofNullable(traces.get(parameter));
    }

    public boolean has(SParameter parameter) {
        return traces.containsKey(parameter);
    }

    /** The same data with the topology set (for example from a command-line option). */
    public Sweep withTopology(Topology newTopology) {
        return new Sweep(source, info, newTopology, frequencyHz, traces, referenceOhms);
    }
}
