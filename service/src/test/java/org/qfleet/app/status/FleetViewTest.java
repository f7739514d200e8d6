package org.qfleet.app.status;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentLinkedQueue;
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
import org.qfleet.drift.Measurement;
import org.qfleet.drift.PlantValues;
import org.qfleet.drift.UnitValue;
import org.qfleet.drift.Rule;
import org.qfleet.drift.Severity;
import org.qfleet.drift.StationState;

class FleetViewTest {

    private static final Baseline BASELINE = PlantValues.baseline();
    private static final Instant CLOSING = Instant.parse("2026-03-02T09:30:00Z");
    static final FleetView.Limits SMALL = new FleetView.Limits(5, 4, 20, 6, 3, 3, 6);

    private final FleetView view = new FleetView(SMALL);

    @Test
    void manyLotsOpeningAndClosingKeepTheBoundOfClosedLotsPreferringTheOnesThatHadAnAlert() {
        for (int lot = 0; lot < 2000; lot++) {
            String id = "L" + lot;
            if (lot == 150 || lot == 700 || lot == 1300) {
                feedAlertedLot(view, id);
            } else {
                feedLot(view, id, 30);
            }
            view.lotClosed(PlantValues.PRODUCT, id);
            assertThat(view.snapshot().closedLots()).hasSizeLessThanOrEqualTo(SMALL.closedLots());
        }
        FleetSnapshot s = view.snapshot();
        assertThat(s.lots()).isEmpty();
        assertThat(s.closedLots()).as("the three alerted lots, then the latest closed others, each newest first")
                .extracting(LotView::lot).containsExactly("L1300", "L700", "L150", "L1999", "L1998", "L1997");
        assertThat(s.closedLots()).allSatisfy(l -> assertThat(l.closed()).isTrue());
        assertThat(s.closedLots().subList(0, 3)).allSatisfy(l -> assertThat(l.hadAlert()).isTrue());
        assertThat(s.closedLots().subList(3, 6)).allSatisfy(l -> assertThat(l.hadAlert()).isFalse());
        assertThat(s.closedLots().get(3).points()).hasSizeLessThanOrEqualTo(SMALL.pointsPerChart())
                .extracting(LotPoint::units).endsWith(30L);
    }

    @Test
    void whenMoreLotsThatHadAnAlertCloseThanTheBoundTheOldestOfThemGiveWay() {
        for (int lot = 0; lot < 9; lot++) {
            feedAlertedLot(view, "A" + lot);
            view.lotClosed(PlantValues.PRODUCT, "A" + lot);
        }
        feedLot(view, "L1", 5);
        view.lotClosed(PlantValues.PRODUCT, "L1");
        assertThat(view.snapshot().closedLots()).extracting(LotView::lot)
                .containsExactly("A8", "A7", "A6", "A5", "A4", "A3");
    }

    @Test
    void lotsMoveToTheRecentlyClosedListWhenTheLotMonitorClosesThem() {
        FleetView timed = new FleetView(SMALL, Clock.fixed(CLOSING, ZoneOffset.UTC));
        PlantFeed feed = new PlantFeed(PlantValues.settings(), timed);
        PlantValues plant = new PlantValues(5, 4);
        feed.measurements(plant.lot("L1", 100, 1.0));
        feed.measurements(plant.lot("L2", 100, 1.0));
        FleetSnapshot s = timed.snapshot();
        assertThat(s.lots()).as("L1 closed after the quiet period of 30 minutes").extracting(LotView::lot)
                .containsExactly("L2");
        assertThat(s.closedLots()).extracting(LotView::lot).containsExactly("L1");
        LotView closed = s.closedLots().get(0);
        assertThat(closed.closedAt()).isEqualTo(CLOSING);
        assertThat(closed.latest().units()).as("its chart, kept whole").isEqualTo(100);
        assertThat(closed.highlighted()).isFalse();
    }

