package org.qfleet.app.plot;

import java.util.Locale;

/**
 * An axis with ticks at multiples of 1, 2 or 5 times a power of ten. The "nice number" rounding
 * is P. S. Heckbert's ("Nice Numbers for Graph Labels", Graphics Gems, 1990, recalled from memory);
 * unlike his loose labelling the span is not rounded first, which keeps the data filling the axis.
 *
 * @param min  lower end of the axis
 * @param max  upper end of the axis
 * @param step distance between ticks
 */
record NiceScale(double min, double max, double step) {

    /** An axis from the tick at or below {@code lo} to the tick at or above {@code hi}, about {@code maxTicks} ticks. */
    public static NiceScale covering(double lo, double hi, int maxTicks) {
        if (!Double.isFinite(lo) || !Double.isFinite(hi)) {
            return new NiceScale(0, 1, 0.2);
        }
        if (hi < lo) {
            double t = lo;
            lo = hi;
            hi = t;
        }
        if (hi - lo <= Math.ulp(Math.max(Math.abs(lo), Math.abs(hi))) * 16) {
            double pad = lo == 0 ? 0.5 : Math.abs(lo) * 1e-3;
            lo -= pad;
            hi += pad;
        }
        double step = niceNumber((hi - lo) / Math.max(1, maxTicks - 1));
        double min = Math.floor(lo / step) * step;
        double max = Math.ceil(hi / step) * step;
        return new NiceScale(min, max, step);
    }

    /** An axis from exactly {@code lo} to {@code hi} with nice ticks inside it (none at the ends, usually). */
    public static NiceScale inside(double lo, double hi, int maxTicks) {
        NiceScale loose = covering(lo, hi, maxTicks);
        return lo < hi ? new NiceScale(lo, hi, loose.step()) : loose;
    }

    /** The multiples of {@code step} from {@code min} to {@code max}, without accumulated rounding error. */
    public double[] ticks() {
        long first = (long) Math.ceil(min / step - 1e-9);
        int count = (int) ((long) Math.floor(max / step + 1e-9) - first) + 1;
        double[] ticks = new double[count];
        for (int i = 0; i < count; i++) {
            ticks[i] = (first + i) * step;
        }
        return ticks;
    }

    /** Decimals needed to tell ticks apart when values are divided by {@code unit}. */
    public int decimals(double unit) {
        double scaled = step / unit;
        return (int) Math.max(0, -Math.floor(Math.log10(scaled) + 1e-9));
    }

    /** A tick value divided by {@code unit}, with just enough decimals. */
    public String label(double value, double unit) {
        return String.format(Locale.ROOT, "%." + decimals(unit) + "f", value / unit + 0.0);
    }

    /** The number of the form 1, 2, 5 or 10 times 10^k nearest to {@code x} (Heckbert's rounding). */
    private static double niceNumber(double x) {
        double power = Math.pow(10, Math.floor(Math.log10(x)));
        double fraction = x / power;
        double nice = fraction < 1.5 ? 1 : fraction < 3 ? 2 : fraction < 7 ? 5 : 10;
        return nice * power;
    }
}
