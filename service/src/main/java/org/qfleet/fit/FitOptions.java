package org.qfleet.fit;

/**
 * Choices a user may make about a fit.
 *
 * @param method the estimator to use, or null to choose automatically (complex circle when the
 *               main trace has phase, Lorentzian otherwise)
 */
public record FitOptions(Method method) {

    public static final FitOptions AUTOMATIC = new FitOptions(null);
}
