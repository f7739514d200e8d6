package org.qfleet.drift;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Per product: its baseline (or the learner still collecting units), its open lots with when each
 * was last seen, the latest event time and unit count, and the most recently closed lots.
 *
 * @param product    product id
 * @param baseline   the baseline, null while it is still being learned
 * @param learner    the learner, null once the baseline is known
 * @param openLots   open lot ids and when each was last seen
 * @param latestEventTime latest measuredAt of any unit of the product
 * @param closedLots lots closed most recently (at most {@link #CLOSED_LOTS_KEPT}); units arriving for them are ignored
 * @param units      units of the product seen so far
 */
public record ProductState(String product, Baseline baseline, BaselineLearner learner, Map<String, OpenLot> openLots,
        long latestEventTime, List<String> closedLots, long units) {

    public static final int CLOSED_LOTS_KEPT = 50;

    public ProductState {
        openLots = Map.copyOf(openLots);
        closedLots = List.copyOf(closedLots);
    }

    /** Units of the product's other lots that arrived since {@code lot}'s latest unit. */
    long unitsSince(String lot) {
        OpenLot open = openLots.get(lot);
        return open == null ? 0 : units - open.lastUnit();
    }

    static ProductState start(String product, DriftSettings settings) {
        Baseline configured = settings.baselines().get(product);
        double lotLimit = settings.lotLimit(product);
        if (configured != null) {
            Baseline b = Double.isNaN(configured.lotLimit()) && !Double.isNaN(lotLimit) ? configured.withLotLimit(lotLimit) : configured;
            return new ProductState(product, b, null, Map.of(), Long.MIN_VALUE, List.of(), 0);
        }
        return new ProductState(product, null, BaselineLearner.start(product, settings.learnUnits()), Map.of(),
                Long.MIN_VALUE, List.of(), 0);
    }

    ProductState with(Baseline b, BaselineLearner l) {
        return new ProductState(product, b, l, openLots, latestEventTime, closedLots, units);
    }

    ProductState seen(String lot, long lotTime, long eventTime) {
        Map<String, OpenLot> lots = new HashMap<>(openLots);
        lots.put(lot, new OpenLot(lotTime, units + 1));
        return new ProductState(product, baseline, learner, lots, Math.max(latestEventTime, eventTime), closedLots, units + 1);
    }

    ProductState at(long eventTime) {
        return new ProductState(product, baseline, learner, openLots, Math.max(latestEventTime, eventTime), closedLots,
                units + 1);
    }

    ProductState closed(String lot) {
        Map<String, OpenLot> lots = new HashMap<>(openLots);
        lots.remove(lot);
        List<String> closed = new ArrayList<>(closedLots);
        closed.add(lot);
        while (closed.size() > CLOSED_LOTS_KEPT) {
            closed.remove(0);
        }
        return new ProductState(product, baseline, learner, lots, latestEventTime, closed, units);
    }
}
