package org.qfleet.stream;

import java.util.List;
import org.qfleet.codec.ErrorCodes;
import org.qfleet.sweep.SweepError;

/**
 * The {@code code} values of reject messages: the sweep readers' reason codes ({@link SweepError})
 * plus those of the service. Stable: dashboards and replay tools match on them.
 */
public final class RejectCodes {

    /** A valid sweep in which no resonance could be fitted. */
    public static final String FIT_FAILED = ErrorCodes.FIT_FAILED;
    /** A failure of the service itself; the log has the details. */
    public static final String INTERNAL_ERROR = ErrorCodes.INTERNAL_ERROR;
    /** The message, or the result it gave, is larger than the configured bound. */
    public static final String OVERSIZED = "oversized";

    private RejectCodes() {
    }

    /** Every code a reject can carry. */
    public static List<String> all() {
        return ErrorCodes.readerCodesAnd(FIT_FAILED, INTERNAL_ERROR, OVERSIZED);
    }
}
