package org.qfleet.stream;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.qfleet.codec.SweepMessageWriter;
import org.qfleet.codec.TraceForm;
import org.qfleet.drift.Alert;
import org.qfleet.drift.AlertKind;
import org.qfleet.drift.AlertStatus;
import org.qfleet.drift.DriftEngine;
import org.qfleet.drift.DriftSettings;
import org.qfleet.sim.DemoPlant;
import org.qfleet.sim.StationFault;
import org.qfleet.sweep.SweepLimits;
import org.qfleet.verdict.ProductCatalogue;

/**
 * The whole path without Kafka, on simulated sweeps of the demo plant (two products, eight
 * stations, learned baselines): each sweep is fitted, its result read as the drift stage reads it,
 * and fed to the monitors. A lot from a tired bath (4 % less Qu) must be a lot alert cleared when the
 * lot closes; a loose connector on st-03 must be a station alert raised after the fault started and
 * cleared after the repair; nothing else may be alerted beyond one false episode in 16,000 units
 * (the station defaults give about one per 16,000 station units in simulation, see
 * {@link DriftSettings#DEFAULT}).
 */
class PlantDriftScenarioTest {

    private static final int UNITS = 8000;
    private static final int TIRED_AT = 1500;
    private static final int LOOSE_AT = 4000;
    private static final int REPAIRED_AT = 6000;

    @Test
    void aTiredLotAndALooseConnectorAreAlertedOnceEachAndNothingElse() {
        int others = 0;
        for (long seed = 1; seed <= 2; seed++) {
            List<Alert> alerts = new ArrayList<>();
            List<Integer> at = new ArrayList<>();
            String tiredLot = run(seed, alerts, at);
            List<Alert> lot = alerts.stream().filter(a -> a.kind() == AlertKind.LOT).toList();
            assertThat(lot).as("seed %d: lot alerts", seed).extracting(Alert::subject).containsOnly(tiredLot);
            assertThat(lot).extracting(Alert::episode).containsOnly(1);
            assertThat(lot.get(lot.size() - 1).status()).isEqualTo(AlertStatus.CLEARED);
            assertThat(lot.get(lot.size() - 1).clearedBy()).isEqualTo(Alert.LOT_CLOSED);

            List<Integer> st03 = new ArrayList<>();
            for (int i = 0; i < alerts.size(); i++) {
                if (alerts.get(i).subject().equals("st-03")) {
                    st03.add(i);
                }
            }
            assertThat(st03).as("seed %d: st-03 alerts", seed).isNotEmpty();
            Alert first = alerts.get(st03.get(0));
            assertThat(first.status()).isEqualTo(AlertStatus.RAISED);
            assertThat(first.episode()).isEqualTo(1);
            // raised after the fault began, within 400 plant units (about 100 of st-03's own)
            assertThat(at.get(st03.get(0))).isBetween(LOOSE_AT, LOOSE_AT + 400);
            Alert last = alerts.get(st03.get(st03.size() - 1));
            assertThat(last.status()).isEqualTo(AlertStatus.CLEARED);
            assertThat(at.get(st03.get(st03.size() - 1))).isGreaterThan(REPAIRED_AT);
            assertThat(st03.stream().map(alerts::get).map(Alert::episode)).containsOnly(1);
            others += (int) alerts.stream().filter(a -> a.kind() == AlertKind.STATION && !a.subject().equals("st-03")
                    && a.revision() == 1).count();
        }
        assertThat(others).as("false station episodes in %d units", 2 * UNITS).isLessThanOrEqualTo(1);
    }

    private static String run(long seed, List<Alert> alerts, List<Integer> at) {
        Instant t0 = Instant.parse("2026-11-02T06:00:00Z");
        DemoPlant plant = new DemoPlant(seed, Clock.fixed(t0, ZoneOffset.UTC));
        StreamSettings settings = new StreamSettings(Topics.DEFAULT, "scenario", 1, SweepLimits.DEFAULT, 1 << 22, 1024,
                Map.of("bootstrap.servers", "localhost:9092"));
        SweepHandler handler = new SweepHandler(settings, ProductCatalogue.demoPlant());
        SweepMessageWriter writer = new SweepMessageWriter(TraceForm.RE_IM);
        DriftEngine engine = new DriftEngine(DriftTopology.withCatalogue(DriftSettings.DEFAULT, ProductCatalogue.demoPlant()));
        String tired = null;
        for (int i = 0; i < UNITS; i++) {
            if (i == TIRED_AT) {
                tired = plant.degradeNextLot("cav-x104", 0.04);
            } else if (i == LOOSE_AT) {
                plant.loosenConnector("st-03", StationFault.LOOSE_CONNECTOR);
            } else if (i == REPAIRED_AT) {
                plant.repairStation("st-03");
            }
            SweepOutcome out = handler.handle("scenario/0@" + i, writer.write(plant.next(t0.plusSeconds(6L * i)).sweep()));
            assertThat(out).isInstanceOf(SweepOutcome.Fitted.class);
            for (Alert a : engine.accept(DriftJson.measurement(((SweepOutcome.Fitted) out).json()).orElseThrow())) {
                alerts.add(a);
                at.add(i);
            }
        }
        return tired;
    }
}
