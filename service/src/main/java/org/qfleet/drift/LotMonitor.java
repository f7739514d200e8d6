package org.qfleet.drift;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.function.Function;

/**
 * The lot side of drift monitoring, for all lots of one product: learns or applies the product's
 * baseline, keeps each lot's statistics, applies the lot-mean rule, closes lots after the quiet
 * period, and hands each unit on to the station monitor with its deviations from the same lot's
 * other stations. Stateless itself: the state lives in {@link ProductState} and the
 * {@link LotStore}, so the same code runs in memory or on Kafka Streams state stores.
 *
 * <p>Deliberate choices: a retest replaces the unit's earlier value in the lot; a unit for a lot
 * closed by the quiet period is not added to it again (its f0 and coupling still go to its station's
 * charts); the
 * quiet period runs on event time (measuredAt): a lot closes when a unit of the same product stamped
 * more than the quiet period after the lot's latest unit arrives. The charts and the lot statistics
 * take units in arrival order, whatever their measuredAt.
 */
public final class LotMonitor {

    /** Where lot states, and the values of their units, are kept. */
    public interface LotStore {
        LotState get(String product, String lot);

        void put(LotState state);

        /** Deletes the lot and its units' values. */
        void delete(String product, String lot);

        /** The unit's value in its lot's statistics, or null when the unit is new to the lot. */
        UnitValue unit(String product, String lot, String unit);

        void putUnit(String product, String lot, String unit, UnitValue value);
    }

    /** The product's next state, alerts to publish, and the unit for the station monitor. */
    public record Outcome(ProductState product, List<Alert> alerts, StationInput forward) {
    }

    private final DriftSettings settings;
    private final LotMeanRule rule;

    public LotMonitor(DriftSettings settings) {
        this.settings = settings;
        this.rule = new LotMeanRule(settings.minLotCount());
    }

    /** @param product the product's state, null for a product not seen before */
    public Outcome accept(ProductState product, Measurement m, LotStore lots) {
        ProductState p = product == null ? ProductState.start(m.product(), settings) : product;
        List<Alert> alerts = new ArrayList<>();
        if (m.trusted() && p.baseline() == null) {
            BaselineLearner learner = p.learner().plus(m);
            p = learner.complete() ? p.with(learner.baseline(settings.lotLimit(m.product())), null) : p.with(null, learner);
        }
        boolean lateForClosedLot = p.closedLots().contains(m.lot());
        LotState lot = lateForClosedLot ? null : lots.get(m.product(), m.lot());
        if (lot == null && !lateForClosedLot) {
            lot = LotState.open(m.product(), m.lot());
        }
        StationInput forward = stationInput(m, p.baseline(), lot == null ? LotStatistics.EMPTY : lot.stats());
        if (lot != null) {
            lot = update(lot, m, lots);
            if (p.baseline() != null) {
                AlertTracker.Step step = lot.alerts().observe(evidence(lot, p.baseline(), m.measuredAt()));
                step.message().ifPresent(alerts::add);
                lot = new LotState(lot.product(), lot.lot(), lot.stats(), lot.excluded(), lot.retests(), lot.lastEventTime(),
                        step.tracker());
            }
            lots.put(lot);
            p = p.seen(lot.lot(), lot.lastEventTime(), m.measuredAt());
        } else {
            p = p.at(m.measuredAt());
        }
        p = closeQuietLots(p, m.lot(), lots, alerts);
        return new Outcome(p, alerts, forward);
    }

    private LotState update(LotState lot, Measurement m, LotStore lots) {
        long lastTime = Math.max(lot.lastEventTime(), m.measuredAt());
        if (!m.trusted()) {
            return new LotState(lot.product(), lot.lot(), lot.stats(), lot.excluded() + 1, lot.retests(), lastTime, lot.alerts());
        }
        UnitValue earlier = lots.unit(m.product(), m.lot(), m.unit());
        UnitValue now = UnitValue.of(m);
        lots.putUnit(m.product(), m.lot(), m.unit(), now);
        long retests = lot.retests() + (earlier != null ? 1 : 0);
        return new LotState(lot.product(), lot.lot(), lot.stats().plus(now, earlier), lot.excluded(), retests, lastTime,
                lot.alerts());
    }

    private ProductState closeQuietLots(ProductState p, String current, LotStore lots, List<Alert> alerts) {
        long quiet = settings.quietPeriod().toMillis();
        for (Map.Entry<String, OpenLot> open : new TreeMap<>(p.openLots()).entrySet()) {
            boolean quietInTime = p.latestEventTime() - open.getValue().lastEventTime() > quiet;
            boolean quietInUnits = settings.closeAfterUnits() > 0 && p.unitsSince(open.getKey()) >= settings.closeAfterUnits();
            if (open.getKey().equals(current) || !(quietInTime || quietInUnits)) {
                continue;
            }
            LotState lot = lots.get(p.product(), open.getKey());
            if (lot != null && p.baseline() != null) {
                lot.alerts().clear(Alert.LOT_CLOSED, evidence(lot, p.baseline(), p.latestEventTime())).message()
                        .ifPresent(alerts::add);
            }
            lots.delete(p.product(), open.getKey());
            p = p.closed(open.getKey());
        }
        return p;
    }

