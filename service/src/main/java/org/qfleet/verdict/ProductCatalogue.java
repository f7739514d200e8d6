package org.qfleet.verdict;

import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.Topology;

/**
 * The products a plant makes and their acceptance limits; judges fit results against them.
 * Immutable and thread-safe.
 */
public final class ProductCatalogue {

    private final Map<String, ProductLimits> products;
    private final Map<String, ProductBaseline> baselines;

    public ProductCatalogue(Collection<ProductLimits> limits) {
        this(limits, Map.of());
    }

    /** @param baselines configured in-control figures by product id, for the drift monitors */
    public ProductCatalogue(Collection<ProductLimits> limits, Map<String, ProductBaseline> baselines) {
        Map<String, ProductLimits> byId = new LinkedHashMap<>();
        for (ProductLimits l : limits) {
            if (byId.putIfAbsent(l.product(), l) != null) {
                throw new IllegalArgumentException("product '" + l.product() + "' is listed twice");
            }
        }
        this.products = Map.copyOf(byId);
        this.baselines = Map.copyOf(baselines);
    }

    /** Configured baselines by product id (products without one learn theirs). */
    public Map<String, ProductBaseline> baselines() {
        return baselines;
    }

    /**
     * The limits of the invented demo plant's two products (every number made up for the demo):
     * the silver-plated cavity cav-x104 near 10.4 GHz (Qu around 6000) and the ceramic coaxial
     * resonator coax-s36 near 3.6 GHz (Qu around 900), both tested at about 25 dB insertion loss.
     * The Qu limit sits 5 % below nominal, the f0 window at 5 standard deviations of the unit
     * spread either side, and the insertion loss range at 20 to 30 dB, the weak coupling that
     * keeps the Qu correction small (common practice).
     */
    public static ProductCatalogue demoPlant() {
        return new ProductCatalogue(List.of(
                new ProductLimits("cav-x104", 5700.0, 10.385e9, 10.415e9, 20.0, 30.0),
                new ProductLimits("coax-s36", 855.0, 3.590e9, 3.610e9, 20.0, 30.0)));
    }

    public Optional<ProductLimits> limits(String product) {
        return product == null ? Optional.empty() : Optional.ofNullable(products.get(product));
    }

    public Collection<ProductLimits> all() {
        return products.values();
    }

    /**
     * Judges one result: {@code unknown-product} when the catalogue does not list the product,
     * else {@code fail} with every limit that is not met, else {@code pass}. A limited quantity
     * the fit could not determine fails. The insertion loss is checked on transmission results only.
     */
    public Verdict judge(String product, Topology topology, ResonanceResult result) {
        Optional<ProductLimits> found = limits(product);
        if (found.isEmpty()) {
            return Verdict.UNKNOWN_PRODUCT;
        }
        ProductLimits l = found.get();
        List<VerdictReason> reasons = new ArrayList<>();
        if (l.qUnloadedMin() != null) {
            double qu = result.qUnloaded();
            if (!Double.isFinite(qu)) {
                reasons.add(VerdictReason.Q_UNLOADED_UNDETERMINED);
            } else if (qu < l.qUnloadedMin()) {
                reasons.add(VerdictReason.Q_UNLOADED_BELOW_LIMIT);
            }
        }
        window(result.f0Hz(), l.f0MinHz(), l.f0MaxHz(), reasons, VerdictReason.F0_UNDETERMINED,
                VerdictReason.F0_BELOW_WINDOW, VerdictReason.F0_ABOVE_WINDOW);
        if (topology == Topology.TRANSMISSION) {
            window(-result.resonanceDb(), l.insertionLossMinDb(), l.insertionLossMaxDb(), reasons,
                    VerdictReason.INSERTION_LOSS_UNDETERMINED, VerdictReason.INSERTION_LOSS_BELOW_RANGE,
                    VerdictReason.INSERTION_LOSS_ABOVE_RANGE);
        }
        return reasons.isEmpty() ? Verdict.PASS : Verdict.fail(reasons);
    }

    private static void window(double value, Double min, Double max, List<VerdictReason> reasons,
            VerdictReason undetermined, VerdictReason below, VerdictReason above) {
        if (min == null && max == null) {
            return;
        }
        if (!Double.isFinite(value)) {
            reasons.add(undetermined);
        } else if (min != null && value < min) {
            reasons.add(below);
        } else if (max != null && value > max) {
            reasons.add(above);
        }
    }
}
