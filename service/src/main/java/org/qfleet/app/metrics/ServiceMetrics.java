package org.qfleet.app.metrics;

import io.micrometer.core.instrument.MeterRegistry;
import org.qfleet.drift.Alert;
import org.qfleet.drift.AlertKind;
import org.qfleet.drift.Baseline;
import org.qfleet.drift.LotState;
import org.qfleet.drift.StationState;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.stream.RejectCodes;
import org.qfleet.stream.ServiceObserver;
import org.qfleet.sweep.Sweep;
import org.qfleet.verdict.Verdict;

/**
 * The service's own {@code qfleet_*} meters, fed by the stream as a {@link ServiceObserver}:
 * sweeps, fit time, Qu per product, rejects, open lots, station charts and alerts. Every call is
 * cheap and thread-safe (counters, and volatile values behind gauges that the scrape reads);
 * label values come from closed sets or from bounded, capped sets of products, lots and stations.
 */
public final class ServiceMetrics implements ServiceObserver {

    /**
     * How many series sets may exist.
     *
     * @param products products with a Qu histogram
     * @param lots     open lots with gauges
     * @param stations stations with chart gauges
     */
    public record Caps(int products, int lots, int stations) {
        public static final Caps DEFAULT = new Caps(100, 200, 500);
    }

    private final SweepMeters sweeps;
    private final UnloadedQHistograms unloadedQ;
    private final LotGauges lots;
    private final StationGauges stations;
    private final AlertMeters alerts;

    public ServiceMetrics(MeterRegistry registry) {
        this(registry, Caps.DEFAULT);
    }

    public ServiceMetrics(MeterRegistry registry, Caps caps) {
        sweeps = new SweepMeters(registry, RejectCodes.all());
        unloadedQ = new UnloadedQHistograms(registry, caps.products());
        lots = new LotGauges(registry, caps.lots());
        stations = new StationGauges(registry, caps.stations());
        alerts = new AlertMeters(registry);
    }

    @Override
    public void sweepFitted(Sweep sweep, ResonanceResult result, Verdict verdict, long fitNanos) {
        sweeps.fitted(verdict.status(), result.method(), fitNanos);
        unloadedQ.record(sweep.info().product(), result.qUnloaded());
    }

    @Override
    public void sweepRejected(String code) {
        sweeps.rejected(code);
    }

    @Override
    public void lotUpdated(LotState lot, Baseline baseline) {
        lots.updated(lot, baseline);
    }

    @Override
    public void lotClosed(String product, String lot) {
        lots.closed(product, lot);
    }

    @Override
    public void stationUpdated(StationState station) {
        stations.updated(station);
    }

    @Override
    public void alertPublished(Alert alert) {
        alerts.published(alert);
    }

    /** Open lots whose gauges are exported now. */
    public int exportedLots() {
        return lots.exported();
    }

    /** Stations whose gauges are exported now. */
    public int exportedStations() {
        return stations.exported();
    }

    /** Alerts of {@code kind} raised and not cleared, as far as this process has seen. */
    public int activeAlerts(AlertKind kind) {
        return alerts.active(kind);
    }
}
