package org.qfleet.fit;

import org.qfleet.sweep.Sweep;

/**
 * The engine's front door: one validated sweep in, one result out. Chooses the estimator (complex
 * circle when phase is present, Lorentzian otherwise) and the coupling correction.
 */
public final class ResonanceAnalyzer {

    public ResonanceResult analyze(Sweep sweep) throws FitException {
        throw new FitException("not implemented yet");
    }
}
