package org.qfleet.app.plot;

import java.util.Arrays;
import org.qfleet.fit.ResponseModel;

/**
 * A fitted response sampled for drawing: evenly across the sweep, and more densely around the
 * resonance so a narrow peak is drawn smoothly.
 */
record ModelCurve(double[] frequencyHz, double[] re, double[] im) {

    private static final int ACROSS_SPAN = 500;
    private static final int AROUND_RESONANCE = 300;
    /** Half-power widths on either side of f0 that get the dense samples. */
    private static final double DENSE_WIDTHS = 4;

    static ModelCurve sample(ResponseModel model, double startHz, double stopHz, double f0Hz, double qLoaded) {
        double[] f = grid(startHz, stopHz, f0Hz, qLoaded);
        double[] re = new double[f.length];
        double[] im = new double[f.length];
        double[] reIm = new double[2];
        for (int i = 0; i < f.length; i++) {
            model.evaluate(f[i], reIm);
            re[i] = reIm[0];
            im[i] = reIm[1];
        }
        return new ModelCurve(f, re, im);
    }

    double magnitudeDb(int i) {
        return 20 * Math.log10(Math.hypot(re[i], im[i]));
    }

    int size() {
        return frequencyHz.length;
    }

    private static double[] grid(double startHz, double stopHz, double f0Hz, double qLoaded) {
        double[] even = linspace(startHz, stopHz, ACROSS_SPAN);
        if (!(Double.isFinite(f0Hz) && Double.isFinite(qLoaded) && qLoaded > 0)) {
            return even;
        }
        double halfSpan = DENSE_WIDTHS * f0Hz / qLoaded;
        double lo = Math.max(startHz, f0Hz - halfSpan);
        double hi = Math.min(stopHz, f0Hz + halfSpan);
        if (!(hi > lo)) {
            return even;
        }
        double[] dense = linspace(lo, hi, AROUND_RESONANCE);
        double[] all = Arrays.copyOf(even, even.length + dense.length);
        System.arraycopy(dense, 0, all, even.length, dense.length);
        Arrays.sort(all);
        return all;
    }

    private static double[] linspace(double from, double to, int n) {
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = from + (to - from) * i / (n - 1);
        }
        return v;
    }
}
