package org.qfleet.drift;

import java.util.ArrayList;
import java.util.List;

/**
 * The lot-mean rule with its attribution. After {@code minCount} trusted units, a lot's mean Qu
 * below the X-bar lower limit mu0 - 3 sigma0 / sqrt(n) (Shewhart limits, as in Montgomery,
 * Introduction to Statistical Quality Control, recalled from memory) or below the product's lot
 * limit fires the rule (for a learned baseline the limit also allows for the baseline's own
 * uncertainty, see {@link Baseline#xbarLowerLimit}). It blames the lot only when the drop is seen across stations: with units
 * from two or more stations, the lot without its lowest station must break the same limit (a single
 * low station inside a healthy lot is a station problem, for the station monitor). A lot measured
 * on one station only cannot be told apart from its station and is judged as a whole.
 * An open alert holds while the mean stays below half that distance,
 * so a mean hovering at the limit does not raise and clear by turns.
 */
public record LotMeanRule(int minCount) {

    static final double XBAR_WIDTH = Baseline.XBAR_WIDTH;
    static final double HOLD_WIDTH = Baseline.XBAR_WIDTH / 2;

    /** Rules firing on the lot now; {@code held} the rules of an open alert, kept while it holds. */
    List<Rule> firing(LotStatistics stats, Baseline b, List<Rule> held) {
        if (stats.count() < minCount) {
            return List.of();
        }
        List<Rule> firing = new ArrayList<>();
        Welford whole = stats.qu();
        Welford rest = stats.byStation().size() < 2 ? whole : whole.without(stats.byStation().get(stats.lowestStation()).qu());
        if (rest.n() < minCount) {
            return held.isEmpty() ? List.of() : held;
        }
        if (below(whole, b, XBAR_WIDTH) && below(rest, b, XBAR_WIDTH)) {
            firing.add(Rule.LOT_MEAN_BELOW_XBAR_LIMIT);
        }
        if (belowLotLimit(whole, b) && belowLotLimit(rest, b)) {
            firing.add(Rule.LOT_MEAN_BELOW_LOT_LIMIT);
        }
        if (firing.isEmpty() && !held.isEmpty() && below(whole, b, HOLD_WIDTH) && below(rest, b, HOLD_WIDTH)) {
            return held;
        }
        return firing;
    }

    private static boolean below(Welford w, Baseline b, double width) {
        return w.mean() < b.lowerLimit(w.n(), width);
    }

    private static boolean belowLotLimit(Welford w, Baseline b) {
        return !Double.isNaN(b.lotLimit()) && w.mean() < b.lotLimit();
    }
}
