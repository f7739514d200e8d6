package org.qfleet.sim;

/**
 * Where and how densely to sweep.
 *
 * @param startHz first frequency
 * @param stopHz  last frequency
 * @param points  number of equally spaced points
 */
public record SweepPlan(double startHz, double stopHz, int points) {

    public SweepPlan {
        if (!(startHz > 0) || !(stopHz > startHz) || Double.isInfinite(stopHz)) {
            throw new IllegalArgumentException("sweep plan needs 0 < startHz < stopHz, finite; got "
                    + startHz + " .. " + stopHz);
        }
        if (points < 2) {
            throw new IllegalArgumentException("sweep plan needs at least 2 points, got " + points);
        }
    }

    /** A sweep centred on f0 spanning {@code widths} half-power widths (f0 / QL each). */
    public static SweepPlan around(double f0Hz, double qLoaded, double widths, int points) {
        double half = 0.5 * widths * f0Hz / qLoaded;
        return new SweepPlan(f0Hz - half, f0Hz + half, points);
    }

    /** A sweep of {@code spanHz} centred on {@code centreHz}. */
    public static SweepPlan centred(double centreHz, double spanHz, int points) {
        return new SweepPlan(centreHz - 0.5 * spanHz, centreHz + 0.5 * spanHz, points);
    }

    public double centreHz() {
        return 0.5 * (startHz + stopHz);
    }

    public double spanHz() {
        return stopHz - startHz;
    }

    /** The frequencies of the sweep, first and last exactly {@code startHz} and {@code stopHz}. */
    public double[] frequencies() {
        double[] f = new double[points];
        double step = spanHz() / (points - 1);
        for (int i = 0; i < points; i++) {
            f[i] = startHz + i * step;
        }
        f[points - 1] = stopHz;
        return f;
    }
}
