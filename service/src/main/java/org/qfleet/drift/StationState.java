package org.qfleet.drift;

import java.util.List;

/**
 * Everything kept about one station (for one product).
 *
 * @param product    product id
 * @param station    station id
 * @param qu         EWMA of the standardized Qu deviation
 * @param f0         CUSUM of the standardized f0 deviation
 * @param level      CUSUM of the standardized coupling-level deviation
 * @param excluded   units kept out of the charts because of their flags
 * @param exclusions the recent share of such units
 * @param beyondRun  charted units left to confirm a first signal (0: none pending; -1: confirmed)
 * @param recentLots the station's deviations on its most recent lots, oldest first
 * @param alerts     the station's alert state
 */
public record StationState(String product, String station, Ewma qu, Cusum f0, Cusum level, long excluded,
        ExcludedShare exclusions, int beyondRun, List<LotDeviation> recentLots, AlertTracker alerts) {

    public static final int RECENT_LOTS_KEPT = 5;

    public StationState {
        recentLots = List.copyOf(recentLots);
        exclusions = exclusions == null ? ExcludedShare.NONE : exclusions;
    }

    static StationState start(String product, String station, DriftSettings s) {
        return new StationState(product, station, Ewma.start(s.ewmaLambda(), s.ewmaWidth()), Cusum.start(s.cusumK(), s.cusumH()),
                Cusum.start(s.cusumK(), s.cusumH()), 0, ExcludedShare.NONE, 0, List.of(),
                AlertTracker.idle(AlertKind.STATION, product, station));
    }

    StationState withAlerts(AlertTracker tracker) {
        return new StationState(product, station, qu, f0, level, excluded, exclusions, beyondRun, recentLots, tracker);
    }
}