    @Test
    void anAlertPublishedForALotMarksItAndAClosedLotShowsItsAlertOnlyWhileRaised() {
        feedLot(view, "L1", 10);
        feedLot(view, "L2", 10);
        view.alertPublished(lotAlert("L1", AlertStatus.RAISED, 1));
        view.alertPublished(lotAlert("L2", AlertStatus.RAISED, 1));
        view.alertPublished(lotAlert("L1", AlertStatus.CLEARED, 2));
        view.lotClosed(PlantValues.PRODUCT, "L1");
        view.lotClosed(PlantValues.PRODUCT, "L2");
        List<LotView> closed = view.snapshot().closedLots();
        assertThat(closed).extracting(LotView::lot).containsExactly("L2", "L1");
        assertThat(closed).allSatisfy(l -> assertThat(l.hadAlert()).isTrue())
                .allSatisfy(l -> assertThat(l.highlighted()).isTrue());
        assertThat(closed.get(0).alerted()).as("L2's alert is still raised").isTrue();
        assertThat(closed.get(1).alerted()).as("L1's alert cleared").isFalse();
        assertThat(closed.get(1).lastAlert().subject()).isEqualTo("L1");
    }

    @Test
    void aClosedLotThatGetsAUnitAgainIsOpenAgainAndNewest() {
        feedLot(view, "L1", 10);
        feedLot(view, "L2", 10);
        view.lotClosed(PlantValues.PRODUCT, "L1");
        view.lotClosed(PlantValues.PRODUCT, "unknown-lot");
        assertThat(view.snapshot().closedLots()).extracting(LotView::lot).containsExactly("L1");
        feedLot(view, "L1", 3);
        FleetSnapshot s = view.snapshot();
        assertThat(s.closedLots()).isEmpty();
        assertThat(s.lots()).extracting(LotView::lot).containsExactly("L1", "L2");
        assertThat(s.lots().get(0).closed()).isFalse();
        assertThat(s.lots().get(0).latest().units()).isEqualTo(3);
        view.lotClosed(PlantValues.PRODUCT, "L1");
        assertThat(view.snapshot().closedLots()).extracting(LotView::lot).containsExactly("L1");
    }

    @Test
    void openLotsBeyondTheBoundGiveWayLeastRecentlyUpdatedFirstAndAreListedNewestFirst() {
        for (int lot = 0; lot < 40; lot++) {
            feedLot(view, String.format(Locale.ROOT, "L%02d", lot), 3);
        }
        feedLot(view, "L35", 1);
        feedLot(view, "L40", 1);
        List<LotView> lots = view.snapshot().lots();
        assertThat(lots).as("L36 was updated longest ago").extracting(LotView::lot)
                .containsExactly("L40", "L39", "L38", "L37", "L35");
    }

    @Test
    void aLotChartHoldsAtMostTheBoundOfPointsFromTheFirstUnitToTheLatest() {
        List<LotPoint> points = feedLot(view, "L1", 1000).lots().get(0).points();
        assertThat(points).hasSizeLessThanOrEqualTo(SMALL.pointsPerChart()).hasSizeGreaterThan(SMALL.pointsPerChart() / 2);
        assertThat(points.get(0).units()).isEqualTo(1);
        assertThat(points.get(points.size() - 1).units()).isEqualTo(1000);
        assertThat(points).extracting(LotPoint::units).isSorted().doesNotHaveDuplicates();
        LotPoint last = points.get(points.size() - 1);
        // Shewhart X-bar limit mu0 - L sigma0 / sqrt(n) (Montgomery, recalled from memory) with the plant's width
        // L = 3.5; a configured baseline adds no uncertainty of its own mean
        assertThat(last.xbarLimit()).isCloseTo(BASELINE.quMean() - 3.5 * BASELINE.quSigma() / Math.sqrt(1000), within(1e-9));
    }

