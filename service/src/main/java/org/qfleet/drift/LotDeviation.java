package org.qfleet.drift;

/** A station's standardized Qu deviations on one lot: evidence of a station alert. */
public record LotDeviation(String lot, Welford quDev) {
}
