package org.qfleet.verdict;

import java.util.Objects;

/**
 * A product's acceptance limits. A limit that is null is not checked.
 *
 * @param product            product id, as sweep messages carry it
 * @param qUnloadedMin       lower specification limit on the unloaded Q
 * @param f0MinHz            lowest acceptable resonant frequency
 * @param f0MaxHz            highest acceptable resonant frequency
 * @param insertionLossMinDb least insertion loss the fixture is designed for; less means the
 *                           coupling is stronger than intended (transmission sweeps only)
 * @param insertionLossMaxDb most insertion loss the fixture is designed for; more means the
 *                           coupling is weaker than intended (transmission sweeps only)
 */
public record ProductLimits(
        String product,
        Double qUnloadedMin,
        Double f0MinHz,
        Double f0MaxHz,
        Double insertionLossMinDb,
        Double insertionLossMaxDb) {

    public ProductLimits {
        Objects.requireNonNull(product, "product");
        if (product.isBlank()) {
            throw new IllegalArgumentException("the product id is blank");
        }
        requireFinite("qUnloadedMin", qUnloadedMin);
        requireFinite("f0MinHz", f0MinHz);
        requireFinite("f0MaxHz", f0MaxHz);
        requireFinite("insertionLossMinDb", insertionLossMinDb);
        requireFinite("insertionLossMaxDb", insertionLossMaxDb);
        requireOrdered("f0MinHz", f0MinHz, "f0MaxHz", f0MaxHz);
        requireOrdered("insertionLossMinDb", insertionLossMinDb, "insertionLossMaxDb", insertionLossMaxDb);
    }

    private static void requireFinite(String name, Double value) {
        if (value != null && !Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be a finite number, got " + value);
        }
    }

    private static void requireOrdered(String lowName, Double low, String highName, Double high) {
        if (low != null && high != null && low > high) {
            throw new IllegalArgumentException(lowName + " (" + low + ") is above " + highName + " (" + high + ")");
        }
    }
}