    @Test
    void aRetestOrARepeatedStateReplacesTheNewestPointInsteadOfAddingOne() {
        LotState state = LotState.open(PlantValues.PRODUCT, "L1");
        LotStatistics stats = LotStatistics.EMPTY;
        stats = stats.plus(UnitValue.of(unit("L1", "u1", 6000)), null).plus(UnitValue.of(unit("L1", "u2", 6100)), null);
        view.lotUpdated(withStats(state, stats), BASELINE);
        view.lotUpdated(withStats(state, stats.plus(UnitValue.of(unit("L1", "u2", 5900)), UnitValue.of(unit("L1", "u2", 6100)))),
                BASELINE);
        List<LotPoint> points = view.snapshot().lots().get(0).points();
        assertThat(points).hasSize(1);
        assertThat(points.get(0).mean()).isEqualTo(5950);
    }

    @Test
    void aLotWhoseBaselineIsStillLearnedHasNoLimits() {
        LotState state = withStats(LotState.open("p", "L1"), LotStatistics.EMPTY.plus(UnitValue.of(unit("L1", "u1", 6000)), null));
        view.lotUpdated(state, null);
        LotView lot = view.snapshot().lots().get(0);
        assertThat(lot.mu0()).isNaN();
        assertThat(lot.points().get(0).xbarLimit()).isNaN();
    }

    @Test
    void stationsAreBoundedAndAddAPointOnlyForANewChartedUnit() {
        for (int s = 0; s < 10; s++) {
            view.stationUpdated(station("st-" + s, 3, null));
        }
        assertThat(view.snapshot().stations()).hasSize(SMALL.stations());
        FleetView one = new FleetView(SMALL);
        one.stationUpdated(station("st-01", 1, null));
        one.stationUpdated(station("st-01", 1, null));
        one.stationUpdated(station("st-01", 0, null));
        assertThat(one.snapshot().stations().get(0).points()).hasSize(1);
        for (int n = 2; n <= 500; n++) {
            one.stationUpdated(station("st-01", n, null));
        }
        StationView st = one.snapshot().stations().get(0);
        assertThat(st.points()).hasSizeLessThanOrEqualTo(SMALL.pointsPerChart());
        assertThat(st.latest().units()).isEqualTo(500);
        assertThat(st.ewmaLimit()).isEqualTo(Ewma.start(Ewma.DEFAULT_LAMBDA, Ewma.DEFAULT_WIDTH).limit());
        assertThat(st.cusumLimit()).isEqualTo(Cusum.DEFAULT_H);
    }

    @Test
    void alertedLotsAndStationsAreListedFirst() {
        feedLot(view, "L1", 3);
        view.lotUpdated(withTracker(LotState.open(PlantValues.PRODUCT, "L0"), lotAlert("L0", AlertStatus.RAISED, 1)), BASELINE);
        feedLot(view, "L2", 3);
        view.stationUpdated(station("st-01", 2, null));
        view.stationUpdated(station("st-02", 2, stationAlert("st-02", AlertStatus.RAISED, 1)));
        FleetSnapshot s = view.snapshot();
        assertThat(s.lots()).extracting(LotView::lot).containsExactly("L0", "L2", "L1");
        assertThat(s.stations()).extracting(StationView::station).containsExactly("st-02", "st-01");
    }

    @Test
    void theAlertLogKeepsTheLatestMessagesAndTheAlertsRaisedNow() {
        for (int i = 0; i < 20; i++) {
            view.alertPublished(lotAlert("L" + i, AlertStatus.RAISED, 1));
        }
        view.alertPublished(lotAlert("L19", AlertStatus.RAISED, 2));
        view.alertPublished(lotAlert("L18", AlertStatus.CLEARED, 2));
        FleetSnapshot s = view.snapshot();
        assertThat(s.recentAlerts()).hasSize(SMALL.recentAlerts());
        assertThat(s.recentAlerts().get(0).subject()).isEqualTo("L18");
        assertThat(s.raisedAlerts()).extracting(Alert::subject).containsExactly("L19", "L17");
        assertThat(s.raisedAlerts().get(0).revision()).isEqualTo(2);
    }

