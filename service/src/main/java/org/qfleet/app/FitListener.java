package org.qfleet.app;

import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.Sweep;

/**
 * Hears what {@link FitRunner} prints, line by line, for callers that want more than the JSON lines
 * (the demo's closing summary). Called on the runner's thread, after the line is out.
 */
interface FitListener {

    /** Hears nothing. */
    FitListener NONE = new FitListener() {
    };

    /** A sweep was fitted and its result line printed. */
    default void fitted(Sweep sweep, ResonanceResult result) {
    }

    /** An input gave an error line with this code. */
    default void failed(String source, String code) {
    }
}
