package org.qfleet.sim;

import org.qfleet.sweep.Topology;

/**
 * A resonator and its coupling, described by the numbers a test wants to recover. The simulator
 * turns it into an RLC network and solves it as a two-port; these values are its exact truth.
 *
 * @param topology   how the resonator is connected
 * @param f0Hz       resonant frequency of the unloaded resonator, 1 / (2 pi sqrt(LC))
 * @param qUnloaded  unloaded Q, omega0 R C for the parallel RLC
 * @param coupling1  beta1 = Qu / Qe1 (port 1; for a notch, the coupling to the through line)
 * @param coupling2  beta2 = Qu / Qe2 (port 2 of a transmission resonator; ignored otherwise)
 */
public record ResonatorCircuit(Topology topology, double f0Hz, double qUnloaded, double coupling1, double coupling2) {
}
