package org.qfleet.fit;

import java.util.Locale;

/** The estimator that produced f0 and QL. */
public enum Method {
    /** Half-power points of |S| read off the data with linear interpolation. */
    HALF_POWER,
    /** Least squares of a Lorentzian with background to the magnitude (no phase needed). */
    LORENTZIAN,
    /** Weighted least squares of the resonance circle with delay and complex background. */
    COMPLEX_CIRCLE;

    public String code() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }
}
