package org.qfleet.app.status;

import org.qfleet.drift.Alert;
import org.qfleet.drift.StationState;

/** The status page's record of one station, fed one station update at a time. Not thread-safe. */
final class StationTrack {

    private final String product;
    private final String station;
    private final ThinnedSeries<StationPoint> points;
    private double ewmaLimit = Double.NaN;
    private double cusumLimit = Double.NaN;
    private long excluded;
    private Alert openAlert;

    StationTrack(String product, String station, int maxPoints) {
        this.product = product;
        this.station = station;
        this.points = new ThinnedSeries<>(maxPoints);
    }

    /**
     * Takes the station's state after one of its units. Only a state with more charted units than
     * the newest point adds a point: untrusted units, units before the baseline is known, and a
     * state seen again after a reprocessed transaction leave the charts as they are.
     */
    void update(StationState state) {
        excluded = state.excluded();
        openAlert = state.alerts().open();
        ewmaLimit = state.qu().limit();
        cusumLimit = state.f0().h();
        long n = Math.max(state.qu().samples(), Math.max(state.f0().samples(), state.level().samples()));
        StationPoint last = points.last();
        if (n <= 0 || (last != null && n <= last.units())) {
            return;
        }
        points.add(new StationPoint(n, state.qu().z(), state.f0().upper(), state.f0().lower(), state.level().upper(),
                state.level().lower()));
    }

    StationView view() {
        return new StationView(product, station, ewmaLimit, cusumLimit, excluded, points.toList(), openAlert);
    }
}
