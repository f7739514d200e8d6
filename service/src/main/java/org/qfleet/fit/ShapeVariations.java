package org.qfleet.fit;

import java.util.function.Function;

/**
 * A fitted trace's resonance shape with each parameter moved by a step small against its own
 * standard deviation (1e-4 of it), up and down: the central differences from which {@link Propagation}
 * takes the sensitivities of every derived quantity. A parameter with no spread has no step (0).
 */
record ShapeVariations(double[] steps, ResonanceShape[] up, ResonanceShape[] down) {

    private static final double RELATIVE_STEP = 1e-4;

    static ShapeVariations of(double[] p, double[][] covariance, Function<double[], ResonanceShape> shapeOf) {
        int n = p.length;
        double[] steps = new double[n];
        ResonanceShape[] up = new ResonanceShape[n];
        ResonanceShape[] down = new ResonanceShape[n];
        for (int k = 0; k < n; k++) {
            double sd = Math.sqrt(Math.max(0, covariance[k][k]));
            if (sd == 0) {
                continue;
            }
            double h = RELATIVE_STEP * sd;
            double[] q = p.clone();
            q[k] = p[k] + h;
            up[k] = shapeOf.apply(q);
            q[k] = p[k] - h;
            down[k] = shapeOf.apply(q);
            steps[k] = h;
        }
        return new ShapeVariations(steps, up, down);
    }
}
