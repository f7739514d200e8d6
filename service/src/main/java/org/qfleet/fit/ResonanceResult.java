package org.qfleet.fit;

import java.util.List;

/**
 * Everything the engine says about one resonance. Uncertainties are 1-sigma standard
 * uncertainties; quantities that do not apply are {@code NaN}.
 *
 * @param f0Hz                 resonant frequency
 * @param f0UncertaintyHz      its standard uncertainty
 * @param qLoaded              loaded Q, f0 over the half-power bandwidth
 * @param qLoadedUncertainty   its standard uncertainty
 * @param qUnloaded            the resonator's own Q after the coupling correction
 * @param qUnloadedUncertainty its standard uncertainty, propagated through the correction
 * @param qExternal            external Q of all ports together: 1/QL = 1/Qu + 1/Qe
 * @param coupling1            coupling coefficient of port 1, Qu / Qe1
 * @param coupling2            coupling coefficient of port 2 (NaN for one port)
 * @param resonanceDb          |S| at f0 in dB after removing the fitted background phase and delay
 *                             (transmission: -insertion loss; notch: depth; reflection: return loss)
 * @param method               estimator for f0 and QL
 * @param route                coupling correction applied
 * @param snrDb                circle diameter over the noise, in dB
 * @param residualRatio        RMS residual over the noise estimated from the data alone (1 is ideal)
 * @param flags                quality flags, empty when all is well
 * @param model                the fitted response of the main trace
 */
public record ResonanceResult(
        double f0Hz,
        double f0UncertaintyHz,
        double qLoaded,
        double qLoadedUncertainty,
        double qUnloaded,
        double qUnloadedUncertainty,
        double qExternal,
        double coupling1,
        double coupling2,
        double resonanceDb,
        Method method,
        CouplingRoute route,
        double snrDb,
        double residualRatio,
        List<QualityFlag> flags,
        ResponseModel model) {

    public ResonanceResult {
        flags = List.copyOf(flags);
    }
}
