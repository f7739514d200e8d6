package org.qfleet.app.status;

import java.util.List;
import java.util.Map;
import org.qfleet.drift.Alert;

/**
 * Everything the status page shows, taken at one moment.
 *
 * @param sweepsFitted  sweeps fitted since start
 * @param sweepsRejected sweeps rejected since start
 * @param rejectsByCode rejects by reason code
 * @param verdicts      fitted sweeps by verdict ({@code pass}, {@code fail}, {@code unknown-product})
 * @param lots          open lots: alerted first, then newest first
 * @param closedLots    recently closed lots: those that had a lot alert first, then the latest closed first
 * @param stations      stations: alerted first, then by product and station
 * @param recentAlerts  the latest alert messages, newest first
 * @param raisedAlerts  alerts raised now, newest first
 * @param lastFit       the latest fitted sweep, or null before the first
 */
public record FleetSnapshot(long sweepsFitted, long sweepsRejected, Map<String, Long> rejectsByCode,
        Map<String, Long> verdicts, List<LotView> lots, List<LotView> closedLots, List<StationView> stations, List<Alert> recentAlerts,
        List<Alert> raisedAlerts, LastFit lastFit) {

    public FleetSnapshot {
        rejectsByCode = Map.copyOf(rejectsByCode);
        verdicts = Map.copyOf(verdicts);
        lots = List.copyOf(lots);
        closedLots = List.copyOf(closedLots);
        stations = List.copyOf(stations);
        recentAlerts = List.copyOf(recentAlerts);
        raisedAlerts = List.copyOf(raisedAlerts);
    }
}
