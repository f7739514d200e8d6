package org.qfleet.sim;

import java.util.function.DoubleUnaryOperator;

/**
 * Evaluates an ideal network off the sweep grid and finds where a response crosses a level, by
 * bisection in the relative detuning u = f / f0 - 1 (monotonic on each side of the resonance).
 */
final class ResponseProbe {

    private final ResonatorNetwork network;

    ResponseProbe(ResonatorCircuit circuit) {
        this.network = ResonatorNetwork.of(circuit);
    }

    SMatrix at(double fHz) {
        return network.at(fHz);
    }

    /**
     * The two frequencies around {@code f0Hz} where {@code function} changes sign, searched within
     * ten half-power widths on each side.
     */
    static double[] crossings(DoubleUnaryOperator function, double f0Hz, double qLoaded) {
        double reach = 10 / qLoaded;
        double upper = bisect(u -> function.applyAsDouble(f0Hz * (1 + u)), 0, reach);
        double lower = bisect(u -> function.applyAsDouble(f0Hz * (1 + u)), -reach, 0);
        return new double[] {f0Hz * (1 + lower), f0Hz * (1 + upper)};
    }

    private static double bisect(DoubleUnaryOperator g, double a, double b) {
        double ga = g.applyAsDouble(a);
        if (Math.signum(ga) == Math.signum(g.applyAsDouble(b))) {
            throw new IllegalStateException("no sign change between " + a + " and " + b);
        }
        for (int i = 0; i < 200 && b - a > 0; i++) {
            double mid = 0.5 * (a + b);
            if (mid == a || mid == b) {
                break;
            }
            double gm = g.applyAsDouble(mid);
            if (Math.signum(gm) == Math.signum(ga)) {
                a = mid;
                ga = gm;
            } else {
                b = mid;
            }
        }
        return 0.5 * (a + b);
    }
}
