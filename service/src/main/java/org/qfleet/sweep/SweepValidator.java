package org.qfleet.sweep;

import java.util.Map;

/**
 * The checks every sweep passes whatever it was read from: sizes, a strictly ascending positive
 * frequency axis, finite values, and (when the topology is known) the trace the topology needs.
 */
public final class SweepValidator {

    private SweepValidator() {
    }

    /** Checks the sweep against the limits, and against its topology when that is set. */
    public static void validate(Sweep sweep, SweepLimits limits) throws InvalidSweepException {
        double[] frequencies = sweep.frequencyHz();
        int n = frequencies.length;
        if (n == 0) {
            throw new InvalidSweepException(SweepError.EMPTY_ARRAY, "the sweep has no frequencies");
        }
        if (n > limits.maxPoints()) {
            throw new InvalidSweepException(SweepError.TOO_MANY_POINTS,
                    n + " points, more than the limit of " + limits.maxPoints());
        }
        if (n < limits.minPoints()) {
            throw new InvalidSweepException(SweepError.TOO_FEW_POINTS,
                    n + " points, fewer than the " + limits.minPoints() + " needed");
        }
        if (sweep.traces().isEmpty()) {
            throw new InvalidSweepException(SweepError.MISSING_FIELD, "the sweep has no S-parameter trace");
        }
        for (Map.Entry<SParameter, Trace> entry : sweep.traces().entrySet()) {
            if (entry.getValue().size() != n) {
                throw new InvalidSweepException(SweepError.LENGTH_MISMATCH, entry.getKey() + " has "
                        + entry.getValue().size() + " values but there are " + n + " frequencies");
            }
        }
        checkFrequencies(frequencies);
        for (Map.Entry<SParameter, Trace> entry : sweep.traces().entrySet()) {
            checkFinite(entry.getKey(), entry.getValue());
        }
        if (sweep.topology() != null) {
            validateTopology(sweep);
        }
    }

    /** Checks that the sweep carries the trace its topology needs (S21 for transmission and notch, S11 for reflection). */
    public static void validateTopology(Sweep sweep) throws InvalidSweepException {
        Topology topology = sweep.topology();
        if (topology == null) {
            throw new InvalidSweepException(SweepError.TOPOLOGY_MISMATCH, "no topology is set for the sweep");
        }
        SParameter needed = requiredParameter(topology);
        if (!sweep.has(needed)) {
            throw new InvalidSweepException(SweepError.TOPOLOGY_MISMATCH, "topology " + topology.wireName()
                    + " needs " + needed + ", but the sweep has only " + sweep.traces().keySet());
        }
    }

    /** The trace a topology cannot do without: S11 for reflection, S21 otherwise. */
    public static SParameter requiredParameter(Topology topology) {
        return topology == Topology.REFLECTION ? SParameter.S11 : SParameter.S21;
    }

    private static void checkFrequencies(double[] f) throws InvalidSweepException {
        for (int i = 0; i < f.length; i++) {
            if (!Double.isFinite(f[i])) {
                throw new InvalidSweepException(SweepError.NON_FINITE,
                        "frequency at index " + i + " is not finite (" + f[i] + ")");
            }
            if (i == 0 && f[0] <= 0) {
                throw new InvalidSweepException(SweepError.NOT_ASCENDING,
                        "frequency at index 0 is " + f[0] + " Hz; frequencies must be positive");
            }
            if (i > 0 && f[i] <= f[i - 1]) {
                throw new InvalidSweepException(SweepError.NOT_ASCENDING, "frequencies must ascend strictly: index "
                        + i + " (" + f[i] + " Hz) is not above index " + (i - 1) + " (" + f[i - 1] + " Hz)");
            }
        }
    }

    private static void checkFinite(SParameter parameter, Trace trace) throws InvalidSweepException {
        double[] re = trace.re();
        double[] im = trace.im();
        for (int i = 0; i < re.length; i++) {
            if (!Double.isFinite(re[i]) || !Double.isFinite(im[i])) {
                throw new InvalidSweepException(SweepError.NON_FINITE,
                        parameter + " at index " + i + " is not finite (" + re[i] + ", " + im[i] + ")");
            }
        }
    }
}
