package org.qfleet.verdict;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.qfleet.fit.CouplingRoute;
import org.qfleet.fit.Method;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sim.DemoPlant;
import org.qfleet.sim.DemoProduct;
import org.qfleet.sweep.Topology;

class ProductCatalogueTest {

    private static final ProductLimits CAVITY = new ProductLimits("cav", 5700.0, 10.385e9, 10.415e9, 20.0, 30.0);
    private final ProductCatalogue catalogue = new ProductCatalogue(List.of(CAVITY));

    @Test
    void resultInsideEveryLimitPasses() {
        assertThat(catalogue.judge("cav", Topology.TRANSMISSION, result(6000, 10.4e9, -25))).isEqualTo(Verdict.PASS);
    }

    @Test
    void everyLimitNotMetIsAReasonInAFixedOrder() {
        Verdict v = catalogue.judge("cav", Topology.TRANSMISSION, result(5600, 10.42e9, -18));

        assertThat(v.status()).isEqualTo(VerdictStatus.FAIL);
        assertThat(v.reasons()).containsExactly(VerdictReason.Q_UNLOADED_BELOW_LIMIT, VerdictReason.F0_ABOVE_WINDOW,
                VerdictReason.INSERTION_LOSS_BELOW_RANGE);
    }

    @Test
    void lowFrequencyAndWeakCouplingFail() {
        assertThat(catalogue.judge("cav", Topology.TRANSMISSION, result(6000, 10.38e9, -31)).reasons())
                .containsExactly(VerdictReason.F0_BELOW_WINDOW, VerdictReason.INSERTION_LOSS_ABOVE_RANGE);
    }

    @Test
    void limitsAreInclusive() {
        assertThat(catalogue.judge("cav", Topology.TRANSMISSION, result(5700, 10.385e9, -30))).isEqualTo(Verdict.PASS);
    }

    @Test
    void undeterminedQuantitiesThatAreLimitedFail() {
        Verdict v = catalogue.judge("cav", Topology.TRANSMISSION, result(Double.NaN, Double.NaN, Double.NaN));

        assertThat(v.reasons()).containsExactly(VerdictReason.Q_UNLOADED_UNDETERMINED, VerdictReason.F0_UNDETERMINED,
                VerdictReason.INSERTION_LOSS_UNDETERMINED);
    }

    @Test
    void insertionLossIsCheckedOnTransmissionOnly() {
        assertThat(catalogue.judge("cav", Topology.REFLECTION, result(6000, 10.4e9, -3))).isEqualTo(Verdict.PASS);
    }

    @Test
    void missingLimitsAreNotChecked() {
        ProductCatalogue quOnly = new ProductCatalogue(List.of(new ProductLimits("cav", 5700.0, null, null, null, null)));

        assertThat(quOnly.judge("cav", Topology.TRANSMISSION, result(5800, 1e6, -1))).isEqualTo(Verdict.PASS);
    }

    @Test
    void unknownProductsAreMarkedNotJudged() {
        assertThat(catalogue.judge("other", Topology.TRANSMISSION, result(10, 1e9, -25))).isEqualTo(Verdict.UNKNOWN_PRODUCT);
        assertThat(catalogue.judge(null, Topology.TRANSMISSION, result(10, 1e9, -25))).isEqualTo(Verdict.UNKNOWN_PRODUCT);
    }

    @Test
    void inconsistentLimitsAndDuplicatesAreRefused() {
        assertThatThrownBy(() -> new ProductLimits("x", null, 2e9, 1e9, null, null)).hasMessageContaining("f0MinHz");
        assertThatThrownBy(() -> new ProductLimits("x", Double.NaN, null, null, null, null)).hasMessageContaining("finite");
        assertThatThrownBy(() -> new ProductCatalogue(List.of(CAVITY, CAVITY))).hasMessageContaining("twice");
    }

    @Test
    void builtInCatalogueCoversTheDemoPlantAndPassesItsNominalUnits() {
        ProductCatalogue demo = ProductCatalogue.demoPlant();
        for (DemoProduct p : DemoPlant.products()) {
            ProductLimits l = demo.limits(p.id()).orElseThrow();
            // The nominal unit and a unit three sigma out on every spread stay inside the limits.
            assertThat(demo.judge(p.id(), Topology.TRANSMISSION, result(p.qUnloaded(), p.f0Hz(), -p.insertionLossDb())))
                    .isEqualTo(Verdict.PASS);
            double quLow = p.qUnloaded() * (1 - 3 * p.qUnloadedSigmaFraction());
            double f0High = p.f0Hz() + 3 * p.f0SigmaHz();
            double lossHigh = p.insertionLossDb() + 3 * p.insertionLossSigmaDb();
            assertThat(demo.judge(p.id(), Topology.TRANSMISSION, result(quLow, f0High, -lossHigh))).isEqualTo(Verdict.PASS);
            // A lot that lost 8 % of its Qu fails.
            assertThat(l.qUnloadedMin()).isGreaterThan(0.92 * p.qUnloaded());
        }
        assertThat(demo.all()).hasSize(DemoPlant.products().size());
    }

    private static ResonanceResult result(double qu, double f0, double resonanceDb) {
        return new ResonanceResult(f0, 1e3, qu / 1.1, 10, qu, 20, 10 * qu, 0.05, 0.05, resonanceDb,
                Method.COMPLEX_CIRCLE, CouplingRoute.TRANSMISSION_SYMMETRIC, 40, 1, List.of(), null);
    }
}
