package org.qfleet.app;

import org.qfleet.fit.FitException;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.Sweep;

/** Fits one sweep whose topology is settled. */
@FunctionalInterface
interface SweepFitter {

    ResonanceResult fit(Sweep sweep) throws FitException;
}
