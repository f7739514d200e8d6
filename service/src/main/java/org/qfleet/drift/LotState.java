package org.qfleet.drift;

/**
 * Everything kept about one open lot.
 *
 * @param product       product id
 * @param lot           lot id
 * @param stats         trusted units' statistics
 * @param excluded      units kept out of the statistics because of their flags
 * @param retests       units measured again (the later value replaced the earlier one)
 * @param lastEventTime latest measuredAt of the lot's units, epoch milliseconds
 * @param alerts        the lot's alert state
 */
public record LotState(String product, String lot, LotStatistics stats, long excluded, long retests,
        long lastEventTime, AlertTracker alerts) {

    public static LotState open(String product, String lot) {
        return new LotState(product, lot, LotStatistics.EMPTY, 0, 0, Long.MIN_VALUE,
                AlertTracker.idle(AlertKind.LOT, product, lot));
    }
}
