package org.qfleet.fit;

import java.util.ArrayList;
import java.util.List;
import java.util.function.ToDoubleFunction;

/**
 * First-order propagation of fit covariances to a derived quantity (GUM, JCGM 100:2008, eq. 10),
 * with the sensitivities taken by central differences of a step small against each parameter's
 * own standard deviation. Fits of different traces are independent: their contributions add.
 */
final class Propagation {

    private Propagation() {
    }

    static double standardUncertainty(List<TraceFit> fits, ToDoubleFunction<List<ResonanceShape>> quantity) {
        List<ResonanceShape> shapes = new ArrayList<>(fits.size());
        for (TraceFit fit : fits) {
            shapes.add(fit.shape());
        }
        double variance = 0;
        for (int f = 0; f < fits.size(); f++) {
            TraceFit fit = fits.get(f);
            double[] p = fit.parameters();
            double[][] c = fit.covariance();
            int n = p.length;
            double[] gradient = new double[n];
            for (int k = 0; k < n; k++) {
                double sd = Math.sqrt(Math.max(0, c[k][k]));
                if (sd == 0) {
                    continue;
                }
                double h = 1e-4 * sd;
                double[] q = p.clone();
                q[k] = p[k] + h;
                double up = evaluate(fits, shapes, f, q, quantity);
                q[k] = p[k] - h;
                double down = evaluate(fits, shapes, f, q, quantity);
                gradient[k] = (up - down) / (2 * h);
            }
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    variance += gradient[i] * c[i][j] * gradient[j];
                }
            }
        }
        return Math.sqrt(Math.max(0, variance));
    }

    private static double evaluate(List<TraceFit> fits, List<ResonanceShape> shapes, int index, double[] p,
                                   ToDoubleFunction<List<ResonanceShape>> quantity) {
        List<ResonanceShape> varied = new ArrayList<>(shapes);
        varied.set(index, fits.get(index).shapeOf().apply(p));
        return quantity.applyAsDouble(varied);
    }
}
