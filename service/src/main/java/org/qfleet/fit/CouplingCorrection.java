package org.qfleet.fit;

import java.util.List;

/**
 * Turns loaded Q and circle sizes into unloaded Q and couplings, per route. The shapes are the
 * main trace first, then S11 and S22 for {@link CouplingRoute#TRANSMISSION_PORTS}.
 */
final class CouplingCorrection {

    private CouplingCorrection() {
    }

    static Coupling apply(CouplingRoute route, List<ResonanceShape> shapes) {
        return apply(route, shapes, null);
    }

    /**
     * @param loadedQWeights weights of each shape's QL in the loaded Q used (one resonance loaded by
     *                       all ports has one QL, seen in every trace); null to use the main trace's
     */
    static Coupling apply(CouplingRoute route, List<ResonanceShape> shapes, double[] loadedQWeights) {
        ResonanceShape main = shapes.get(0);
        double ql = loadedQ(shapes, loadedQWeights);
        switch (route) {
            case TRANSMISSION_SYMMETRIC: {
                // |S21(f0)| = 2 beta / (1 + 2 beta), Qu = QL / (1 - |S21(f0)|): coupled-resonator two-port,
                // the insertion-loss form used by cavity methods (IEC 62562).
                double s = main.amplitude();
                double qu = ql / (1 - s);
                double qe = ql / s;
                double beta = qu / (2 * qe);
                return new Coupling(qu, qe, beta, beta, 20 * Math.log10(s));
            }
            case TRANSMISSION_PORTS: {
                // D11 = 2 b1 / (1 + b1 + b2), D22 = 2 b2 / (1 + b1 + b2), so Qu = 2 QL / (2 - D11 - D22).
                double d11 = shapes.get(1).relativeDiameter();
                double d22 = shapes.get(2).relativeDiameter();
                double qu = 2 * ql / (2 - d11 - d22);
                double ratio = qu / ql;
                double qe = 1 / (1 / ql - 1 / qu);
                return new Coupling(qu, qe, d11 * ratio / 2, d22 * ratio / 2, 20 * Math.log10(main.amplitude()));
            }
            case NOTCH: {
                // Diameter correction for asymmetric notches (Khalil et al., J. Appl. Phys. 111, 054510, 2012):
                // 1/Qu = 1/QL - Re(1/Qc), with QL/Qc = d exp(j phi); symmetric case Qu = QL / S21min.
                double dc = main.relativeDiameter() * main.cosRotation();
                double qu = ql / (1 - dc);
                double qe = ql / dc;
                return new Coupling(qu, qe, qu / qe, Double.NaN, 20 * Math.log10(main.relativeLevelAtResonance()));
            }
            case REFLECTION: {
                // Circle diameter D = 2 beta / (1 + beta): beta = D / (2 - D), Qu = QL (1 + beta).
                double d = main.relativeDiameter();
                double beta = d / (2 - d);
                double qu = ql * (1 + beta);
                return new Coupling(qu, qu / beta, beta, Double.NaN, 20 * Math.log10(main.relativeLevelAtResonance()));
            }
            default:
                throw new IllegalArgumentException(route.toString());
        }
    }

    static double loadedQ(List<ResonanceShape> shapes, double[] weights) {
        if (weights == null) {
            return shapes.get(0).qLoaded();
        }
        double sum = 0;
        double total = 0;
        for (int i = 0; i < weights.length; i++) {
            sum += weights[i] * shapes.get(i).qLoaded();
            total += weights[i];
        }
        return sum / total;
    }

    /** |S21(f0)| that the couplings of the ports route predict: 2 sqrt(b1 b2) / (1 + b1 + b2). */
    static double predictedTransmission(Coupling c) {
        return 2 * Math.sqrt(c.coupling1() * c.coupling2()) / (1 + c.coupling1() + c.coupling2());
    }
}
