package org.qfleet.codec;

import java.util.Locale;

/** The ways a trace may be written in a sweep message (DESIGN section 3 of the contract). */
public enum TraceForm {
    /** {@code {"re": [...], "im": [...]}} */
    RE_IM,
    /** {@code {"mag": [...], "deg": [...]}}, linear magnitude and phase in degrees */
    MAG_DEG,
    /** {@code {"db": [...], "deg": [...]}}, 20 log10 |S| and phase in degrees */
    DB_DEG,
    /** {@code {"db": [...]}}, magnitude only */
    DB;

    /** As in options: {@code re-im}, {@code mag-deg}, {@code db-deg}, {@code db}. */
    public String code() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    public boolean hasPhase() {
        return this != DB;
    }
}
