package org.qfleet.app.status;

import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.Sweep;
import org.qfleet.verdict.Verdict;

/** The most recently fitted sweep, its result and its verdict. */
public record LastFit(Sweep sweep, ResonanceResult result, Verdict verdict) {
}
