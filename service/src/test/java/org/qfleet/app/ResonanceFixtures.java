package org.qfleet.app;

import java.util.List;
import java.util.Map;
import org.qfleet.fit.CouplingRoute;
import org.qfleet.fit.Method;
import org.qfleet.fit.QualityFlag;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.fit.ResponseModel;
import org.qfleet.sweep.SParameter;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepInfo;
import org.qfleet.sweep.Topology;
import org.qfleet.sweep.Trace;

/**
 * Sweeps and results made up for tests of the output side (JSON lines, plots, schemas). The
 * numbers follow the ideal resonance S = A / (1 + j 2 QL (f - f0) / f0), a circle through the
 * origin of diameter A with half-power points at f0 ± f0 / (2 QL) (standard single-pole
 * resonance, e.g. Kajfez, "Q Factor", 1994, recalled from memory).
 */
public final class ResonanceFixtures {

    private ResonanceFixtures() {
    }

    /** The ideal resonance above; without phase it gives the magnitude A / sqrt(1 + x^2). */
    public record CircleModel(double f0Hz, double qLoaded, double peak, boolean hasPhase) implements ResponseModel {

        @Override
        public void evaluate(double frequencyHz, double[] reIm) {
            double x = 2 * qLoaded * (frequencyHz - f0Hz) / f0Hz;
            double d = 1 + x * x;
            if (hasPhase) {
                reIm[0] = peak / d;
                reIm[1] = -peak * x / d;
            } else {
                reIm[0] = peak / Math.sqrt(d);
                reIm[1] = 0;
            }
        }
    }

    /** A 10.4 GHz cavity with QL 5000 and -20 dB insertion loss, with phase. */
    public static final CircleModel CAVITY = new CircleModel(10.4e9, 5000, 0.1, true);

    /** The same cavity measured without phase. */
    public static final CircleModel CAVITY_MAGNITUDE = new CircleModel(10.4e9, 5000, 0.1, false);

    /** The message fields of a sweep from a test station of the demo plant. */
    public static final SweepInfo STATION_INFO = new SweepInfo("sw-000123", "st-04", "cav-10g4", "L2407",
            "u0042", "2025-03-14T09:26:53.589Z", "fx-7", 23.5);

    /** S21 of the model sampled at {@code points} frequencies over {@code widths} half-power widths. */
    public static Sweep sweep(String source, CircleModel model, int points, double widths, SweepInfo info,
            Topology topology) {
        double span = widths * model.f0Hz() / model.qLoaded();
        double[] f = new double[points];
        double[] re = new double[points];
        double[] im = new double[points];
        double[] reIm = new double[2];
        for (int i = 0; i < points; i++) {
            f[i] = model.f0Hz() - span / 2 + span * i / (points - 1);
            model.evaluate(f[i], reIm);
            re[i] = reIm[0];
            im[i] = reIm[1];
        }
        Trace trace = model.hasPhase() ? Trace.complex(re, im) : Trace.magnitudeOnly(re);
        return new Sweep(source, info, topology, f, Map.of(SParameter.S21, trace), 50);
    }

    /** A file sweep: no message fields, no topology of its own. */
    public static Sweep fileSweep(String source, CircleModel model) {
        return sweep(source, model, 201, 10, SweepInfo.NONE, null);
    }

    /**
     * A result consistent with the model under symmetric transmission coupling:
     * |S21(f0)| = 2 beta / (1 + 2 beta), Qu = QL / (1 - |S21(f0)|) (the product brief, section 4).
     */
    public static ResonanceResult result(CircleModel model, List<QualityFlag> flags) {
        double a = model.peak();
        double qu = model.qLoaded() / (1 - a);
        double qe = 1 / (1 / model.qLoaded() - 1 / qu);
        double beta = a / (2 * (1 - a));
        return new ResonanceResult(model.f0Hz(), 1234.0, model.qLoaded(), 21.0, qu, 27.5, qe, beta, beta,
                20 * Math.log10(a), model.hasPhase() ? Method.COMPLEX_CIRCLE : Method.LORENTZIAN,
                CouplingRoute.TRANSMISSION_SYMMETRIC, 38.2, 1.04, flags, model);
    }
}
