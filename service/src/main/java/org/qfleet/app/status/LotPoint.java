package org.qfleet.app.status;

/**
 * One point of a lot's control chart.
 *
 * @param units      trusted units in the lot's statistics so far
 * @param mean       the lot's mean Qu over them
 * @param xbarLimit  the X-bar lower limit for that many units, NaN while the baseline is being learned
 */
public record LotPoint(long units, double mean, double xbarLimit) {

    /** Whether the mean lies below the X-bar limit or the lot limit. */
    public boolean below(double lotLimit) {
        return mean < xbarLimit || mean < lotLimit;
    }
}
