package org.qfleet.verdict;

import java.util.Locale;

/** The outcome of checking one result against its product's limits. */
public enum VerdictStatus {
    /** Every configured limit is met. */
    PASS,
    /** At least one limit is not met, or a limited quantity could not be determined. */
    FAIL,
    /** The catalogue has no limits for the sweep's product: fitted, but not judged. */
    UNKNOWN_PRODUCT;

    /** As written in messages: {@code pass}, {@code fail}, {@code unknown-product}. */
    public String code() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }
}
