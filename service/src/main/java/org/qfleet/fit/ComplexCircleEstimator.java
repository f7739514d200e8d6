package org.qfleet.fit;

import org.qfleet.sweep.Topology;
import org.qfleet.sweep.Trace;

/**
 * Fits the resonance circle with delay and complex background to complex data by least squares
 * with equal noise on every point, started from model-free estimates: f0 and the width from the
 * speed along the trace |dS/df|, which peaks at f0 with a half-power full width of f0 / QL whatever
 * the background; the delay from the phase slope once the resonance's own slope is accounted for.
 * Long sweeps are first solved on every k-th point, then polished on all of them. The covariance
 * sigma^2 (J^T J)^-1 gives the asymptotic uncertainties (Coakley et al., IEEE Trans. MTT 51(3),
 * 862, 2003).
 */
final class ComplexCircleEstimator implements ResonanceEstimator {

    /** chi-square(2) at 0.999: a background is kept only when it lowers the cost by more than this many sigma^2. */
    static final double BACKGROUND_SIGNIFICANCE = 13.8;
    /** Points kept for the coarse solution of a long sweep. */
    private static final int COARSE_POINTS = 100;
    /**
     * A fit started from another trace's resonance is kept when its residual is within this factor of
     * the noise; a trace it does not explain is fitted again from its own data.
     */
    private static final double UNEXPLAINED_RESIDUAL = 1.5;
    /** The largest turn (rad) by the delay between neighbouring coarse points for a delay read from them. */
    private static final double MAX_COARSE_TWIST = 1.0;
    /** Coarse points per half width the resonance must keep. */
    private static final double COARSE_POINTS_PER_HALF_WIDTH = 4;

    @Override
    public Method method() {
        return Method.COMPLEX_CIRCLE;
    }

    @Override
    public TraceFit fit(double[] frequencyHz, Trace trace, Topology topology) throws FitException {
        if (!trace.phaseKnown()) {
            throw new FitException("the complex-circle fit needs phase, and this trace is magnitude only");
        }
        return traceFit(fitCircle(frequencyHz, trace.re(), trace.im(), topology, null));
    }

    /**
     * Fits a trace of a resonance that another trace of the same sweep has already located, starting
     * from that position and width instead of finding them in the data; when that start leaves the
     * trace unexplained (it shows another resonance, or none), the fit starts over from the data alone.
     */
    TraceFit fitNear(double[] frequencyHz, Trace trace, Topology topology, ResonanceShape near) throws FitException {
        if (!trace.phaseKnown()) {
            throw new FitException("the complex-circle fit needs phase, and this trace is magnitude only");
        }
        try {
            CircleFit fit = fitCircle(frequencyHz, trace.re(), trace.im(), topology, near);
            if (fit.sigma() <= UNEXPLAINED_RESIDUAL * fit.noiseSigma()) {
                return traceFit(fit);
            }
        } catch (FitException e) {
            // started in the wrong place: start again from the data below
        }
        return traceFit(fitCircle(frequencyHz, trace.re(), trace.im(), topology, null));
    }

    private static TraceFit traceFit(CircleFit fit) {
        return new TraceFit(fit.parameters(), fit.covariance(), p -> ResonanceShape.of(fit.model(p)), fit.model(),
                Method.COMPLEX_CIRCLE, fit.sigma(), fit.noiseSigma(), fit.residualPower());
    }

    /**
     * Transmission fits try without a background first (leakage is normally negligible, and a free
     * background makes the delay ill-determined) and keep one only when the data demand it; notches
     * and reflections always have one, and a magnitude tilt besides.
     */
    CircleFit fitCircle(double[] frequencyHz, double[] re, double[] im, Topology topology) throws FitException {
        return fitCircle(frequencyHz, re, im, topology, null);
    }

    private CircleFit fitCircle(double[] frequencyHz, double[] re, double[] im, Topology topology, ResonanceShape near)
            throws FitException {
        int n = frequencyHz.length;
        NormalizedFrequency normalized = NormalizedFrequency.of(frequencyHz);
        double referenceHz = normalized.referenceHz();
        double scaleHz = normalized.scaleHz();
        double[] x = normalized.x();
        double noise = NoiseEstimate.complexSigma(re, im);
        // Every k-th of equally spaced points is equally spaced too.
        boolean uniform = Phasors.equallySpaced(x);
        double[] peak = near != null ? normalizedPole(near, normalized) : modelFreePeak(x, re, im, topology, noise, uniform);
        double x0 = peak[0];
        double g = peak[1];
        int stride = stride(n, g / (2.0 / (n - 1)));
        double[] xs = every(x, stride);
        double[] rs = every(re, stride);
        double[] is = every(im, stride);
        double t = StartingPoint.delay(xs, rs, is, x0, g);
        if (stride > 1 && Math.abs(t) * (xs[1] - xs[0]) > MAX_COARSE_TWIST) {
            // The delay turns the coarse points too far apart to follow the phase unambiguously.
            t = StartingPoint.delay(x, re, im, x0, g);
        }
        boolean transmission = topology == Topology.TRANSMISSION;
        // A fit started from another trace's resonance goes straight to the full data: its delay must be good.
        DelaySearch.Start delayStart = DelaySearch.refine(xs, rs, is, x0, g, t, !transmission, uniform, near != null);
        t = delayStart.delay();
        double[] a = delayStart.amplitudes();

        if (!transmission) {
            double[] start = {a[0], a[1], a[2], a[3], x0, g, t, 0};
            // A position and width taken from another trace are already as good as a coarse solution's.
            double[] begin = near != null ? start : coarse(new CircleProblem(xs, rs, is, true, true, uniform), start, stride);
            return solve(new CircleProblem(x, re, im, true, true, uniform), begin, n, referenceHz, scaleHz, noise);
        }
        CircleProblem plain = new CircleProblem(x, re, im, false, false, uniform);
        double[] start = coarse(new CircleProblem(xs, rs, is, false, false, uniform), new double[] {a[2], a[3], x0, g, t}, stride);
        LevenbergMarquardt.Solution s5 = LevenbergMarquardt.solve(plain, start);
        double[] p5 = s5.p();
        if (backgroundScore(plain, s5.evaluatedAt()) > BACKGROUND_SIGNIFICANCE * s5.cost() / Math.max(1, 2 * n - 7)) {
            CircleProblem withBackground = new CircleProblem(x, re, im, true, false, uniform);
            double[] p7 = {0, 0, p5[0], p5[1], p5[2], p5[3], p5[4]};
            LevenbergMarquardt.Solution s7 = LevenbergMarquardt.solve(withBackground, p7);
            double sigma2 = s7.cost() / Math.max(1, 2 * n - 7);
            if (s5.cost() - s7.cost() > BACKGROUND_SIGNIFICANCE * sigma2) {
                return toFit(s7, withBackground, n, referenceHz, scaleHz, noise);
            }
        }
        return toFit(s5, plain, n, referenceHz, scaleHz, noise);
    }

