package org.qfleet.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.time.Clock;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Predicate;
import java.util.function.ToDoubleFunction;
import org.junit.jupiter.api.Test;
import org.qfleet.sweep.SParameter;
import org.qfleet.sweep.SweepInfo;
import org.qfleet.sweep.Topology;

class DemoPlantTest {

    private static final Clock CLOCK = Clock.fixed(Instant.parse("2025-03-04T05:06:07.123Z"), ZoneOffset.UTC);

    @Test
    void sweepsCarryCompleteUniqueIdentifiers() {
        DemoPlant plant = new DemoPlant(1, CLOCK);
        Set<String> sweepIds = new HashSet<>();
        Set<String> units = new HashSet<>();
        Set<String> stations = new HashSet<>();
        for (int i = 0; i < 800; i++) {
            SimulatedSweep simulated = plant.next();
            SweepInfo info = simulated.sweep().info();
            assertThat(sweepIds.add(info.sweepId())).as("unique sweepId").isTrue();
            assertThat(units.add(info.unit())).as("unique unit").isTrue();
            stations.add(info.stationId());
            assertThat(info.unit()).startsWith(info.lot());
            assertThat(info.product()).isEqualTo(plant.productOf(info.stationId()).id());
            assertThat(OffsetDateTime.parse(info.measuredAt()).toInstant()).isEqualTo(CLOCK.instant());
            assertThat(info.fixtureId()).isNotBlank();
            assertThat(simulated.sweep().topology()).isEqualTo(Topology.TRANSMISSION);
            assertThat(simulated.sweep().traces()).containsKeys(SParameter.S21, SParameter.S11, SParameter.S22);
        }
        assertThat(stations).containsExactlyInAnyOrder("st-01", "st-02", "st-03", "st-04", "st-05", "st-06", "st-07", "st-08");
        assertThat(plant.stationIds()).hasSize(8);
    }

    @Test
    void sameSeedAndClockGiveTheSamePlant() {
        DemoPlant a = new DemoPlant(9, CLOCK);
        DemoPlant b = new DemoPlant(9, CLOCK);
        for (int i = 0; i < 20; i++) {
            SimulatedSweep x = a.next();
            SimulatedSweep y = b.next();
            assertThat(y.sweep().info()).isEqualTo(x.sweep().info());
            assertThat(y.truth()).isEqualTo(x.truth());
            assertThat(y.sweep().traces().get(SParameter.S21).re()).containsExactly(x.sweep().traces().get(SParameter.S21).re());
        }
    }

    @Test
    void lotsHoldAFewHundredUnitsSpreadOverTheProductsStations() {
        DemoPlant plant = new DemoPlant(2, CLOCK);
        Map<String, Integer> unitsPerLot = new HashMap<>();
        Map<String, Set<String>> stationsPerLot = new HashMap<>();
        List<String> lotOrder = new ArrayList<>();
        for (int i = 0; i < 4000; i++) {
            SweepInfo info = plant.next().sweep().info();
            if (unitsPerLot.merge(info.lot(), 1, Integer::sum) == 1) {
                lotOrder.add(info.lot());
            }
            stationsPerLot.computeIfAbsent(info.lot(), k -> new HashSet<>()).add(info.stationId());
        }
        // Lots still open at the end are partial; every earlier lot per product is complete.
        List<String> complete = lotOrder.subList(0, lotOrder.size() - 2);
        assertThat(complete).isNotEmpty();
        for (String lot : complete) {
            assertThat(unitsPerLot.get(lot)).isBetween(200, 400);
            assertThat(stationsPerLot.get(lot)).hasSize(4);
        }
    }

    @Test
    void unitsSpreadAsTheProductSays() {
        List<SimulatedSweep> sweeps = run(new DemoPlant(3, CLOCK), 3200);
        for (DemoProduct product : DemoPlant.products()) {
            Predicate<SimulatedSweep> ofProduct = s -> s.sweep().info().product().equals(product.id());
            double qu = mean(sweeps, ofProduct, s -> s.truth().qUnloaded());
            double quSpread = sigma(sweeps, ofProduct, s -> s.truth().qUnloaded()) / qu;
            double lossDb = mean(sweeps, ofProduct, s -> -20 * Math.log10(s.truth().circleDiameter()));
            double f0Spread = sigma(sweeps, ofProduct, s -> s.truth().f0Hz());

            // 1600 units per product: standard errors are about 0.04 % (mean Qu) and 2.5 % (sigmas).
            assertThat(qu / product.qUnloaded()).isCloseTo(1, within(0.002));
            assertThat(quSpread / product.qUnloadedSigmaFraction()).isCloseTo(1, within(0.12));
            assertThat(lossDb).isCloseTo(product.insertionLossDb(), within(0.15));
            assertThat(f0Spread / product.f0SigmaHz()).isCloseTo(1, within(0.12));
            double snrDb = mean(sweeps, ofProduct, s -> 20 * Math.log10(s.truth().circleDiameter() / s.truth().noiseSigma()));
            assertThat(snrDb).isBetween(35.0, 45.0);
        }
    }

