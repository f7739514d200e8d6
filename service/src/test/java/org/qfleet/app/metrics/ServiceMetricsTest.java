package org.qfleet.app.metrics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatCode;
import static org.assertj.core.api.Assertions.within;

import io.micrometer.core.instrument.Counter;
import io.micrometer.core.instrument.DistributionSummary;
import io.micrometer.core.instrument.Gauge;
import io.micrometer.core.instrument.Meter;
import io.micrometer.core.instrument.Timer;
import io.micrometer.core.instrument.simple.SimpleMeterRegistry;
import io.micrometer.prometheusmetrics.PrometheusConfig;
import io.micrometer.prometheusmetrics.PrometheusMeterRegistry;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.qfleet.drift.Alert;
import org.qfleet.drift.AlertKind;
import org.qfleet.drift.AlertStatus;
import org.qfleet.drift.AlertTracker;
import org.qfleet.drift.Baseline;
import org.qfleet.drift.Cusum;
import org.qfleet.drift.Ewma;
import org.qfleet.drift.ExcludedShare;
import org.qfleet.drift.LotState;
import org.qfleet.drift.LotStatistics;
import org.qfleet.drift.Rule;
import org.qfleet.drift.Severity;
import org.qfleet.drift.StationState;
import org.qfleet.drift.Welford;
import org.qfleet.fit.FitOptions;
import org.qfleet.fit.Method;
import org.qfleet.fit.ResonanceAnalyzer;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sim.Impairments;
import org.qfleet.sim.ResonatorCircuit;
import org.qfleet.sim.SweepPlan;
import org.qfleet.sim.SweepSimulator;
import org.qfleet.stream.RejectCodes;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepInfo;
import org.qfleet.verdict.Verdict;
import org.qfleet.verdict.VerdictReason;

/** What the stream reports to {@link ServiceMetrics}, and the meters it shows. */
class ServiceMetricsTest {

    private static final Baseline BASELINE = Baseline.configured("cav-x104", 6000, 100, 5900);

    private final SimpleMeterRegistry registry = new SimpleMeterRegistry();
    private final ServiceMetrics metrics = new ServiceMetrics(registry, new ServiceMetrics.Caps(3, 2, 2));

    @Test
    void methodLabelsAreTheContractsValues() {
        assertThat(SweepMeters.methodLabel(Method.COMPLEX_CIRCLE)).isEqualTo("complex");
        assertThat(SweepMeters.methodLabel(Method.LORENTZIAN)).isEqualTo("lorentzian");
        assertThat(SweepMeters.methodLabel(Method.HALF_POWER)).isEqualTo("half-power");
    }

    @Test
    void everyOutcomeAndMethodSeriesExistsFromTheStartAtZero() {
        List<String> outcomes = List.of("pass", "fail", "unknown-product");
        for (String outcome : outcomes) {
            for (String method : List.of("complex", "lorentzian", "half-power")) {
                assertThat(processed(outcome, method)).as("%s/%s", outcome, method).isZero();
            }
        }
        assertThat(processed("rejected", "none")).isZero();
        for (String code : RejectCodes.all()) {
            assertThat(registry.get("qfleet.rejects").tag("reason", code).counter().count()).isZero();
        }
    }

    @Test
    void aFittedSweepCountsByVerdictAndMethodWithItsFitTimeAndQu() throws Exception {
        Sweep sweep = simulated("cav-x104");
        ResonanceResult lorentzian = new ResonanceAnalyzer().analyze(sweep, new FitOptions(Method.LORENTZIAN));
        ResonanceResult complex = new ResonanceAnalyzer().analyze(sweep, new FitOptions(Method.COMPLEX_CIRCLE));

        metrics.sweepFitted(sweep, lorentzian, Verdict.fail(List.of(VerdictReason.Q_UNLOADED_BELOW_LIMIT)), 250_000);
        metrics.sweepFitted(sweep, complex, Verdict.PASS, 40_000);
        metrics.sweepFitted(sweep, complex, Verdict.UNKNOWN_PRODUCT, 30_000);

        assertThat(processed("fail", "lorentzian")).isEqualTo(1);
        assertThat(processed("pass", "complex")).isEqualTo(1);
        assertThat(processed("unknown-product", "complex")).isEqualTo(1);
        assertThat(processed("pass", "lorentzian")).isZero();
        Timer fit = registry.get("qfleet.fit.duration").timer();
        assertThat(fit.count()).isEqualTo(3);
        assertThat(fit.totalTime(TimeUnit.MICROSECONDS)).isCloseTo(320, within(1e-9));
        DistributionSummary qu = registry.get("qfleet.unloaded.q").tag("product", "cav-x104").summary();
        assertThat(qu.count()).isEqualTo(3);
        assertThat(qu.totalAmount()).isCloseTo(lorentzian.qUnloaded() + 2 * complex.qUnloaded(), within(1e-6));
    }

