package org.qfleet.drift;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The station side of drift monitoring: an EWMA chart of the standardized Qu deviation
 * (lambda 0.2, L 2.962; Lucas & Saccucci 1990) and two-sided tabular CUSUMs (k = 0.5, h = 5;
 * Montgomery) of the standardized f0 and coupling-level deviations, which catch a fixture fault
 * before Qu moves. All three deviations are taken from the same lot's units on the other stations
 * ({@link LotMonitor}), so a lot that is low on every station does not move any station's charts,
 * and a station that keeps deviating lot after lot is what the charts see: the alert carries its
 * Qu deviation per recent lot as evidence.
 *
 * <p>Three charts per station, each with an in-control run length near 500, would alert a healthy
 * station about once per 160 units. A station is therefore alerted only on a confirmed signal:
 * the chart that signals is restarted, and must signal again within
 * {@link DriftSettings#confirmWithin()} charted units (default 30). In control a restarted chart
 * rarely signals that soon, while a real shift gives the second signal after about the chart's
 * own run length again: the station is reported after roughly twice the published delay
 * (common practice: act on a repeated signal, as with two-of-three run rules). An open alert
 * holds while any chart is still signalled and clears when all are back. Charts are kept per
 * product and station (each product has its own baseline), the alert per station
 * ({@link StationAlerts}): one fixture fault is one alert, whichever products show it. The share of excluded
 * units is watched too. Charts take units in arrival order; a retest is one more measurement for
 * the station. Stateless itself.
 */
public final class StationMonitor {

    /** {@link StationState#beyondRun()} when a signal is confirmed. */
    static final int CONFIRMED = -1;

    private final DriftSettings settings;

    public StationMonitor(DriftSettings settings) {
        this.settings = settings;
    }

    /** The charts' next state, the station's next alert state, and the alert message to publish, if any. */
    public record Step(StationState state, StationAlerts alerts, Optional<Alert> message) {
    }

    /**
     * @param state  the charts of the unit's product on its station, null when not seen before
     * @param alerts the station's alert state (shared by its products), null when not seen before
     */
    public Step accept(StationState state, StationAlerts alerts, StationInput in) {
        StationState s = state == null ? StationState.start(in.product(), in.station(), settings) : state;
        StationAlerts a = alerts == null ? StationAlerts.start(in.station()) : alerts;
        boolean open = a.tracker().open() != null;
        ExcludedShare exclusions = s.exclusions().plus(!in.trusted());
        long excluded = s.excluded() + (in.trusted() ? 0 : 1);
        Ewma qu = s.qu();
        Cusum f0 = s.f0();
        Cusum level = s.level();
        List<LotDeviation> lots = s.recentLots();
        int run = s.beyondRun();
        if (in.trusted() && in.baseline() != null) {
            qu = Double.isFinite(in.quDev()) ? qu.plus(in.quDev()) : qu;
            f0 = Double.isFinite(in.f0Dev()) ? f0.plus(in.f0Dev()) : f0;
            level = Double.isFinite(in.levelDev()) ? level.plus(in.levelDev()) : level;
            lots = Double.isFinite(in.quDev()) ? recentLots(lots, in.lot(), in.quDev()) : lots;
            boolean charted = Double.isFinite(in.quDev()) || Double.isFinite(in.f0Dev()) || Double.isFinite(in.levelDev());
            boolean beyond = qu.beyondLimit() || f0.beyondLimit() || level.beyondLimit();
            if (charted && !open && settings.confirmWithin() > 0) {
                if (beyond && run == 0) {
                    // a first signal: restart the charts that gave it and wait for a second one
                    qu = qu.beyondLimit() ? qu.restarted() : qu;
                    f0 = f0.beyondLimit() ? f0.restarted() : f0;
                    level = level.beyondLimit() ? level.restarted() : level;
                    run = settings.confirmWithin();
                } else if (beyond) {
                    run = CONFIRMED;
                } else if (run > 0) {
                    run--;
                }
            } else if (open || settings.confirmWithin() == 0) {
                run = beyond ? CONFIRMED : 0;
            }
        }
        StationState next = new StationState(s.product(), s.station(), qu, f0, level, excluded, exclusions, run, lots,
                a.tracker());
        if (in.baseline() == null) {
            return new Step(next, a, Optional.empty());
        }
        StationAlerts.Step step = a.observe(in.product(), evidence(next, in, open));
        return new Step(next.withAlerts(step.alerts().tracker()), step.alerts(), step.tracked().message());
    }

    private static List<LotDeviation> recentLots(List<LotDeviation> recent, String lot, double dev) {
        List<LotDeviation> next = new ArrayList<>(recent);
        int at = -1;
        for (int i = 0; i < next.size(); i++) {
            if (next.get(i).lot().equals(lot)) {
                at = i;
            }
        }
        Welford w = at < 0 ? Welford.EMPTY : next.remove(at).quDev();
        next.add(new LotDeviation(lot, w.plus(dev)));
        while (next.size() > StationState.RECENT_LOTS_KEPT) {
            next.remove(0);
        }
        return next;
    }

    /**
     * Rules firing: a chart opens an episode only once a signal is confirmed (and, for the EWMA,
     * backed by its slow companion, {@link Ewma#sustained()}); once an episode is open, every chart
     * still signalled keeps it (and adds its rule).
     */
    private static Evidence evidence(StationState s, StationInput in, boolean open) {
        List<Rule> firing = new ArrayList<>();
        boolean charts = open || s.beyondRun() == CONFIRMED;
        if (charts && s.qu().signalled() && (open || s.qu().sustained())) {
            firing.add(Rule.QU_EWMA);
        }
        if (charts && s.f0().signalled()) {
            firing.add(Rule.F0_CUSUM);
        }
        if (charts && s.level().signalled()) {
            firing.add(Rule.COUPLING_CUSUM);
        }
        if (s.exclusions().signalled()) {
            firing.add(Rule.STATION_EXCLUDED_SHARE);
        }
        Map<String, Double> figures = new HashMap<>();
        figures.put("n", (double) s.qu().samples());
        figures.put("excluded", (double) s.excluded());
        figures.put("excludedShare", s.exclusions().share());
        figures.put("quEwma", s.qu().z());
        figures.put("quEwmaLimit", s.qu().limit());
        figures.put("f0CusumUpper", s.f0().upper());
        figures.put("f0CusumLower", s.f0().lower());
        figures.put("couplingCusumUpper", s.level().upper());
        figures.put("couplingCusumLower", s.level().lower());
        figures.put("cusumLimit", s.f0().h());
        List<Breakdown> byLot = s.recentLots().stream().map(l -> new Breakdown(l.lot(), l.quDev().n(), l.quDev().mean())).toList();
        return new Evidence(firing, StationAlerts.severity(firing), in.eventTime(), figures, byLot, in.baseline());
    }
}
