package org.qfleet.sweep;

import java.util.Locale;

/**
 * Why an input is not a usable sweep. The codes are stable: they travel in reject messages and
 * are counted in metrics.
 */
public enum SweepError {
    INVALID_JSON,
    MISSING_FIELD,
    WRONG_TYPE,
    UNKNOWN_TOPOLOGY,
    UNKNOWN_TRACE_FORM,
    EMPTY_ARRAY,
    LENGTH_MISMATCH,
    NOT_ASCENDING,
    NON_FINITE,
    TOO_MANY_POINTS,
    TOO_FEW_POINTS,
    TOPOLOGY_MISMATCH,
    UNSUPPORTED_PARAMETER,
    TOUCHSTONE_SYNTAX,
    UNREADABLE;

    /** The code as written in messages: lower case with dashes, e.g. {@code not-ascending}. */
    public String code() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }
}
