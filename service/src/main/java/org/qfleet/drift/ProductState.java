package org.qfleet.drift;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Per product: its baseline (or the learner still collecting units), its open lots with the latest
 * event time of each, the latest event time seen, and the most recently closed lots.
 *
 * @param product    product id
 * @param baseline   the baseline, null while it is still being learned
 * @param learner    the learner, null once the baseline is known
 * @param openLots   open lot ids and their latest measuredAt
 * @param latestEventTime latest measuredAt of any unit of the product
 * @param closedLots lots closed most recently (at most {@link #CLOSED_LOTS_KEPT}); units arriving for them are ignored
 * @param units      units of the product seen so far
 * @param openLotUnits open lot ids and the product's unit count at their latest unit
 */
public record ProductState(String product, Baseline baseline, BaselineLearner learner, Map<String, Long> openLots,
        long latestEventTime, List<String> closedLots, long units, Map<String, Long> openLotUnits) {

    public static final int CLOSED_LOTS_KEPT = 50;

    public ProductState {
        openLots = Map.copyOf(openLots);
        closedLots = List.copyOf(closedLots);
        openLotUnits = openLotUnits == null ? Map.of() : Map.copyOf(openLotUnits);
    }

    /** Units of the product's other lots that arrived since {@code lot}'s latest unit. */
    long unitsSince(String lot) {
        return units - openLotUnits.getOrDefault(lot, units);
    }

    static ProductState start(String product, DriftSettings settings) {
        Baseline configured = settings.baselines().get(product);
        double lotLimit = settings.lotLimit(product);
        if (configured != null) {
            Baseline b = Double.isNaN(configured.lotLimit()) && !Double.isNaN(lotLimit) ? configured.withLotLimit(lotLimit) : configured;
            return new ProductState(product, b, null, Map.of(), Long.MIN_VALUE, List.of(), 0, Map.of());
        }
        return new ProductState(product, null, BaselineLearner.start(product, settings.learnUnits()), Map.of(),
                Long.MIN_VALUE, List.of(), 0, Map.of());
    }

    ProductState with(Baseline b, BaselineLearner l) {
        return new ProductState(product, b, l, openLots, latestEventTime, closedLots, units, openLotUnits);
    }

    ProductState seen(String lot, long lotTime, long eventTime) {
        Map<String, Long> lots = new HashMap<>(openLots);
        lots.put(lot, lotTime);
        Map<String, Long> lotUnits = new HashMap<>(openLotUnits);
        lotUnits.put(lot, units + 1);
        return new ProductState(product, baseline, learner, lots, Math.max(latestEventTime, eventTime), closedLots, units + 1,
                lotUnits);
    }

    ProductState at(long eventTime) {
        return new ProductState(product, baseline, learner, openLots, Math.max(latestEventTime, eventTime), closedLots,
                units + 1, openLotUnits);
    }

    ProductState closed(String lot) {
        Map<String, Long> lots = new HashMap<>(openLots);
        lots.remove(lot);
        Map<String, Long> lotUnits = new HashMap<>(openLotUnits);
        lotUnits.remove(lot);
        List<String> closed = new ArrayList<>(closedLots);
        closed.add(lot);
        while (closed.size() > CLOSED_LOTS_KEPT) {
            closed.remove(0);
        }
        return new ProductState(product, baseline, learner, lots, latestEventTime, closed, units, lotUnits);
    }
}