    /** Position and half width of the line from the data alone, as {x0, g}. */
    private static double[] modelFreePeak(double[] x, double[] re, double[] im, Topology topology, double noise,
                                          boolean uniform) {
        // Behind a large background (notch, reflection) a long delay spins the whole trace faster than
        // the resonance moves along it: take the delay out first, from the background's phase slope.
        double spin = topology == Topology.TRANSMISSION ? 0 : StartingPoint.backgroundDelay(x, re, im);
        return spin == 0 ? StartingPoint.speedPeak(x, re, im, noise, uniform)
                : StartingPoint.speedPeak(x, StartingPoint.rotated(x, re, im, spin, uniform), noise, uniform);
    }

    /** The pole of a known resonance (the inverse of {@link ResonanceShape#fromPole}) in normalized units, as {x0, g}. */
    private static double[] normalizedPole(ResonanceShape near, NormalizedFrequency normalized) {
        double halfWidthHz = near.f0Hz() / (2 * near.qLoaded());
        double centreHz = Math.sqrt(Math.max(0, near.f0Hz() * near.f0Hz() - halfWidthHz * halfWidthHz));
        return new double[] {(centreHz - normalized.referenceHz()) / normalized.scaleHz(), halfWidthHz / normalized.scaleHz()};
    }

    /** Every k-th sample, so the coarse solution sees about {@link #COARSE_POINTS} points across the line. */
    private static int stride(int n, double pointsPerHalfWidth) {
        int byCount = n / COARSE_POINTS;
        int byWidth = (int) (pointsPerHalfWidth / COARSE_POINTS_PER_HALF_WIDTH);
        return Math.max(1, Math.min(byCount, byWidth));
    }

    private static double[] every(double[] v, int stride) {
        if (stride == 1) {
            return v;
        }
        double[] out = new double[(v.length + stride - 1) / stride];
        for (int i = 0, j = 0; i < v.length; i += stride, j++) {
            out[j] = v[i];
        }
        return out;
    }

    private static double[] coarse(CircleProblem problem, double[] start, int stride) {
        return stride == 1 ? start : LevenbergMarquardt.solveRoughly(problem, start).p();
    }

    private static CircleFit solve(CircleProblem problem, double[] start, int n, double referenceHz, double scaleHz,
                                   double noise) throws FitException {
        return toFit(LevenbergMarquardt.solve(problem, start), problem, n, referenceHz, scaleHz, noise);
    }

    /**
     * The cost reduction one Gauss-Newton step of the model with a background would bring from the
     * background-free solution: the score test of the background, from the same pass over the data.
     */
    private static double backgroundScore(CircleProblem plain, double[] p5) {
        int k = 7;
        double[][] jtj = new double[k][k];
        double[] jtr = new double[k];
        plain.backgroundScoreEquations(p5, jtj, jtr);
        for (int i = 0; i < k; i++) {
            // A whisper of damping keeps the near-degenerate directions (background against delay) solvable.
            jtj[i][i] *= 1 + 1e-9;
        }
        double[] step = new double[k];
        if (!Linear.solveSymmetric(jtj, jtr, step)) {
            return Double.POSITIVE_INFINITY;
        }
        double drop = 0;
        for (int i = 0; i < k; i++) {
            drop += jtr[i] * step[i];
        }
        return drop;
    }

    private static CircleFit toFit(LevenbergMarquardt.Solution s, CircleProblem problem, int n,
                                   double referenceHz, double scaleHz, double noise) throws FitException {
        int k = problem.parameterCount();
        double sigma2 = s.cost() / Math.max(1, 2 * n - k);
        double[][] inverse = Covariance.of(s.jtj(), sigma2);
        if (inverse == null) {
            throw new FitException("the resonance circle is not determined by the data (singular fit)");
        }
        double[] p = s.p();
        int o = problem.background() ? 2 : 0;
        if (!(Math.abs(p[o + 3]) > 0) || !Double.isFinite(p[o + 3])) {
            throw new FitException("no resonance found: the fitted width is zero or not finite");
        }
        return new CircleFit(p, inverse, referenceHz, scaleHz, problem.background(), problem.tilt(),
                Math.sqrt(sigma2), noise, n, problem.residualPower(s.evaluatedAt()));
    }
}
