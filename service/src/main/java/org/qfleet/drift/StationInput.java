package org.qfleet.drift;

/**
 * One unit as a station monitor sees it: its deviations, standardized, from the reference the lot
 * monitor chose (the same lot's units on other stations, or the product baseline).
 *
 * @param product   product id
 * @param station   station id
 * @param lot       lot id
 * @param unit      unit id
 * @param eventTime measuredAt, epoch milliseconds
 * @param trusted   false for units kept out of the statistics (flags); they are only counted
 * @param quDev     standardized Qu deviation, NaN when not charted (no baseline yet, or too few
 *                  units of the lot on other stations)
 * @param f0Dev     standardized f0 deviation, NaN when not available
 * @param levelDev  standardized coupling-level deviation, NaN when not available
 * @param baseline  the product baseline, null while being learned
 */
public record StationInput(String product, String station, String lot, String unit, long eventTime, boolean trusted,
        double quDev, double f0Dev, double levelDev, Baseline baseline) {
}
