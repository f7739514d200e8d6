package org.qfleet.sweep;

/**
 * Bounds that protect the service from inputs too small to fit or too large to hold.
 *
 * @param minPoints fewest points a sweep may have
 * @param maxPoints most points a sweep may have, counted after decoding
 */
public record SweepLimits(int minPoints, int maxPoints) {

    /** Default bound on points per sweep (far above any analyzer's sweep), a constant so that command-line defaults can name it. */
    public static final int DEFAULT_MAX_POINTS = 100_001;

    /** Seven points is the least that can constrain a circle with delay. */
    public static final SweepLimits DEFAULT = new SweepLimits(7, DEFAULT_MAX_POINTS);

    public SweepLimits {
        if (minPoints < 1 || maxPoints < minPoints) {
            throw new IllegalArgumentException("need 1 <= minPoints <= maxPoints");
        }
    }
}
