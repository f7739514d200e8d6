package org.qfleet.fit;

import java.util.Locale;

/** Warnings attached to a result whose numbers are usable but deserve a second look. */
public enum QualityFlag {
    /** Fewer than ten points inside the half-power band (step above a tenth of the width). */
    FEW_POINTS_IN_BAND,
    /** The sweep spans too few half-power widths to pin down the circle and its background. */
    SPAN_NARROW,
    /** The resonance lies within one half-power width of either end of the sweep. */
    RESONANCE_AT_EDGE,
    /** The residuals show another resonance inside the span. */
    MULTIPLE_RESONANCES,
    /** The resonance stands less than 20 dB above the noise. */
    LOW_SNR,
    /** The coupling is so strong that the correction to Qu amplifies every error. */
    STRONG_COUPLING,
    /** The residuals are well above the noise: the data do not follow the model. */
    POOR_FIT,
    /** The transmission and reflection circles disagree about the couplings. */
    COUPLING_MISMATCH;

    /** The flag as written in results, e.g. {@code few-points-in-band}. */
    public String code() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }
}
