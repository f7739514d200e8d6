package org.qfleet.stream;

import java.util.Locale;
import org.qfleet.fit.FitException;
import org.qfleet.fit.ResonanceAnalyzer;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.InvalidSweepException;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepError;
import org.qfleet.sweep.SweepJsonReader;
import org.qfleet.sweep.SweepValidator;
import org.qfleet.verdict.ProductCatalogue;
import org.qfleet.verdict.Verdict;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The work on one sweep message, free of Kafka: bound its size, decode it, fit it, judge it
 * against its product's limits and write the result message. Never throws for bad input: every
 * input gives exactly one outcome. Thread-safe.
 */
public final class SweepHandler {

    private static final Logger LOG = LoggerFactory.getLogger(SweepHandler.class);

    private final SweepJsonReader reader;
    private final int maxSweepBytes;
    private final ProductCatalogue catalogue;
    private final ResonanceAnalyzer analyzer = new ResonanceAnalyzer();
    private final ResultMessageJson json = new ResultMessageJson();
    private final ServiceObserver observer;

    public SweepHandler(StreamSettings settings, ProductCatalogue catalogue) {
        this(settings, catalogue, ServiceObserver.NONE);
    }

    public SweepHandler(StreamSettings settings, ProductCatalogue catalogue, ServiceObserver observer) {
        this.observer = observer;
        this.reader = new SweepJsonReader(settings.limits());
        this.maxSweepBytes = settings.maxSweepBytes();
        this.catalogue = catalogue;
    }

    /**
     * @param source where the message came from, e.g. {@code qfleet.sweeps/3@1207}; carried in the result
     * @param value  the message's bytes, or null for a record without a value
     */
    public SweepOutcome handle(String source, byte[] value) {
        if (value == null) {
            return new SweepOutcome.Failed(SweepError.INVALID_JSON.code(), "the record has no value (null)", null);
        }
        if (value.length > maxSweepBytes) {
            return new SweepOutcome.Failed(RejectCodes.OVERSIZED, String.format(Locale.ROOT,
                    "the message has %d bytes, more than the bound of %d", value.length, maxSweepBytes), null);
        }
        Sweep sweep;
        try {
            sweep = reader.read(source, value);
            SweepValidator.validateTopology(sweep);
        } catch (InvalidSweepException e) {
            return new SweepOutcome.Failed(e.error().code(), e.getMessage(), e.sweepId().orElse(null));
        } catch (RuntimeException e) {
            return internalError(source, null, e);
        }
        String sweepId = sweep.info().sweepId();
        try {
            long start = System.nanoTime();
            ResonanceResult result = analyzer.analyze(sweep);
            long fitNanos = System.nanoTime() - start;
            Verdict verdict = catalogue.judge(sweep.info().product(), sweep.topology(), result);
            observer.sweepFitted(sweep, result, verdict, fitNanos);
            return new SweepOutcome.Fitted(sweepId, json.write(sweep, result, verdict));
        } catch (FitException e) {
            return new SweepOutcome.Failed(RejectCodes.FIT_FAILED, e.getMessage(), sweepId);
        } catch (RuntimeException e) {
            return internalError(source, sweepId, e);
        }
    }

    private static SweepOutcome internalError(String source, String sweepId, RuntimeException e) {
        LOG.warn("internal error on {} (sweep {}): {}", source, sweepId, e.toString());
        LOG.debug("stack trace of the internal error on {}", source, e);
        String detail = e.getMessage() == null ? "" : ": " + e.getMessage();
        return new SweepOutcome.Failed(RejectCodes.INTERNAL_ERROR,
                "internal error, " + e.getClass().getSimpleName() + detail, sweepId);
    }
}