    @Test
    void aMessageSeenAgainAfterItsAlertClearedDoesNotRaiseItAgain() {
        view.alertPublished(lotAlert("L1", AlertStatus.RAISED, 1));
        view.alertPublished(lotAlert("L1", AlertStatus.CLEARED, 2));
        view.alertPublished(lotAlert("L1", AlertStatus.RAISED, 1));
        assertThat(view.snapshot().raisedAlerts()).isEmpty();
        assertThat(view.snapshot().recentAlerts()).hasSize(3);
    }

    @Test
    void boundsBelowOneAreRefusedWithTheValuesGiven() {
        assertThatThrownBy(() -> new FleetView.Limits(0, 1, 10, 1, 1, 1, 1)).hasMessageContaining("got lots 0, stations 1");
        assertThatThrownBy(() -> new FleetView.Limits(1, 1, 10, 1, 1, 1, 0)).hasMessageContaining("closed lots 0");
    }

    @Test
    void streamThreadsAndPageRequestsAtOnceKeepTheViewConsistentAndBounded() throws Exception {
        FleetView shared = new FleetView(SMALL);
        List<Thread> threads = new ArrayList<>();
        ConcurrentLinkedQueue<Throwable> failures = new ConcurrentLinkedQueue<>();
        for (int t = 0; t < 3; t++) {
            int thread = t;
            threads.add(new Thread(() -> {
                for (int lot = 0; lot < 60; lot++) {
                    feedLot(shared, "T" + thread + "-L" + lot, 40);
                    shared.stationUpdated(station("st-" + thread + "-" + lot % 7, lot + 1, null));
                    shared.alertPublished(lotAlert("T" + thread + "-L" + lot, AlertStatus.RAISED, 1));
                    if (lot % 2 == 0) {
                        shared.lotClosed(PlantValues.PRODUCT, "T" + thread + "-L" + lot);
                    }
                }
            }));
        }
        threads.add(new Thread(() -> {
            for (int i = 0; i < 300; i++) {
                FleetSnapshot s = shared.snapshot();
                assertThat(s.lots()).hasSizeLessThanOrEqualTo(SMALL.lots());
                assertThat(s.closedLots()).hasSizeLessThanOrEqualTo(SMALL.closedLots());
                assertThat(s.stations()).hasSizeLessThanOrEqualTo(SMALL.stations());
                assertThat(s.recentAlerts()).hasSizeLessThanOrEqualTo(SMALL.recentAlerts());
                assertThat(s.raisedAlerts()).hasSizeLessThanOrEqualTo(SMALL.raisedAlerts());
                s.lots().forEach(l -> assertThat(l.points()).hasSizeLessThanOrEqualTo(SMALL.pointsPerChart()));
            }
        }));
        threads.forEach(t -> t.setUncaughtExceptionHandler((th, e) -> failures.add(e)));
        threads.forEach(Thread::start);
        for (Thread t : threads) {
            t.join();
        }
        assertThat(failures).isEmpty();
        List<LotView> open = shared.snapshot().lots();
        assertThat(open).hasSize(SMALL.lots());
        assertThat(open).as("closed lots (the even ones) are not open")
                .allSatisfy(l -> assertThat(Integer.parseInt(l.lot().substring(l.lot().indexOf('L') + 1)) % 2).isEqualTo(1));
        assertThat(shared.snapshot().closedLots()).hasSize(SMALL.closedLots())
                .allSatisfy(l -> assertThat(Integer.parseInt(l.lot().substring(l.lot().indexOf('L') + 1)) % 2).isZero());
    }

