package org.qfleet.app.metrics;

import io.micrometer.core.instrument.DistributionSummary;
import io.micrometer.core.instrument.MeterRegistry;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * {@code qfleet_unloaded_q{product}}: the distribution of fitted Qu per product, in buckets from
 * 100 to 1e6 (1-2-5 per decade). Products come from the messages, so their number is capped; the
 * Qu of products beyond the cap is not exported (said once in the log).
 */
final class UnloadedQHistograms {

    static final String NAME = "qfleet.unloaded.q";
    static final double[] BUCKETS = {100, 200, 500, 1e3, 2e3, 5e3, 1e4, 2e4, 5e4, 1e5, 2e5, 5e5, 1e6};
    private static final Logger LOG = LoggerFactory.getLogger(UnloadedQHistograms.class);

    private final MeterRegistry registry;
    private final CappedMap<String, DistributionSummary> byProduct;
    private volatile boolean saidFull;

    UnloadedQHistograms(MeterRegistry registry, int maxProducts) {
        this.registry = registry;
        this.byProduct = new CappedMap<>(maxProducts);
    }

    void record(String product, double qUnloaded) {
        if (!(qUnloaded > 0) || Double.isInfinite(qUnloaded)) {
            return;
        }
        DistributionSummary summary = byProduct.get(product);
        if (summary == null) {
            summary = byProduct.open(product, this::summary);
        }
        if (summary != null) {
            summary.record(qUnloaded);
        } else if (!saidFull) {
            saidFull = true;
            LOG.warn("more than {} products: the Qu histogram of product {} and of further new ones is not exported",
                    byProduct.cap(), product);
        }
    }

    private DistributionSummary summary(String product) {
        return DistributionSummary.builder(NAME)
                .description("Fitted unloaded Q of the product's sweeps")
                .tag("product", product)
                .serviceLevelObjectives(BUCKETS)
                .register(registry);
    }
}
