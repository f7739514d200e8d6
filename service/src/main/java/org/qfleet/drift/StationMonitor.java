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
 * before Qu moves. Qu deviations are taken from the same lot's units on the other stations, f0 and
 * coupling deviations from the product baseline ({@link LotMonitor}), so a lot that is low on every
 * station does not move any station's charts, and a station that keeps deviating lot after lot is
 * what the charts see: the alert carries its Qu deviation per recent lot as evidence. Charts take units in arrival order; a retest is one more
 * measurement for the station. Stateless itself.
 */
public final class StationMonitor {

    private final DriftSettings settings;

    public StationMonitor(DriftSettings settings) {
        this.settings = settings;
    }

    /** The station's next state and the alert message to publish, if any. */
    public record Step(StationState state, Optional<Alert> message) {
    }

    /** @param state the station's state, null for a station not seen before */
    public Step accept(StationState state, StationInput in) {
        StationState s = state == null ? StationState.start(in.product(), in.station(), settings) : state;
        if (!in.trusted()) {
            return new Step(new StationState(s.product(), s.station(), s.qu(), s.f0(), s.level(), s.excluded() + 1,
                    s.recentLots(), s.alerts()), Optional.empty());
        }
        if (in.baseline() == null) {
            return new Step(s, Optional.empty());
        }
        Ewma qu = Double.isFinite(in.quDev()) ? s.qu().plus(in.quDev()) : s.qu();
        Cusum f0 = Double.isFinite(in.f0Dev()) ? s.f0().plus(in.f0Dev()) : s.f0();
        Cusum level = Double.isFinite(in.levelDev()) ? s.level().plus(in.levelDev()) : s.level();
        List<LotDeviation> lots = Double.isFinite(in.quDev()) ? recentLots(s.recentLots(), in.lot(), in.quDev()) : s.recentLots();
        StationState charted = new StationState(s.product(), s.station(), qu, f0, level, s.excluded(), lots, s.alerts());
        AlertTracker.Step step = s.alerts().observe(evidence(charted, in));
        return new Step(new StationState(s.product(), s.station(), qu, f0, level, s.excluded(), lots, step.tracker()),
                step.message());
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

    private static Evidence evidence(StationState s, StationInput in) {
        List<Rule> firing = new ArrayList<>();
        if (s.qu().signalled()) {
            firing.add(Rule.QU_EWMA);
        }
        if (s.f0().signalled()) {
            firing.add(Rule.F0_CUSUM);
        }
        if (s.level().signalled()) {
            firing.add(Rule.COUPLING_CUSUM);
        }
        Severity severity = firing.size() >= 2 ? Severity.CRITICAL : Severity.WARNING;
        Map<String, Double> figures = new HashMap<>();
        figures.put("n", (double) s.qu().samples());
        figures.put("excluded", (double) s.excluded());
        figures.put("quEwma", s.qu().z());
        figures.put("quEwmaLimit", s.qu().limit());
        figures.put("f0CusumUpper", s.f0().upper());
        figures.put("f0CusumLower", s.f0().lower());
        figures.put("couplingCusumUpper", s.level().upper());
        figures.put("couplingCusumLower", s.level().lower());
        figures.put("cusumLimit", s.f0().h());
        List<Breakdown> byLot = s.recentLots().stream().map(l -> new Breakdown(l.lot(), l.quDev().n(), l.quDev().mean())).toList();
        return new Evidence(firing, severity, in.eventTime(), figures, byLot, in.baseline());
    }
}
