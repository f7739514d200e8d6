package org.qfleet.app.status;

import java.util.List;
import org.qfleet.drift.Alert;

/**
 * What the status page shows of one open lot.
 *
 * @param product   product id
 * @param lot       lot id
 * @param mu0       the product baseline's mean Qu, NaN while it is being learned
 * @param lotLimit  the product's lower limit on a lot's mean Qu, NaN for none
 * @param excluded  units kept out of the statistics because of their flags
 * @param points    the chart, oldest first (thinned, see {@link ThinnedSeries})
 * @param openAlert the lot's raised alert, or null
 */
public record LotView(String product, String lot, double mu0, double lotLimit, long excluded, List<LotPoint> points,
        Alert openAlert) {

    public LotView {
        points = List.copyOf(points);
    }

    public boolean alerted() {
        return openAlert != null;
    }

    /** The newest point, or null before the first trusted unit. */
    public LotPoint latest() {
        return points.isEmpty() ? null : points.get(points.size() - 1);
    }
}
