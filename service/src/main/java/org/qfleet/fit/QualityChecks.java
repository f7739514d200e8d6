package org.qfleet.fit;

import java.util.EnumSet;
import java.util.Set;

/** Decides the quality flags of a result from the sweep design and the fit's residuals. */
final class QualityChecks {

    /** IEC 63185 as commonly quoted: frequency step below a tenth of the half-power width. */
    static final int MIN_POINTS_IN_BAND = 10;
    /** Common practice: sweep several half-power widths so the background is seen. */
    static final double MIN_SPAN_IN_WIDTHS = 4;
    /** IEC 63185 as commonly quoted: noise floor at least 20 dB below the peak. */
    static final double MIN_SNR_DB = 20;
    /** Residuals this many times the noise mean the model does not describe the data. */
    static final double MAX_RESIDUAL_RATIO = 2;
    /** Residual floor relative to the circle, so noiseless data are judged sensibly. */
    static final double RELATIVE_RESIDUAL_FLOOR = 1e-4;

    private QualityChecks() {
    }

    static Set<QualityFlag> sweepDesign(double[] f, double f0, double qLoaded) {
        Set<QualityFlag> flags = EnumSet.noneOf(QualityFlag.class);
        double bandwidth = f0 / qLoaded;
        int inBand = 0;
        for (double v : f) {
            if (Math.abs(v - f0) <= 0.5 * bandwidth) {
                inBand++;
            }
        }
        if (inBand < MIN_POINTS_IN_BAND) {
            flags.add(QualityFlag.FEW_POINTS_IN_BAND);
        }
        double span = f[f.length - 1] - f[0];
        if (span < MIN_SPAN_IN_WIDTHS * bandwidth) {
            flags.add(QualityFlag.SPAN_NARROW);
        }
        if (f0 - f[0] < bandwidth || f[f.length - 1] - f0 < bandwidth) {
            flags.add(QualityFlag.RESONANCE_AT_EDGE);
        }
        return flags;
    }

    /** Residual-based flags for the main trace: poor fit, and a second resonance away from f0. */
    static Set<QualityFlag> residuals(double[] f, TraceFit fit) {
        Set<QualityFlag> flags = EnumSet.noneOf(QualityFlag.class);
        ResonanceShape shape = fit.shape();
        double noise = Math.max(fit.noiseSigma(), RELATIVE_RESIDUAL_FLOOR * shape.amplitude());
        if (!(noise > 0)) {
            return flags;
        }
        if (fit.residualSigma() > MAX_RESIDUAL_RATIO * noise) {
            flags.add(QualityFlag.POOR_FIT);
        }
        int n = f.length;
        double[] r2 = fit.residualPower();
        boolean phase = fit.model().hasPhase();
        // Five-point means of |r|^2 above nine times their expectation are not noise (the chance is below 1e-6).
        double expected = (phase ? 2 : 1) * noise * noise;
        double halfWidth = shape.f0Hz() / (2 * shape.qLoaded());
        for (int i = 2; i < n - 2; i++) {
            if (Math.abs(f[i] - shape.f0Hz()) < 3 * halfWidth) {
                continue;
            }
            double mean = (r2[i - 2] + r2[i - 1] + r2[i] + r2[i + 1] + r2[i + 2]) / 5;
            if (mean > 9 * expected) {
                flags.add(QualityFlag.MULTIPLE_RESONANCES);
                break;
            }
        }
        return flags;
    }

    static boolean strongCoupling(CouplingRoute route, Coupling c, ResonanceShape main, double ql) {
        return switch (route) {
            // Common practice: weak coupling, -20 to -30 dB; above -6 dB the symmetric correction doubles QL.
            case TRANSMISSION_SYMMETRIC -> main.amplitude() > 0.5;
            case TRANSMISSION_PORTS -> c.qUnloaded() > 4 * ql;
            // A dip deeper than 20 dB: Qu = QL / S21min amplifies any error in the tiny minimum.
            case NOTCH -> c.qUnloaded() > 10 * ql;
            case REFLECTION -> c.coupling1() > 10;
        };
    }
}