    @Test
    void countsSweepsAndRejectsWithABoundedNumberOfCodes() {
        view.sweepRejected("invalid-json");
        view.sweepRejected("invalid-json");
        view.sweepRejected("not-ascending");
        view.sweepRejected("fit-failed");
        view.sweepRejected("too-many-points");
        FleetSnapshot s = view.snapshot();
        assertThat(s.sweepsRejected()).isEqualTo(5);
        assertThat(s.rejectsByCode()).containsExactlyInAnyOrderEntriesOf(
                Map.of("invalid-json", 2L, "not-ascending", 1L, FleetView.OTHER_CODE, 2L));
        assertThat(s.sweepsFitted()).isZero();
        assertThat(s.lastFit()).isNull();
    }

    /** Feeds {@code units} values of one lot, one lot update per unit. */
    static FleetSnapshot feedLot(FleetView view, String lot, int units) {
        LotStatistics stats = LotStatistics.EMPTY;
        LotState state = LotState.open(PlantValues.PRODUCT, lot);
        for (int i = 0; i < units; i++) {
            stats = stats.plus(UnitValue.of(unit(lot, lot + "-" + i, 6000 + (i % 7) * 10)), null);
            view.lotUpdated(withStats(state, stats), BASELINE);
        }
        return view.snapshot();
    }

    /** Feeds a lot whose state carries a raised lot alert, as the lot monitor reports it. */
    static void feedAlertedLot(FleetView view, String lot) {
        view.lotUpdated(withTracker(LotState.open(PlantValues.PRODUCT, lot), lotAlert(lot, AlertStatus.RAISED, 1)), BASELINE);
    }

    private static Measurement unit(String lot, String unit, double qu) {
        return new Measurement(PlantValues.PRODUCT, lot, "st-01", unit, 0, qu, PlantValues.F0, PlantValues.LEVEL, List.of());
    }

    private static LotState withStats(LotState s, LotStatistics stats) {
        return new LotState(s.product(), s.lot(), stats, 0, 0, 0, s.alerts());
    }

    private static LotState withTracker(LotState s, Alert open) {
        return new LotState(s.product(), s.lot(), LotStatistics.EMPTY.plus(UnitValue.of(unit(s.lot(), "u", 5000)), null), 0, 0, 0,
                new AlertTracker(AlertKind.LOT, s.product(), s.lot(), 1, open));
    }

    private static StationState station(String id, int units, Alert open) {
        Ewma ewma = Ewma.start(Ewma.DEFAULT_LAMBDA, Ewma.DEFAULT_WIDTH);
        Cusum cusum = Cusum.start(Cusum.DEFAULT_K, Cusum.DEFAULT_H);
        for (int i = 0; i < units; i++) {
            ewma = ewma.plus(0.5);
            cusum = cusum.plus(1.0);
        }
        return new StationState(PlantValues.PRODUCT, id, ewma, cusum, cusum, 0, ExcludedShare.NONE, 0, List.of(),
                new AlertTracker(AlertKind.STATION, PlantValues.PRODUCT, id, open == null ? 0 : 1, open));
    }

    static Alert lotAlert(String lot, AlertStatus status, int revision) {
        return new Alert(Alert.key(AlertKind.LOT, PlantValues.PRODUCT, lot, 1), AlertKind.LOT, PlantValues.PRODUCT, lot, 1,
                status, revision, Severity.WARNING, List.of(Rule.LOT_MEAN_BELOW_XBAR_LIMIT),
                status == AlertStatus.CLEARED ? Alert.RECOVERED : null, 1_700_000_000_000L, Map.of("n", 20.0), List.of(), BASELINE);
    }

    static Alert stationAlert(String station, AlertStatus status, int revision) {
        return new Alert(Alert.key(AlertKind.STATION, PlantValues.PRODUCT, station, 1), AlertKind.STATION, PlantValues.PRODUCT,
                station, 1, status, revision, Severity.CRITICAL, List.of(Rule.F0_CUSUM, Rule.COUPLING_CUSUM),
                status == AlertStatus.CLEARED ? Alert.RECOVERED : null, 1_700_000_000_000L, Map.of("n", 20.0), List.of(), BASELINE);
    }
}
