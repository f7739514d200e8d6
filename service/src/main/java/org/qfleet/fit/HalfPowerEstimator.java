package org.qfleet.fit;

import org.qfleet.sweep.Topology;
import org.qfleet.sweep.Trace;

/**
 * The bench baseline: f0 at the extreme of |S|, QL = f0 / bandwidth between the half-power points
 * found by linear interpolation. For a peak the half-power level is |S(f0)|^2 / 2; for a dip (notch,
 * reflection) it is (1 + |S(f0)|^2) / 2 relative to the off-resonance level, not "3 dB above the
 * minimum" (DESIGN.md section 4; standard resonator theory, e.g. Kajfez, Q Factor, 1994, from memory).
 */
final class HalfPowerEstimator implements ResonanceEstimator {

    /** Share of the points at each end that give the off-resonance level of a dip. */
    private static final double EDGE_SHARE = 0.05;

    /** Reads the shape from the magnitude alone (a dip is taken as under-coupled). */
    static ResonanceShape read(double[] f, double[] magnitude, Topology topology) throws FitException {
        return readWithBand(f, magnitude, topology).shape;
    }

    @Override
    public Method method() {
        return Method.HALF_POWER;
    }

    @Override
    public TraceFit fit(double[] f, Trace trace, Topology topology) throws FitException {
        double[] magnitude = ResonanceEstimator.magnitude(trace);
        Reading r = readWithBand(f, magnitude, topology);
        ResonanceShape s = r.shape;
        double noise = NoiseEstimate.realSigma(magnitude);
        // Each half-power crossing moves by the power noise over the power slope there.
        double sigmaPower = 2 * Math.sqrt(r.level) * noise;
        double sigmaLow = sigmaPower / Math.max(r.slopeLow, 1e-300);
        double sigmaHigh = sigmaPower / Math.max(r.slopeHigh, 1e-300);
        double bandwidth = s.f0Hz() / s.qLoaded();
        double sigmaQ = s.qLoaded() * Math.hypot(sigmaLow, sigmaHigh) / bandwidth;
        double sigmaF0 = 0.5 * Math.hypot(sigmaLow, sigmaHigh);
        double sigmaBackground = s.background() > 0 ? noise / Math.sqrt(r.edgePoints) : 0;
        double[] p = {s.f0Hz(), s.qLoaded(), s.amplitude(), s.background()};
        double[][] c = new double[4][4];
        c[0][0] = sigmaF0 * sigmaF0;
        c[1][1] = sigmaQ * sigmaQ;
        c[2][2] = noise * noise;
        c[3][3] = sigmaBackground * sigmaBackground;
        double cos = s.cosRotation();
        ResponseModel model = new CircleModel(s.f0Hz(), s.f0Hz(), s.f0Hz() / (2 * s.qLoaded()), 0,
                topology == Topology.TRANSMISSION ? s.amplitude() : -s.amplitude(), 0, s.background(), 0, 0);
        ResponseModel magnitudeModel = magnitudeOnly(model);
        return new TraceFit(p, c, q -> new ResonanceShape(q[0], q[1], q[2], q[3], cos),
                magnitudeModel, Method.HALF_POWER, Double.NaN, noise,
                ResonanceEstimator.magnitudeResidualPower(f, magnitude, magnitudeModel));
    }

    private static ResponseModel magnitudeOnly(ResponseModel complex) {
        return new ResponseModel() {
            @Override
            public void evaluate(double frequencyHz, double[] reIm) {
                complex.evaluate(frequencyHz, reIm);
                reIm[0] = Math.hypot(reIm[0], reIm[1]);
                reIm[1] = 0;
            }

            @Override
            public boolean hasPhase() {
                return false;
            }
        };
    }

    private record Reading(ResonanceShape shape, double level, double slopeLow, double slopeHigh, int edgePoints) {
    }

    private static Reading readWithBand(double[] f, double[] magnitude, Topology topology) throws FitException {
        int n = f.length;
        boolean peak = topology == Topology.TRANSMISSION;
        double[] p = new double[n];
        for (int i = 0; i < n; i++) {
            p[i] = magnitude[i] * magnitude[i];
        }
        int edge = Math.max(2, (int) Math.round(EDGE_SHARE * n));
        double offLevel = 0;
        if (!peak) {
            for (int i = 0; i < edge; i++) {
                offLevel += p[i] + p[n - 1 - i];
            }
            offLevel /= 2 * edge;
        }
        int k = 0;
        for (int i = 1; i < n; i++) {
            if (peak ? p[i] > p[k] : p[i] < p[k]) {
                k = i;
            }
        }
        double extreme = p[k];
        double f0 = f[k];
        if (k > 0 && k < n - 1) {
            double denom = p[k - 1] - 2 * p[k] + p[k + 1];
            if (denom != 0) {
                double shift = 0.5 * (p[k - 1] - p[k + 1]) / denom;
                if (Math.abs(shift) < 1) {
                    f0 = f[k] + shift * (shift > 0 ? f[k + 1] - f[k] : f[k] - f[k - 1]);
                    extreme = Math.max(0, p[k] - 0.25 * (p[k - 1] - p[k + 1]) * shift);
                }
            }
        }
        double level = peak ? extreme / 2 : (offLevel + extreme) / 2;
        if (!peak && !(offLevel > extreme)) {
            throw new FitException("no dip found: the off-resonance level is not above the minimum");
        }
        double[] low = crossing(f, p, k, -1, level);
        double[] high = crossing(f, p, k, +1, level);
        if (low == null || high == null) {
            throw new FitException("the half-power points are not both inside the sweep; widen the span");
        }
        double bandwidth = high[0] - low[0];
        if (!(bandwidth > 0)) {
            throw new FitException("no resonance found: zero half-power bandwidth");
        }
        double ql = f0 / bandwidth;
        ResonanceShape shape;
        if (peak) {
            shape = new ResonanceShape(f0, ql, Math.sqrt(extreme), 0, 1);
        } else {
            double b = Math.sqrt(offLevel);
            shape = new ResonanceShape(f0, ql, b - Math.sqrt(extreme), b, 1);
        }
        return new Reading(shape, level, low[1], high[1], edge * 2);
    }

    /** @return {frequency, |dP/df|} where P first crosses the level walking from k, or null. */
    private static double[] crossing(double[] f, double[] p, int k, int direction, double level) {
        boolean above = p[k] > level;
        for (int i = k + direction; i >= 0 && i < p.length; i += direction) {
            if ((p[i] > level) != above) {
                int j = i - direction;
                double fraction = (p[j] - level) / (p[j] - p[i]);
                double slope = Math.abs((p[i] - p[j]) / (f[i] - f[j]));
                return new double[] {f[j] + fraction * (f[i] - f[j]), slope};
            }
        }
        return null;
    }
}
