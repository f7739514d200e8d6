package org.qfleet.sim;

import org.qfleet.sweep.Sweep;

/** A simulated sweep and the exact values it was generated from. */
public record SimulatedSweep(Sweep sweep, Truth truth) {
}
