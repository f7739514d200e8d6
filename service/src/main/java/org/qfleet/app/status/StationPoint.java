package org.qfleet.app.status;

/**
 * One point of a station's charts, all in units of the baseline's standard deviation.
 *
 * @param units         units charted on the station so far
 * @param quEwma        EWMA of the standardized Qu deviation
 * @param f0Upper       upper CUSUM of the f0 deviation
 * @param f0Lower       lower CUSUM of the f0 deviation
 * @param couplingUpper upper CUSUM of the coupling-level deviation
 * @param couplingLower lower CUSUM of the coupling-level deviation
 */
public record StationPoint(long units, double quEwma, double f0Upper, double f0Lower, double couplingUpper,
        double couplingLower) {
}