    @Test
    void productsBeyondTheCapGetNoQuHistogram() throws Exception {
        Sweep first = simulated("p1");
        ResonanceResult result = new ResonanceAnalyzer().analyze(first);
        for (String product : List.of("p1", "p2", "p3", "p4")) {
            metrics.sweepFitted(renamed(first, product), result, Verdict.UNKNOWN_PRODUCT, 1000);
        }
        assertThat(registry.find("qfleet.unloaded.q").summaries()).extracting(s -> s.getId().getTag("product"))
                .containsExactlyInAnyOrder("p1", "p2", "p3");
        assertThat(processed("unknown-product", SweepMeters.methodLabel(result.method()))).isEqualTo(4);
    }

    @Test
    void aRejectCountsByReasonAndAsARejectedSweep() {
        metrics.sweepRejected("invalid-json");
        metrics.sweepRejected("invalid-json");
        metrics.sweepRejected("fit-failed");

        assertThat(registry.get("qfleet.rejects").tag("reason", "invalid-json").counter().count()).isEqualTo(2);
        assertThat(registry.get("qfleet.rejects").tag("reason", "fit-failed").counter().count()).isEqualTo(1);
        assertThat(processed("rejected", "none")).isEqualTo(3);
    }

    @Test
    void anOpenLotShowsItsMeanUnitsAndTheBindingLowerLimitAndLosesThemWhenItCloses() {
        metrics.lotUpdated(lot("L1", 4, 5950), null);
        assertThat(lotGauge("qfleet.lot.mean.unloaded.q", "L1")).isEqualTo(5950);
        assertThat(lotGauge("qfleet.lot.units", "L1")).isEqualTo(4);
        assertThat(registry.find("qfleet.lot.lower.limit.unloaded.q").gauges()).as("no limit without a baseline").isEmpty();

        metrics.lotUpdated(lot("L1", 4, 5950), BASELINE);
        // X-bar limit 6000 - 3.5 * 100 / sqrt(4) = 5825 lies below the lot limit 5900: the lot limit binds.
        assertThat(lotGauge("qfleet.lot.lower.limit.unloaded.q", "L1")).isEqualTo(5900);
        metrics.lotUpdated(lot("L1", 100, 5990), BASELINE);
        // With 100 units the X-bar limit 6000 - 3.5 * 100 / 10 = 5965 is the higher one.
        assertThat(lotGauge("qfleet.lot.lower.limit.unloaded.q", "L1")).isCloseTo(5965, within(1e-9));
        assertThat(lotGauge("qfleet.lot.units", "L1")).isEqualTo(100);

        metrics.lotClosed("cav-x104", "L1");

        assertThat(lotMeters()).isEmpty();
        assertThat(metrics.exportedLots()).isZero();
    }

    @Test
    void aClosedLotLeavesNoSampleInThePrometheusScrape() {
        PrometheusMeterRegistry prometheus = new PrometheusMeterRegistry(PrometheusConfig.DEFAULT);
        ServiceMetrics observer = new ServiceMetrics(prometheus);
        observer.lotUpdated(lot("L1", 12, 5990), BASELINE);
        observer.lotUpdated(lot("L2", 3, 6010), BASELINE);
        assertThat(prometheus.scrape()).contains("qfleet_lot_units{lot=\"L1\",product=\"cav-x104\"} 12.0",
                "qfleet_lot_lower_limit_unloaded_q{lot=\"L1\",product=\"cav-x104\"}");

        observer.lotClosed("cav-x104", "L1");

        assertThat(prometheus.scrape()).doesNotContain("lot=\"L1\"").contains("qfleet_lot_units{lot=\"L2\",product=\"cav-x104\"} 3.0");
    }

    @Test
    void aFailedObservationNeverReachesTheStream() {
        assertThatCode(() -> metrics.sweepFitted(simulated("cav-x104"), null, Verdict.PASS, 1000)).doesNotThrowAnyException();
        assertThatCode(() -> metrics.lotUpdated(null, BASELINE)).doesNotThrowAnyException();
        metrics.sweepRejected("fit-failed");
        assertThat(processed("rejected", "none")).as("later observations still count").isEqualTo(1);
    }

