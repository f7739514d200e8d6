package org.qfleet.app.status;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.atomic.AtomicLong;
import org.qfleet.drift.Alert;
import org.qfleet.drift.Baseline;
import org.qfleet.drift.LotState;
import org.qfleet.drift.StationState;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.stream.ServiceObserver;
import org.qfleet.sweep.Sweep;
import org.qfleet.verdict.Verdict;

/**
 * The fleet as the status page shows it, fed by the service as a {@link ServiceObserver}: open
 * lots with their control charts, stations with their EWMA and CUSUM charts, recent and raised
 * alerts, counts and the last fitted sweep. Memory is bounded whatever the traffic: at most
 * {@link Limits#lots()} lots and {@link Limits#stations()} stations are kept (the ones updated
 * longest ago give way), each chart holds at most {@link Limits#pointsPerChart()} points (thinned),
 * and the alert log is capped. A closed lot leaves the view. Thread-safe; every observer call is quick.
 */
public final class FleetView implements ServiceObserver {

    /**
     * The bounds of the view.
     *
     * @param lots           open lots kept
     * @param stations       stations kept
     * @param pointsPerChart points kept per chart series
     * @param recentAlerts   alert messages kept
     * @param raisedAlerts   raised alerts kept
     * @param rejectCodes    distinct reject codes counted apart; the rest count as {@code other}
     */
    public record Limits(int lots, int stations, int pointsPerChart, int recentAlerts, int raisedAlerts, int rejectCodes) {

        public static final Limits DEFAULT = new Limits(50, 100, 500, 50, 200, 32);

        public Limits {
            if (lots < 1 || stations < 1 || pointsPerChart < ThinnedSeries.MIN_CAPACITY || recentAlerts < 1
                    || raisedAlerts < 1 || rejectCodes < 1) {
                throw new IllegalArgumentException("every bound of the status view must be at least 1 (and "
                        + ThinnedSeries.MIN_CAPACITY + " points per chart), got lots " + lots + ", stations " + stations
                        + ", points per chart " + pointsPerChart + ", recent alerts " + recentAlerts + ", raised alerts "
                        + raisedAlerts + ", reject codes " + rejectCodes);
            }
        }
    }

    static final String OTHER_CODE = "other";

    private final Limits limits;
    private final Object lock = new Object();
    private final LinkedHashMap<String, LotTrack> lots;
    private final LinkedHashMap<String, StationTrack> stations;
    private final AlertLog alerts;
    private final Map<String, Long> rejectsByCode = new TreeMap<>();
    private final Map<String, Long> verdicts = new TreeMap<>();
    private final AtomicLong fitted = new AtomicLong();
    private final AtomicLong rejected = new AtomicLong();
    private long lotsSeen;
    private volatile LastFit lastFit;

    public FleetView() {
        this(Limits.DEFAULT);
    }

    public FleetView(Limits limits) {
        this.limits = limits;
        this.lots = leastRecentlyUpdatedFirst(limits.lots());
        this.stations = leastRecentlyUpdatedFirst(limits.stations());
        this.alerts = new AlertLog(limits.recentAlerts(), limits.raisedAlerts());
    }

    /** A map in access order that drops its least recently used entry beyond {@code max}. */
    private static <V> LinkedHashMap<String, V> leastRecentlyUpdatedFirst(int max) {
        return new LinkedHashMap<>(16, 0.75f, true) {
            @Override
            protected boolean removeEldestEntry(Map.Entry<String, V> eldest) {
                return size() > max;
            }
        };
    }

    @Override
    public void sweepFitted(Sweep sweep, ResonanceResult result, Verdict verdict, long fitNanos) {
        fitted.incrementAndGet();
        lastFit = new LastFit(sweep, result, verdict);
        synchronized (lock) {
            verdicts.merge(verdict == null ? "none" : verdict.status().code(), 1L, Long::sum);
        }
    }

    @Override
    public void sweepRejected(String code) {
        rejected.incrementAndGet();
        synchronized (lock) {
            String counted = code != null && (rejectsByCode.containsKey(code) || rejectsByCode.size() < limits.rejectCodes() - 1)
                    ? code : OTHER_CODE;
            rejectsByCode.merge(counted, 1L, Long::sum);
        }
    }

    @Override
    public void lotUpdated(LotState lot, Baseline baseline) {
        synchronized (lock) {
            String key = key(lot.product(), lot.lot());
            LotTrack track = lots.get(key);
            if (track == null) {
                track = new LotTrack(lot.product(), lot.lot(), lotsSeen++, limits.pointsPerChart());
                lots.put(key, track);
            }
            track.update(lot, baseline);
        }
    }

    @Override
    public void lotClosed(String product, String lot) {
        synchronized (lock) {
            lots.remove(key(product, lot));
        }
    }

    @Override
    public void stationUpdated(StationState station) {
        synchronized (lock) {
            StationTrack track = stations.computeIfAbsent(key(station.product(), station.station()),
                    k -> new StationTrack(station.product(), station.station(), limits.pointsPerChart()));
            track.update(station);
        }
    }

    @Override
    public void alertPublished(Alert alert) {
        synchronized (lock) {
            alerts.add(alert);
        }
    }

    /** What the page shows now. */
    public FleetSnapshot snapshot() {
        List<LotView> lotViews = new ArrayList<>();
        List<StationView> stationViews = new ArrayList<>();
        Map<String, Long> rejects;
        Map<String, Long> verdictCounts;
        List<Alert> recent;
        List<Alert> raised;
        synchronized (lock) {
            List<LotTrack> tracks = new ArrayList<>(lots.values());
            tracks.sort(Comparator.comparingLong(LotTrack::opened).reversed());
            tracks.forEach(t -> lotViews.add(t.view()));
            stations.values().forEach(t -> stationViews.add(t.view()));
            rejects = Map.copyOf(rejectsByCode);
            verdictCounts = Map.copyOf(verdicts);
            recent = alerts.recent();
            raised = alerts.raised();
        }
        lotViews.sort(Comparator.comparing((LotView v) -> !v.alerted()));
        stationViews.sort(Comparator.comparing((StationView v) -> !v.alerted()).thenComparing(StationView::product)
                .thenComparing(StationView::station));
        return new FleetSnapshot(fitted.get(), rejected.get(), rejects, verdictCounts, lotViews, stationViews, recent,
                raised, lastFit);
    }

    private static String key(String product, String subject) {
        return product + '\u0000' + subject;
    }
}