    @Test
    void degradedLotHasLowerUnloadedQ() {
        DemoPlant plant = new DemoPlant(4, CLOCK);
        String product = DemoProduct.CAVITY_X104.id();
        String degraded = plant.degradeNextLot(product, 0.04);
        List<SimulatedSweep> sweeps = run(plant, 3000);
        Predicate<SimulatedSweep> cavity = s -> s.sweep().info().product().equals(product);

        double inDegraded = mean(sweeps, cavity.and(s -> s.sweep().info().lot().equals(degraded)), s -> s.truth().qUnloaded());
        double elsewhere = mean(sweeps, cavity.and(s -> !s.sweep().info().lot().equals(degraded)), s -> s.truth().qUnloaded());

        assertThat(sweeps).anyMatch(s -> s.sweep().info().lot().equals(degraded));
        assertThat(inDegraded / elsewhere).isCloseTo(0.96, within(0.004));
    }

    @Test
    void looseConnectorAddsNoiseAndMovesCouplingAndF0() {
        DemoPlant healthy = new DemoPlant(5, CLOCK);
        DemoPlant faulty = new DemoPlant(5, CLOCK);
        faulty.loosenConnector("st-02", StationFault.LOOSE_CONNECTOR);
        List<SimulatedSweep> before = run(healthy, 1600);
        List<SimulatedSweep> after = run(faulty, 1600);
        Predicate<SimulatedSweep> st02 = s -> s.sweep().info().stationId().equals("st-02");
        Predicate<SimulatedSweep> st03 = s -> s.sweep().info().stationId().equals("st-03");

        double snrDrop = mean(before, st02, DemoPlantTest::snrDb) - mean(after, st02, DemoPlantTest::snrDb);
        assertThat(snrDrop).isCloseTo(StationFault.LOOSE_CONNECTOR.snrLossDb(), within(0.01));
        double couplingRatio = mean(after, st02, s -> s.truth().coupling1()) / mean(before, st02, s -> s.truth().coupling1());
        assertThat(couplingRatio).isCloseTo(StationFault.LOOSE_CONNECTOR.couplingScale(), within(1e-9));
        double f0Shift = mean(after, st02, s -> s.truth().f0Hz()) / mean(before, st02, s -> s.truth().f0Hz()) - 1;
        assertThat(f0Shift * 1e6).isCloseTo(StationFault.LOOSE_CONNECTOR.f0ShiftPpm(), within(0.01));
        assertThat(mean(after, st03, DemoPlantTest::snrDb)).isEqualTo(mean(before, st03, DemoPlantTest::snrDb));
    }

    @Test
    void hooksRejectUnknownNames() {
        DemoPlant plant = new DemoPlant(6, CLOCK);
        assertThatThrownBy(() -> plant.loosenConnector("st-9", StationFault.LOOSE_CONNECTOR))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("unknown station 'st-9'");
        assertThatThrownBy(() -> plant.degradeNextLot("nope", 0.04))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("unknown product 'nope'");
        assertThatThrownBy(() -> plant.degradeNextLot(DemoProduct.COAX_S36.id(), 1.5))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("quLossFraction");
    }

    private static double snrDb(SimulatedSweep s) {
        return 20 * Math.log10(s.truth().circleDiameter() / s.truth().noiseSigma());
    }

    private static List<SimulatedSweep> run(DemoPlant plant, int count) {
        List<SimulatedSweep> sweeps = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            sweeps.add(plant.next());
        }
        return sweeps;
    }

    private static double mean(List<SimulatedSweep> sweeps, Predicate<SimulatedSweep> which, ToDoubleFunction<SimulatedSweep> value) {
        return sweeps.stream().filter(which).mapToDouble(value).average().orElseThrow();
    }

    private static double sigma(List<SimulatedSweep> sweeps, Predicate<SimulatedSweep> which, ToDoubleFunction<SimulatedSweep> value) {
        double mean = mean(sweeps, which, value);
        return Math.sqrt(sweeps.stream().filter(which).mapToDouble(value).map(v -> (v - mean) * (v - mean)).average().orElseThrow());
    }
}
