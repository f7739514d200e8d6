package org.qfleet.app.status;

import java.util.List;
import org.qfleet.drift.Alert;

/**
 * What the status page shows of one station (for one product).
 *
 * @param product    product id
 * @param station    station id
 * @param ewmaLimit  the EWMA chart's limit (standardized)
 * @param cusumLimit the CUSUM decision interval h (standardized)
 * @param excluded   units kept out of the charts because of their flags
 * @param points     the charts, oldest first (thinned, see {@link ThinnedSeries})
 * @param openAlert  the station's raised alert, or null
 */
public record StationView(String product, String station, double ewmaLimit, double cusumLimit, long excluded,
        List<StationPoint> points, Alert openAlert) {

    public StationView {
        points = List.copyOf(points);
    }

    public boolean alerted() {
        return openAlert != null;
    }

    public StationPoint latest() {
        return points.isEmpty() ? null : points.get(points.size() - 1);
    }
}
