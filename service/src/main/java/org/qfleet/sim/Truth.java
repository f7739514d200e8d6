package org.qfleet.sim;

/**
 * The exact answers for one simulated sweep, to score an estimator against.
 *
 * @param f0Hz           resonant frequency of the loaded response: 1 / (2 pi sqrt(LC)), except for an
 *                       asymmetric notch, where the feed-line reactance detunes it (see the notch network)
 * @param qUnloaded      the resonator's own Q
 * @param qLoaded        1 / QL = 1 / Qu + 1 / Qe
 * @param qExternal      Q of all ports together, 1 / Qe = sum over ports of 1 / Qe_k
 * @param coupling1      beta1 = Qu / Qe1
 * @param coupling2      beta2 = Qu / Qe2 (0 for a notch or a reflection)
 * @param circleDiameter diameter of the resonance circle of the main trace, linear: |S21(f0)| for
 *                       transmission, QL / Qe (= 1 - S21min of a symmetric dip) for a notch,
 *                       2 beta / (1 + beta) for a reflection
 * @param noiseSigma     standard deviation of each of the real and imaginary parts of the added noise
 */
public record Truth(
        double f0Hz,
        double qUnloaded,
        double qLoaded,
        double qExternal,
        double coupling1,
        double coupling2,
        double circleDiameter,
        double noiseSigma) {
}
