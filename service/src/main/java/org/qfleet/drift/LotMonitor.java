package org.qfleet.drift;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

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

    /** Where lot states are kept. */
    public interface LotStore {
        LotState get(String product, String lot);

        void put(LotState state);

        void delete(String product, String lot);
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
            lot = update(lot, m);
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

    private LotState update(LotState lot, Measurement m) {
        long lastTime = Math.max(lot.lastEventTime(), m.measuredAt());
        if (!m.trusted()) {
            return new LotState(lot.product(), lot.lot(), lot.stats(), lot.excluded() + 1, lot.retests(), lastTime, lot.alerts());
        }
        long retests = lot.retests() + (lot.stats().units().containsKey(m.unit()) ? 1 : 0);
        return new LotState(lot.product(), lot.lot(), lot.stats().plus(m), lot.excluded(), retests, lastTime, lot.alerts());
    }

    private ProductState closeQuietLots(ProductState p, String current, LotStore lots, List<Alert> alerts) {
        long quiet = settings.quietPeriod().toMillis();
        for (Map.Entry<String, Long> open : new TreeMap<>(p.openLots()).entrySet()) {
            if (open.getKey().equals(current) || p.latestEventTime() - open.getValue() <= quiet) {
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

    private Evidence evidence(LotState lot, Baseline b, long eventTime) {
        LotStatistics s = lot.stats();
        List<Rule> firing = rule.firing(s, b, lot.alerts().open() == null ? List.of() : lot.alerts().open().rules());
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
     * The unit's standardized deviations. Qu is measured against the same lot's units on the other
     * stations once they hold at least {@code minReferenceUnits} (so a lot that is low everywhere
     * does not move a station's chart), and not charted before (the first units of a lot, and lots
     * measured on one station only, which the lot-mean rule covers): the median of the other stations' means when there are
     * three or more (so one faulty station does not drag the others' reference), else the mean of
     * their means; the scale sigma0 sqrt(1 + var(reference)/sigma0^2) allows for the reference's own
     * noise (the variance of a median of k means of n units taken as pi/2 sigma0^2/n, its
     * large-sample value; common practice). f0 and the coupling level are fixture properties: they
     * are measured against the product baseline, which a faulty station cannot move.
     */
    private StationInput stationInput(Measurement m, Baseline b, LotStatistics stats) {
        if (b == null || !m.trusted()) {
            return new StationInput(m.product(), m.station(), m.lot(), m.unit(), m.measuredAt(), m.trusted(),
                    Double.NaN, Double.NaN, Double.NaN, b);
        }
        double qu = quDeviation(m, b, stats);
        double f0 = standardized(m.f0Hz(), b.f0MeanHz(), b.f0SigmaHz());
        double level = standardized(m.levelDb(), b.levelMeanDb(), b.levelSigmaDb());
        return new StationInput(m.product(), m.station(), m.lot(), m.unit(), m.measuredAt(), true, qu, f0, level, b);
    }

    private double quDeviation(Measurement m, Baseline b, LotStatistics stats) {
        List<Welford> others = new ArrayList<>();
        long units = 0;
        for (Map.Entry<String, StationShare> e : new TreeMap<>(stats.byStation()).entrySet()) {
            if (!e.getKey().equals(m.station())) {
                others.add(e.getValue().qu());
                units += e.getValue().qu().n();
            }
        }
        if (units < settings.minReferenceUnits()) {
            return Double.NaN;
        }
        double reference;
        double relativeVariance;
        if (others.size() >= 3) {
            reference = RobustStats.median(others.stream().mapToDouble(Welford::mean).toArray());
            relativeVariance = Math.PI / 2 * others.size() / units;
        } else {
            reference = others.stream().mapToDouble(Welford::mean).average().orElseThrow();
            relativeVariance = others.stream().mapToDouble(w -> 1.0 / w.n()).sum() / (others.size() * others.size());
        }
        return (m.qUnloaded() - reference) / (b.quSigma() * Math.sqrt(1 + relativeVariance));
    }

    private static double standardized(double x, double mean, double sigma) {
        if (!Double.isFinite(x) || !(sigma > 0) || !Double.isFinite(mean)) {
            return Double.NaN;
        }
        return (x - mean) / sigma;
    }
}
