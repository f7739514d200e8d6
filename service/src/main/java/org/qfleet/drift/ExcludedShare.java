package org.qfleet.drift;

/**
 * Watches the share of a subject's units kept out of the statistics because of their flags: an
 * EWMA (lambda 0.05, about the last 40 units) of the excluded indicator. It signals once at least
 * {@link #MIN_UNITS} units were seen and more than half of the recent ones were excluded (a
 * fixture or a lot whose fits cannot be trusted is itself a finding), and stays signalled until
 * the share is back under a quarter. Thresholds are common practice for a yield-like ratio, not a
 * published chart. Immutable.
 *
 * @param share     EWMA of the excluded indicator, 0-1
 * @param units     units seen, trusted or not
 * @param signalled whether the share is (still) too high
 */
public record ExcludedShare(double share, long units, boolean signalled) {

    static final double LAMBDA = 0.05;
    static final int MIN_UNITS = 20;
    static final double RAISE_ABOVE = 0.5;
    static final double CLEAR_BELOW = 0.25;
    public static final ExcludedShare NONE = new ExcludedShare(0, 0, false);

    public ExcludedShare plus(boolean excluded) {
        double next = LAMBDA * (excluded ? 1 : 0) + (1 - LAMBDA) * share;
        long seen = units + 1;
        boolean out = seen >= MIN_UNITS && next > RAISE_ABOVE;
        return new ExcludedShare(next, seen, out || (signalled && next > CLEAR_BELOW));
    }
}
