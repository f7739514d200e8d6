package org.qfleet.sim;

/**
 * Where and how densely to sweep.
 *
 * @param startHz first frequency
 * @param stopHz  last frequency
 * @param points  number of equally spaced points
 */
public record SweepPlan(double startHz, double stopHz, int points) {

    /** A sweep centred on f0 spanning {@code widths} half-power widths (f0 / QL each). */
    public static SweepPlan around(double f0Hz, double qLoaded, double widths, int points) {
        double half = 0.5 * widths * f0Hz / qLoaded;
        return new SweepPlan(f0Hz - half, f0Hz + half, points);
    }
}
