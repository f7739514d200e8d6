package org.qfleet.app.status;

import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.qfleet.drift.Alert;
import org.qfleet.drift.DriftEngine;
import org.qfleet.drift.DriftSettings;
import org.qfleet.drift.Measurement;
import org.qfleet.fit.FitException;
import org.qfleet.fit.QualityFlag;
import org.qfleet.fit.ResonanceAnalyzer;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.stream.ServiceObserver;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.Topology;
import org.qfleet.verdict.ProductCatalogue;
import org.qfleet.verdict.ProductLimits;
import org.qfleet.verdict.Verdict;

/**
 * The service's work without Kafka, for feeding an observer in tests: fits sweeps, judges them,
 * runs both drift monitors in memory and tells the observer what happened in the order the stream
 * processors do (alerts of the lot stage, lot updates, lot closes, then the station update and its alert).
 */
final class PlantFeed {

    private final ServiceObserver observer;
    private final ResonanceAnalyzer analyzer = new ResonanceAnalyzer();
    private final ProductCatalogue catalogue = ProductCatalogue.demoPlant();
    private final DriftEngine engine;
    private final List<Alert> alerts = new ArrayList<>();

    PlantFeed(DriftSettings settings, ServiceObserver observer) {
        this.observer = observer;
        this.engine = new DriftEngine(settings);
    }

    /** The demo plant's catalogue: its Qu lower limits are the products' lot limits, as in the service. */
    static DriftSettings demoPlantSettings() {
        Map<String, Double> limits = new HashMap<>();
        for (ProductLimits l : ProductCatalogue.demoPlant().all()) {
            limits.put(l.product(), l.qUnloadedMin());
        }
        return DriftSettings.DEFAULT.withLotLimits(limits);
    }

    /** Every alert message so far. */
    List<Alert> alerts() {
        return List.copyOf(alerts);
    }

    /** Fits one sweep message and passes the result on, or reports a reject when it cannot be fitted. */
    void sweep(Sweep sweep) {
        ResonanceResult result;
        try {
            result = analyzer.analyze(sweep);
        } catch (FitException e) {
            observer.sweepRejected("fit-failed");
            return;
        }
        Verdict verdict = catalogue.judge(sweep.info().product(), sweep.topology(), result);
        observer.sweepFitted(sweep, result, verdict, 0);
        double level = sweep.topology() == Topology.TRANSMISSION ? -result.resonanceDb() : Double.NaN;
        measurement(new Measurement(sweep.info().product(), sweep.info().lot(), sweep.info().stationId(), sweep.info().unit(),
                OffsetDateTime.parse(sweep.info().measuredAt()).toInstant().toEpochMilli(), result.qUnloaded(),
                result.f0Hz(), level, result.flags().stream().map(QualityFlag::code).toList()));
    }

    void measurements(List<Measurement> units) {
        units.forEach(this::measurement);
    }

    void measurement(Measurement m) {
        DriftEngine.Update u = engine.update(m);
        u.lotAlerts().forEach(this::publish);
        u.lotsUpdated().forEach(lot -> observer.lotUpdated(lot, u.baseline()));
        u.lotsClosed().forEach(lot -> observer.lotClosed(m.product(), lot));
        observer.stationUpdated(u.station());
        u.stationAlert().ifPresent(this::publish);
    }

    private void publish(Alert a) {
        alerts.add(a);
        observer.alertPublished(a);
    }
}
