package org.qfleet.app.status;

import java.util.Locale;

/**
 * An axis range with round tick steps (1, 2 or 5 times a power of ten, common practice for chart
 * axes) that covers the data.
 */
record NiceRange(double min, double max, double step) {

    /** A range covering {@code lo} to {@code hi} with at most about {@code maxTicks} steps; 0 to 1 when nothing is finite. */
    static NiceRange covering(double lo, double hi, int maxTicks) {
        if (!Double.isFinite(lo) || !Double.isFinite(hi) || lo > hi) {
            return new NiceRange(0, 1, 0.2);
        }
        if (hi == lo) {
            double pad = lo == 0 ? 1 : Math.abs(lo) * 0.01;
            lo -= pad;
            hi += pad;
        }
        double step = niceStep((hi - lo) / Math.max(1, maxTicks));
        return new NiceRange(Math.floor(lo / step) * step, Math.ceil(hi / step) * step, step);
    }

    private static double niceStep(double rough) {
        double power = Math.pow(10, Math.floor(Math.log10(rough)));
        double fraction = rough / power;
        double nice = fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 5 ? 5 : 10;
        return nice * power;
    }

    double[] ticks() {
        int count = (int) Math.round((max - min) / step) + 1;
        double[] ticks = new double[count];
        for (int i = 0; i < count; i++) {
            ticks[i] = min + i * step;
        }
        return ticks;
    }

    /** A tick label with as many decimals as the step needs. */
    String label(double value) {
        int decimals = Math.max(0, (int) -Math.floor(Math.log10(step) + 1e-9));
        String text = String.format(Locale.ROOT, "%." + decimals + "f", value);
        return text.matches("-0(\\.0*)?") ? text.substring(1) : text;
    }
}
