package org.qfleet.app.metrics;

import io.micrometer.core.instrument.MeterRegistry;
import java.util.concurrent.atomic.AtomicBoolean;
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
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The service's own {@code qfleet_*} meters, fed by the stream as a {@link ServiceObserver}:
 * sweeps, fit time, Qu per product, rejects, open lots, station charts and alerts. Every call is
 * cheap and thread-safe (counters, and volatile values behind gauges that the scrape reads);
 * label values come from closed sets or from bounded, capped sets of products, lots and stations.
 * A failure here never reaches the stream (it would turn a good sweep into a reject): it is logged
 * once and the observation is lost.
 */
public final class ServiceMetrics implements ServiceObserver {

    private static final Logger LOG = LoggerFactory.getLogger(ServiceMetrics.class);

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
    private final AtomicBoolean saidFailure = new AtomicBoolean();

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
        try {
            sweeps.fitted(verdict.status(), result.method(), fitNanos);
            unloadedQ.record(sweep.info().product(), result.qUnloaded());
        } catch (RuntimeException e) {
            failed(e);
        }
    }

    @Override
    public void sweepRejected(String code) {
        try {
            sweeps.rejected(code);
        } catch (RuntimeException e) {
            failed(e);
        }
    }

    @Override
    public void lotUpdated(LotState lot, Baseline baseline) {
        try {
            lots.updated(lot, baseline);
        } catch (RuntimeException e) {
            failed(e);
        }
    }

    @Override
    public void lotClosed(String product, String lot) {
        try {
            lots.closed(product, lot);
        } catch (RuntimeException e) {
            failed(e);
        }
    }

    @Override
    public void stationUpdated(StationState station) {
        try {
            stations.updated(station);
        } catch (RuntimeException e) {
            failed(e);
        }
    }

    @Override
    public void alertPublished(Alert alert) {
        try {
            alerts.published(alert);
        } catch (RuntimeException e) {
            failed(e);
        }
    }

    private void failed(RuntimeException e) {
        if (saidFailure.compareAndSet(false, true)) {
            LOG.warn("a metric could not be updated (the stream goes on; further failures are not logged): {}", e.toString());
        }
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
