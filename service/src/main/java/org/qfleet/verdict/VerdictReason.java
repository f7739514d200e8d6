package org.qfleet.verdict;

import java.util.Locale;

/** Why a result fails its product's limits. The codes are stable: they travel in result messages. */
public enum VerdictReason {
    /** Qu is below the lower specification limit. */
    Q_UNLOADED_BELOW_LIMIT,
    /** Qu is limited, but the fit could not determine it. */
    Q_UNLOADED_UNDETERMINED,
    /** f0 is below the product's window. */
    F0_BELOW_WINDOW,
    /** f0 is above the product's window. */
    F0_ABOVE_WINDOW,
    /** f0 is limited, but the fit could not determine it. */
    F0_UNDETERMINED,
    /** Less insertion loss than the fixture is designed for: the coupling is too strong. */
    INSERTION_LOSS_BELOW_RANGE,
    /** More insertion loss than the fixture is designed for: the coupling is too weak. */
    INSERTION_LOSS_ABOVE_RANGE,
    /** The insertion loss is limited, but the fit could not determine it. */
    INSERTION_LOSS_UNDETERMINED;

    /** As written in messages, e.g. {@code q-unloaded-below-limit}. */
    public String code() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }
}
