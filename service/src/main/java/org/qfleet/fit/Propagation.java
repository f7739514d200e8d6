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
        List<ResonanceShape> varied = new ArrayList<>(shapes);
        double variance = 0;
        for (int f = 0; f < fits.size(); f++) {
            TraceFit fit = fits.get(f);
            ShapeVariations v = fit.variations();
            double[][] c = fit.covariance();
            int n = v.steps().length;
            double[] gradient = new double[n];
            for (int k = 0; k < n; k++) {
                double h = v.steps()[k];
                if (h == 0) {
                    continue;
                }
                varied.set(f, v.up()[k]);
                double up = quantity.applyAsDouble(varied);
                varied.set(f, v.down()[k]);
                double down = quantity.applyAsDouble(varied);
                gradient[k] = (up - down) / (2 * h);
            }
            varied.set(f, shapes.get(f));
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    variance += gradient[i] * c[i][j] * gradient[j];
                }
            }
        }
        return Math.sqrt(Math.max(0, variance));
    }
}
