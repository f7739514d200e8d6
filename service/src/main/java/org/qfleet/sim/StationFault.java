package org.qfleet.sim;

/**
 * A test-station fault of the demo plant, applied to every sweep the station takes while it lasts.
 *
 * @param snrLossDb     how much the signal-to-noise ratio drops
 * @param couplingScale factor on both couplings (below 1: weaker coupling, more insertion loss)
 * @param f0ShiftPpm    shift of the measured resonance, parts per million
 */
public record StationFault(double snrLossDb, double couplingScale, double f0ShiftPpm) {

    /** A fixture connector working loose: noisier, a little less coupling, a slight pull on f0. */
    public static final StationFault LOOSE_CONNECTOR = new StationFault(8, 0.85, -150);

    public StationFault {
        boolean valid = snrLossDb >= 0 && Double.isFinite(snrLossDb)
                && couplingScale > 0 && Double.isFinite(couplingScale)
                && Double.isFinite(f0ShiftPpm);
        if (!valid) {
            throw new IllegalArgumentException("station fault needs a finite snrLossDb >= 0, a finite couplingScale > 0"
                    + " and a finite f0ShiftPpm, got " + snrLossDb + ", " + couplingScale + ", " + f0ShiftPpm);
        }
    }
}
