package org.qfleet.app.status;

import java.time.Instant;
import java.util.List;
import org.qfleet.drift.Alert;

/**
 * What the status page shows of one open or recently closed lot.
 *
 * @param product   product id
 * @param lot       lot id
 * @param mu0       the product baseline's mean Qu, NaN while it is being learned
 * @param lotLimit  the product's lower limit on a lot's mean Qu, NaN for none
 * @param excluded  units kept out of the statistics because of their flags
 * @param points    the chart, oldest first (thinned, see {@link ThinnedSeries})
 * @param openAlert the lot's alert raised now, or null
 * @param lastAlert the latest raised message of any lot alert in the lot's life, or null if it never had one
 * @param closedAt  when the view saw the lot close, or null while it is open
 */
public record LotView(String product, String lot, double mu0, double lotLimit, long excluded, List<LotPoint> points,
        Alert openAlert, Alert lastAlert, Instant closedAt) {

    public LotView {
        points = List.copyOf(points);
    }

    /** An alert of the lot is raised now. */
    public boolean alerted() {
        return openAlert != null;
    }

    /** The lot had a lot alert at some time in its life. */
    public boolean hadAlert() {
        return lastAlert != null || openAlert != null;
    }

    public boolean closed() {
        return closedAt != null;
    }

    /** Drawn as needing a look: raised now, or closed after an alert. */
    public boolean highlighted() {
        return alerted() || (closed() && hadAlert());
    }

    /** The newest point, or null before the first trusted unit. */
    public LotPoint latest() {
        return points.isEmpty() ? null : points.get(points.size() - 1);
    }
}
