package org.qfleet.sweep;

import java.util.Arrays;

/**
 * The topology a sweep most likely comes from when nobody said: a one-port sweep (S11 only) is a
 * reflection; a two-port sweep whose |S21| dips below its off-resonance level more than it rises
 * above it is a notch (resonator side-coupled to a through line); any other is a transmission.
 */
public final class TopologyGuess {

    /** Share of the points at each end of the sweep that show the off-resonance level. */
    private static final double EDGE_SHARE = 0.1;

    private TopologyGuess() {
    }

    public static Topology of(Sweep sweep) {
        Trace s21 = sweep.traces().get(SParameter.S21);
        if (s21 == null) {
            return sweep.has(SParameter.S11) ? Topology.REFLECTION : Topology.TRANSMISSION;
        }
        int n = s21.size();
        int edge = Math.max(1, (int) (EDGE_SHARE * n));
        double[] ends = new double[2 * edge];
        for (int i = 0; i < edge; i++) {
            ends[i] = s21.magnitude(i);
            ends[edge + i] = s21.magnitude(n - 1 - i);
        }
        Arrays.sort(ends);
        double level = ends[edge];
        double highest = 0;
        double lowest = Double.POSITIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            double m = s21.magnitude(i);
            highest = Math.max(highest, m);
            lowest = Math.min(lowest, m);
        }
        return level - lowest > highest - level ? Topology.NOTCH : Topology.TRANSMISSION;
    }
}
