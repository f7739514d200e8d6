package org.qfleet.app.status;

import org.qfleet.drift.Alert;
import org.qfleet.drift.Baseline;
import org.qfleet.drift.LotState;

/** The status page's record of one open lot, fed one lot update at a time. Not thread-safe. */
final class LotTrack {

    private final String product;
    private final String lot;
    private final long opened;
    private final ThinnedSeries<LotPoint> points;
    private double mu0 = Double.NaN;
    private double lotLimit = Double.NaN;
    private long excluded;
    private Alert openAlert;

    /** @param opened order in which the view first saw the lot, for newest-first listing */
    LotTrack(String product, String lot, long opened, int maxPoints) {
        this.product = product;
        this.lot = lot;
        this.opened = opened;
        this.points = new ThinnedSeries<>(maxPoints);
    }

    long opened() {
        return opened;
    }

    /**
     * Takes the lot's state after one of its units. A unit that did not change the trusted count
     * (a retest, or a state seen again after a reprocessed transaction) replaces the newest point
     * rather than adding one, so the chart's units never run backwards.
     */
    void update(LotState state, Baseline baseline) {
        excluded = state.excluded();
        openAlert = state.alerts().open();
        if (baseline != null) {
            mu0 = baseline.quMean();
            lotLimit = baseline.lotLimit();
        }
        long n = state.stats().count();
        if (n <= 0) {
            return;
        }
        while (points.size() > 0 && points.last().units() >= n) {
            points.removeLast();
        }
        double limit = baseline == null ? Double.NaN : baseline.xbarLowerLimit(n);
        points.add(new LotPoint(n, state.stats().mean(), limit));
    }

    LotView view() {
        return new LotView(product, lot, mu0, lotLimit, excluded, points.toList(), openAlert);
    }
}
