package org.qfleet.app.status;

import java.time.Clock;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.atomic.AtomicLong;
import org.qfleet.drift.Alert;
import org.qfleet.drift.AlertKind;
import org.qfleet.drift.Baseline;
import org.qfleet.drift.LotState;
import org.qfleet.drift.StationState;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.stream.ServiceObserver;
import org.qfleet.sweep.Sweep;
import org.qfleet.verdict.Verdict;

/**
 * The fleet as the status page shows it, fed by the service as a {@link ServiceObserver}: open
 * and recently closed lots with their control charts, stations with their EWMA and CUSUM charts,
 * recent and raised alerts, counts and the last fitted sweep. Memory is bounded whatever the
 * traffic: at most {@link Limits#lots()} open lots and {@link Limits#stations()} stations are kept
 * (the ones updated longest ago give way), each chart holds at most {@link Limits#pointsPerChart()}
 * points (thinned), and the alert log is capped. A closed lot moves, chart and all, to a list of at
 * most {@link Limits#closedLots()} recently closed lots: when it is full, the oldest closed lot that
 * never had a lot alert gives way, and only when every one had an alert the oldest of them, so the
 * lot that drifted stays on the page after it closes. A unit for a closed lot (after a restart)
 * opens it again. Thread-safe; every observer call is quick.
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
     * @param closedLots     recently closed lots kept
     */
    public record Limits(int lots, int stations, int pointsPerChart, int recentAlerts, int raisedAlerts, int rejectCodes,
            int closedLots) {

        public static final Limits DEFAULT = new Limits(50, 100, 500, 50, 200, 32, 6);

        public Limits {
            if (lots < 1 || stations < 1 || pointsPerChart < ThinnedSeries.MIN_CAPACITY || recentAlerts < 1
                    || raisedAlerts < 1 || rejectCodes < 1 || closedLots < 1) {
                throw new IllegalArgumentException("every bound of the status view must be at least 1 (and "
                        + ThinnedSeries.MIN_CAPACITY + " points per chart), got lots " + lots + ", stations " + stations
                        + ", points per chart " + pointsPerChart + ", recent alerts " + recentAlerts + ", raised alerts "
                        + raisedAlerts + ", reject codes " + rejectCodes + ", closed lots " + closedLots);
            }
        }
    }

    static final String OTHER_CODE = "other";

    private final Limits limits;
    private final Clock clock;
    private final Object lock = new Object();
    private final LinkedHashMap<String, LotTrack> lots;
    private final LinkedHashMap<String, LotTrack> closedLots = new LinkedHashMap<>();
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
        this(limits, Clock.systemUTC());
    }

    /** @param clock gives the time a lot is seen to close */
    public FleetView(Limits limits, Clock clock) {
        this.limits = limits;
        this.clock = java.util.Objects.requireNonNull(clock, "clock");
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
                track = closedLots.remove(key);
                if (track != null) {
                    track.reopen(lotsSeen++);
                } else {
                    track = new LotTrack(lot.product(), lot.lot(), lotsSeen++, limits.pointsPerChart());
                }
                lots.put(key, track);
            }
            track.update(lot, baseline);
        }
    }

    @Override
    public void lotClosed(String product, String lot) {
        synchronized (lock) {
            String key = key(product, lot);
            LotTrack track = lots.remove(key);
            if (track == null) {
                return;
            }
            track.close(clock.instant());
            closedLots.put(key, track);
            while (closedLots.size() > limits.closedLots()) {
                dropOneClosedLot();
            }
        }
    }

    /** The oldest closed lot that never had an alert, or the oldest of all when every one had. */
    private void dropOneClosedLot() {
        for (Iterator<LotTrack> it = closedLots.values().iterator(); it.hasNext();) {
            if (!it.next().hadAlert()) {
                it.remove();
                return;
            }
        }
        Iterator<LotTrack> oldest = closedLots.values().iterator();
        oldest.next();
        oldest.remove();
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
            if (alert.kind() == AlertKind.LOT) {
                String key = key(alert.product(), alert.subject());
                LotTrack track = lots.containsKey(key) ? lots.get(key) : closedLots.get(key);
                if (track != null) {
                    track.noteAlert(alert);
                }
            }
        }
    }

    /** What the page shows now. */
    public FleetSnapshot snapshot() {
        List<LotView> lotViews = new ArrayList<>();
        List<LotView> closedViews = new ArrayList<>();
        List<StationView> stationViews = new ArrayList<>();
        Map<String, Long> rejects;
        Map<String, Long> verdictCounts;
        List<Alert> recent;
        List<Alert> raised;
        synchronized (lock) {
            List<LotTrack> tracks = new ArrayList<>(lots.values());
            tracks.sort(Comparator.comparingLong(LotTrack::opened).reversed());
            tracks.forEach(t -> lotViews.add(t.view(null)));
            stations.values().forEach(t -> stationViews.add(t.view()));
            rejects = Map.copyOf(rejectsByCode);
            verdictCounts = Map.copyOf(verdicts);
            recent = alerts.recent();
            raised = alerts.raised();
            Map<String, Alert> raisedLots = new TreeMap<>();
            for (Alert a : raised) {
                if (a.kind() == AlertKind.LOT) {
                    raisedLots.putIfAbsent(key(a.product(), a.subject()), a);
                }
            }
            // latest closed first
            closedLots.forEach((key, t) -> closedViews.add(0, t.view(raisedLots.get(key))));
        }
        lotViews.sort(Comparator.comparing((LotView v) -> !v.alerted()));
        closedViews.sort(Comparator.comparing((LotView v) -> !v.hadAlert()));
        stationViews.sort(Comparator.comparing((StationView v) -> !v.alerted()).thenComparing(StationView::product)
                .thenComparing(StationView::station));
        return new FleetSnapshot(fitted.get(), rejected.get(), rejects, verdictCounts, lotViews, closedViews, stationViews,
                recent, raised, lastFit);
    }

    private static String key(String product, String subject) {
        return product + '\u0000' + subject;
    }
}