    /**
     * Whether more than half of the lot's units (at least twice the minimum lot count seen) were
     * excluded for their flags; an open alert holds until the share is under a quarter (thresholds
     * as in {@link ExcludedShare}).
     */
    private boolean excludedShareTooHigh(LotState lot, boolean held) {
        long total = lot.excluded() + lot.stats().count();
        double share = total == 0 ? 0 : (double) lot.excluded() / total;
        return total >= 2L * settings.minLotCount() && share > (held ? ExcludedShare.CLEAR_BELOW : ExcludedShare.RAISE_ABOVE);
    }

    private Evidence evidence(LotState lot, Baseline b, long eventTime) {
        LotStatistics s = lot.stats();
        List<Rule> held = lot.alerts().open() == null ? List.of() : lot.alerts().open().rules();
        List<Rule> firing = new ArrayList<>(rule.firing(s, b, held.stream().filter(r -> r != Rule.LOT_EXCLUDED_SHARE).toList()));
        if (excludedShareTooHigh(lot, held.contains(Rule.LOT_EXCLUDED_SHARE))) {
            firing.add(Rule.LOT_EXCLUDED_SHARE);
        }
        Severity severity = firing.contains(Rule.LOT_MEAN_BELOW_LOT_LIMIT) ? Severity.CRITICAL : Severity.WARNING;
        Map<String, Double> figures = new HashMap<>();
        figures.put("n", (double) s.count());
        figures.put("mean", s.mean());
        figures.put("standardDeviation", s.qu().standardDeviation());
        figures.put("xbarLimit", s.count() > 0 ? b.xbarLowerLimit(s.count()) : Double.NaN);
        figures.put("lotLimit", b.lotLimit());
        figures.put("excluded", (double) lot.excluded());
        figures.put("retests", (double) lot.retests());
        List<Breakdown> byStation = new ArrayList<>();
        new TreeMap<>(s.byStation()).forEach((station, share) -> byStation.add(new Breakdown(station, share.qu().n(), share.qu().mean())));
        return new Evidence(firing, severity, eventTime, figures, byStation, b);
    }

    /**
     * The unit's standardized deviations from the same lot's units on the other stations, once
     * they hold at least {@code minReferenceUnits} units (so a lot that is low everywhere, in Qu and
     * in the coupling level that follows Qu, does not move a station's charts): the median of the
     * other stations' means when there are three or more (so one faulty station does not drag the
     * others' reference), else the mean of their means; the scale sigma0 sqrt(1 + var(reference) /
     * sigma0^2) allows for the reference's own noise (the variance of a median of k means of n units
     * taken as pi/2 sigma0^2/n, its large-sample value; common practice). Before the lot has such a
     * reference, Qu and the coupling level are not charted (the lot-mean rule covers the first
     * units of a lot, and lots measured on one station only), while f0, which a lot's quality does
     * not move, is measured against the product baseline.
     */
    private StationInput stationInput(Measurement m, Baseline b, LotStatistics stats) {
        if (b == null || !m.trusted()) {
            return new StationInput(m.product(), m.station(), m.lot(), m.unit(), m.measuredAt(), m.trusted(),
                    Double.NaN, Double.NaN, Double.NaN, b);
        }
        List<StationShare> others = new ArrayList<>();
        new TreeMap<>(stats.byStation()).forEach((station, share) -> {
            if (!station.equals(m.station())) {
                others.add(share);
            }
        });
        double qu = deviation(m.qUnloaded(), others, StationShare::qu, b.quSigma());
        double f0 = deviation(m.f0Hz(), others, StationShare::f0, b.f0SigmaHz());
        if (Double.isNaN(f0)) {
            f0 = standardized(m.f0Hz(), b.f0MeanHz(), b.f0SigmaHz());
        }
        double level = deviation(m.levelDb(), others, StationShare::level, b.levelSigmaDb());
        return new StationInput(m.product(), m.station(), m.lot(), m.unit(), m.measuredAt(), true, qu, f0, level, b);
    }

    private double deviation(double x, List<StationShare> others, Function<StationShare, Welford> quantity, double sigma) {
        if (!Double.isFinite(x) || !(sigma > 0)) {
            return Double.NaN;
        }
        List<Welford> parts = others.stream().map(quantity).filter(w -> w.n() > 0).toList();
        long units = parts.stream().mapToLong(Welford::n).sum();
        if (units < settings.minReferenceUnits()) {
            return Double.NaN;
        }
        double reference;
        double relativeVariance;
        if (parts.size() >= 3) {
            reference = RobustStats.median(parts.stream().mapToDouble(Welford::mean).toArray());
            relativeVariance = Math.PI / 2 * parts.size() / units;
        } else {
            reference = parts.stream().mapToDouble(Welford::mean).average().orElseThrow();
            relativeVariance = parts.stream().mapToDouble(w -> 1.0 / w.n()).sum() / (parts.size() * parts.size());
        }
        return (x - reference) / (sigma * Math.sqrt(1 + relativeVariance));
    }

    private static double standardized(double x, double mean, double sigma) {
        if (!Double.isFinite(x) || !(sigma > 0) || !Double.isFinite(mean)) {
            return Double.NaN;
        }
        return (x - mean) / sigma;
    }
}