    @Test
    void lotsBeyondTheCapAreNotExportedAndCountedOnceEach() {
        metrics.lotUpdated(lot("L1", 1, 6000), BASELINE);
        metrics.lotUpdated(lot("L2", 1, 6000), BASELINE);
        metrics.lotUpdated(lot("L3", 1, 6000), BASELINE);
        metrics.lotUpdated(lot("L3", 2, 6000), BASELINE);
        metrics.lotUpdated(lot("L4", 1, 6000), BASELINE);

        assertThat(exportedLotIds()).containsExactlyInAnyOrder("L1", "L2");
        assertThat(registry.get("qfleet.lot.series.dropped").counter().count()).isEqualTo(2);

        metrics.lotClosed("cav-x104", "L1");
        metrics.lotUpdated(lot("L5", 1, 6000), BASELINE);

        assertThat(exportedLotIds()).containsExactlyInAnyOrder("L2", "L5");
        assertThat(registry.get("qfleet.lot.series.dropped").counter().count()).isEqualTo(2);
    }

    @Test
    void aLotWithoutTrustedUnitsHasNoMeanYet() {
        metrics.lotUpdated(lot("L1", 0, 0), BASELINE);
        assertThat(lotGauge("qfleet.lot.mean.unloaded.q", "L1")).isNaN();
        assertThat(lotGauge("qfleet.lot.units", "L1")).isZero();
        assertThat(lotGauge("qfleet.lot.lower.limit.unloaded.q", "L1")).isEqualTo(5900);
    }

    @Test
    void aStationShowsItsChartsAndTheirLimits() {
        Ewma ewma = Ewma.start(0.2, 2.962).plus(1.5);
        Cusum f0 = Cusum.start(0.5, 5).plus(2).plus(1);
        Cusum level = Cusum.start(0.5, 5).plus(-3);
        metrics.stationUpdated(station("st-01", ewma, f0, level));

        assertThat(stationGauge("qfleet.station.qu.ewma", "st-01").value()).isCloseTo(0.3, within(1e-12));
        // L sqrt(lambda / (2 - lambda)) = 2.962 * sqrt(0.2 / 1.8) (Lucas & Saccucci 1990, asymptotic limit).
        assertThat(stationGauge("qfleet.station.qu.ewma.limit", "st-01").value())
                .isCloseTo(2.962 * Math.sqrt(0.2 / 1.8), within(1e-12));
        assertThat(cusum("st-01", "f0", "upper")).isCloseTo(2.0, within(1e-12));
        assertThat(cusum("st-01", "f0", "lower")).isZero();
        assertThat(cusum("st-01", "coupling", "upper")).isZero();
        assertThat(cusum("st-01", "coupling", "lower")).isCloseTo(2.5, within(1e-12));
        assertThat(stationGauge("qfleet.station.cusum.limit", "st-01").value()).isEqualTo(5);

        metrics.stationUpdated(station("st-01", ewma.plus(0), f0, level));
        assertThat(stationGauge("qfleet.station.qu.ewma", "st-01").value()).isCloseTo(0.24, within(1e-12));
    }

    @Test
    void stationsBeyondTheCapAreNotExported() {
        for (String id : List.of("st-01", "st-02", "st-03")) {
            metrics.stationUpdated(station(id, Ewma.start(0.2, 2.962), Cusum.start(0.5, 5), Cusum.start(0.5, 5)));
        }
        assertThat(registry.find("qfleet.station.qu.ewma").gauges()).extracting(g -> g.getId().getTag("station"))
                .containsExactlyInAnyOrder("st-01", "st-02");
        assertThat(metrics.exportedStations()).isEqualTo(2);
    }

