package org.qfleet.stream;

import org.qfleet.drift.Alert;
import org.qfleet.drift.Baseline;
import org.qfleet.drift.LotState;
import org.qfleet.drift.StationState;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.Sweep;
import org.qfleet.verdict.Verdict;

/**
 * Watches what the service does, for metrics and the status page: every method is called on a
 * stream thread right after the work it reports, so implementations must be thread-safe and quick.
 * Under exactly-once processing a transaction that is aborted (a crash, a fenced instance) is
 * processed again, so an observer may see the same sweep twice; it reports activity, the topics
 * remain the record. All methods do nothing by default.
 */
public interface ServiceObserver {

    /** Observes nothing. */
    ServiceObserver NONE = new ServiceObserver() {
    };

    /** A sweep was fitted and judged; {@code fitNanos} is the time the fit took. */
    default void sweepFitted(Sweep sweep, ResonanceResult result, Verdict verdict, long fitNanos) {
    }

    /** A sweep message gave a reject with this reason code (see {@link RejectCodes}). */
    default void sweepRejected(String code) {
    }

    /** A lot's statistics after one of its units; {@code baseline} is null while it is being learned. */
    default void lotUpdated(LotState lot, Baseline baseline) {
    }

    /** A lot was closed (quiet period over): its series end. */
    default void lotClosed(String product, String lot) {
    }

    /** A station's charts after one of its units. */
    default void stationUpdated(StationState station) {
    }

    /** An alert message (raised, updated or cleared) was published. */
    default void alertPublished(Alert alert) {
    }
}
