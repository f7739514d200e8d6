package org.qfleet.drift;

/**
 * One row of an alert's evidence along the other dimension: for a lot alert, a station of the lot;
 * for a station alert, a lot the station measured.
 *
 * @param id   station or lot id
 * @param n    trusted units
 * @param mean mean Qu (lot alert), or mean standardized Qu deviation from the lot's other stations (station alert)
 */
public record Breakdown(String id, long n, double mean) {
}
