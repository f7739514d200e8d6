package org.qfleet.fit;

/**
 * The coupling-corrected quantities of one resonance.
 *
 * @param qUnloaded  unloaded Q
 * @param qExternal  external Q of all ports together (1/QL = 1/Qu + 1/Qe)
 * @param coupling1  beta1 = Qu / Qe1
 * @param coupling2  beta2 = Qu / Qe2, NaN for one port
 * @param resonanceDb |S| at f0 in dB (transmission absolute, notch and reflection relative to the background)
 */
record Coupling(double qUnloaded, double qExternal, double coupling1, double coupling2, double resonanceDb) {
}