    @Test
    void activeAlertsGoUpWhenRaisedAndDownWhenClearedAndEpisodesCountOnce() {
        metrics.alertPublished(alert(AlertKind.LOT, "L1", 1, AlertStatus.RAISED, 1));
        metrics.alertPublished(alert(AlertKind.STATION, "st-03", 1, AlertStatus.RAISED, 1));
        metrics.alertPublished(alert(AlertKind.LOT, "L2", 1, AlertStatus.RAISED, 1));
        assertThat(active("lot")).isEqualTo(2);
        assertThat(active("station")).isEqualTo(1);

        metrics.alertPublished(alert(AlertKind.LOT, "L1", 1, AlertStatus.RAISED, 2));
        metrics.alertPublished(alert(AlertKind.LOT, "L1", 1, AlertStatus.RAISED, 1));
        assertThat(active("lot")).as("an update, or the same message again, is the same alert").isEqualTo(2);

        metrics.alertPublished(alert(AlertKind.LOT, "L1", 1, AlertStatus.CLEARED, 3));
        assertThat(active("lot")).isEqualTo(1);
        metrics.alertPublished(alert(AlertKind.LOT, "L1", 2, AlertStatus.RAISED, 1));
        assertThat(active("lot")).isEqualTo(2);
        metrics.alertPublished(alert(AlertKind.STATION, "st-03", 1, AlertStatus.CLEARED, 2));
        assertThat(active("station")).isZero();

        assertThat(registry.get("qfleet.alerts.raised").tag("kind", "lot").counter().count())
                .as("episodes L1/1 (seen twice), L2/1, L1/2").isEqualTo(4);
        assertThat(registry.get("qfleet.alerts.raised").tag("kind", "station").counter().count()).isEqualTo(1);
        assertThat(metrics.activeAlerts(AlertKind.LOT)).isEqualTo(2);
    }

    @Test
    void theReadyGaugeFollowsTheReadiness() {
        boolean[] ready = {false};
        ReadyGauge.bind(registry, () -> ready[0]);
        assertThat(registry.get("qfleet.ready").gauge().value()).isZero();
        ready[0] = true;
        assertThat(registry.get("qfleet.ready").gauge().value()).isEqualTo(1);
    }

    private double processed(String outcome, String method) {
        Counter c = registry.get("qfleet.sweeps.processed").tag("outcome", outcome).tag("method", method).counter();
        return c.count();
    }

    private double lotGauge(String name, String lot) {
        return registry.get(name).tag("product", "cav-x104").tag("lot", lot).gauge().value();
    }

    private List<Meter> lotMeters() {
        return registry.getMeters().stream().filter(m -> m.getId().getTag("lot") != null).toList();
    }

    private List<String> exportedLotIds() {
        return registry.find("qfleet.lot.mean.unloaded.q").gauges().stream().map(g -> g.getId().getTag("lot")).toList();
    }

    private Gauge stationGauge(String name, String station) {
        return registry.get(name).tag("product", "cav-x104").tag("station", station).gauge();
    }

    private double cusum(String station, String chart, String side) {
        return registry.get("qfleet.station.cusum").tag("station", station).tag("chart", chart).tag("side", side).gauge().value();
    }

    private double active(String kind) {
        return registry.get("qfleet.alerts.active").tag("kind", kind).gauge().value();
    }

    private static LotState lot(String id, long n, double mean) {
        LotStatistics stats = new LotStatistics(n == 0 ? Welford.EMPTY : new Welford(n, mean, 0), Map.of());
        return new LotState("cav-x104", id, stats, 0, 0, 0, AlertTracker.idle(AlertKind.LOT, "cav-x104", id));
    }

    private static StationState station(String id, Ewma qu, Cusum f0, Cusum level) {
        return new StationState("cav-x104", id, qu, f0, level, 0, ExcludedShare.NONE, 0, List.of(), AlertTracker.idle(AlertKind.STATION, "cav-x104", id));
    }

    private static Alert alert(AlertKind kind, String subject, int episode, AlertStatus status, int revision) {
        Rule rule = kind == AlertKind.LOT ? Rule.LOT_MEAN_BELOW_XBAR_LIMIT : Rule.QU_EWMA;
        return new Alert(Alert.key(kind, "cav-x104", subject, episode), kind, "cav-x104", subject, episode, status, revision,
                Severity.WARNING, List.of(rule), status == AlertStatus.CLEARED ? Alert.RECOVERED : null, 0, Map.of(), List.of(),
                BASELINE);
    }

    private static Sweep simulated(String product) {
        ResonatorCircuit circuit = ResonatorCircuit.transmission(10.4e9, 6000, 0.05, 0.05);
        SweepInfo info = new SweepInfo("s-1", "st-01", product, "L1", "L1-0001", "2025-03-14T09:00:00Z", null, null);
        return new SweepSimulator(3).simulate(circuit, SweepPlan.around(circuit.f0Hz(), circuit.qLoaded(), 10, 401),
                Impairments.noise(40), info).sweep();
    }

    private static Sweep renamed(Sweep sweep, String product) {
        SweepInfo i = sweep.info();
        SweepInfo info = new SweepInfo(i.sweepId(), i.stationId(), product, i.lot(), i.unit(), i.measuredAt(), null, null);
        return new Sweep(sweep.source(), info, sweep.topology(), sweep.frequencyHz(), sweep.traces(), sweep.referenceOhms());
    }
}
