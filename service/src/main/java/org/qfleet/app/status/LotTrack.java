package org.qfleet.app.status;

import java.time.Instant;
import org.qfleet.drift.Alert;
import org.qfleet.drift.AlertKind;
import org.qfleet.drift.AlertStatus;
import org.qfleet.drift.Baseline;
import org.qfleet.drift.LotState;

/**
 * The status page's record of one lot, open or recently closed, fed one lot update at a time. It
 * remembers whether the lot ever had a lot alert, so a closed lot that drifted can be kept and
 * shown. Not thread-safe.
 */
final class LotTrack {

    private final String product;
    private final String lot;
    private final ThinnedSeries<LotPoint> points;
    private long opened;
    private double mu0 = Double.NaN;
    private double lotLimit = Double.NaN;
    private long excluded;
    private Alert openAlert;
    private Alert lastAlert;
    private Instant closedAt;

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

    Instant closedAt() {
        return closedAt;
    }

    boolean hadAlert() {
        return lastAlert != null;
    }

    /**
     * Takes the lot's state after one of its units. A unit that did not change the trusted count
     * (a retest, or a state seen again after a reprocessed transaction) replaces the newest point
     * rather than adding one, so the chart's units never run backwards.
     */
    void update(LotState state, Baseline baseline) {
        excluded = state.excluded();
        openAlert = state.alerts().open();
        noteAlert(openAlert);
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

    /** Remembers a raised (or updated) lot alert of this lot; anything else is ignored. */
    void noteAlert(Alert alert) {
        if (alert != null && alert.kind() == AlertKind.LOT && alert.status() == AlertStatus.RAISED) {
            lastAlert = alert;
        }
    }

    void close(Instant at) {
        closedAt = at;
        openAlert = null;
    }

    /** The lot is open again (a unit arrived after it closed); it lists as newly opened. */
    void reopen(long openedAgain) {
        closedAt = null;
        opened = openedAgain;
    }

    /** @param raisedNow the lot's alert raised now, for a closed lot (an open lot's comes with its state) */
    LotView view(Alert raisedNow) {
        return new LotView(product, lot, mu0, lotLimit, excluded, points.toList(),
                closedAt == null ? openAlert : raisedNow, lastAlert, closedAt);
    }
}
