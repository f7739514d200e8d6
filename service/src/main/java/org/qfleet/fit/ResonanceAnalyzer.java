package org.qfleet.fit;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.qfleet.sweep.SParameter;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.Topology;
import org.qfleet.sweep.TopologyGuess;
import org.qfleet.sweep.Trace;

/**
 * The engine's front door: one validated sweep in, one result out. Fits the main trace (S21, or S11
 * for a reflection) with the complex circle when it has phase and the Lorentzian otherwise; for a
 * transmission that also carries S11 and S22 with phase, fits those circles too and corrects with
 * both couplings. Stateless and thread-safe.
 */
public final class ResonanceAnalyzer {

    private final Map<Method, ResonanceEstimator> estimators = estimators(
            new ComplexCircleEstimator(), new LorentzianEstimator(), new HalfPowerEstimator());

    private static Map<Method, ResonanceEstimator> estimators(ResonanceEstimator... all) {
        Map<Method, ResonanceEstimator> map = new EnumMap<>(Method.class);
        for (ResonanceEstimator e : all) {
            map.put(e.method(), e);
        }
        return map;
    }

    public ResonanceResult analyze(Sweep sweep) throws FitException {
        return analyze(sweep, FitOptions.AUTOMATIC);
    }

    public ResonanceResult analyze(Sweep sweep, FitOptions options) throws FitException {
        Topology topology = sweep.topology() != null ? sweep.topology() : TopologyGuess.of(sweep);
        SParameter mainParameter = topology == Topology.REFLECTION ? SParameter.S11 : SParameter.S21;
        Trace main = sweep.trace(mainParameter).orElseThrow(() -> new FitException(
                "a " + topology.wireName() + " sweep needs " + mainParameter.wireName() + ", which this one lacks"));
        double[] f = sweep.frequencyHz();
        TraceFit mainFit = fitTrace(f, main, topology, options.method());

        List<TraceFit> fits = new ArrayList<>(List.of(mainFit));
        CouplingRoute route = switch (topology) {
            case TRANSMISSION -> CouplingRoute.TRANSMISSION_SYMMETRIC;
            case NOTCH -> CouplingRoute.NOTCH;
            case REFLECTION -> CouplingRoute.REFLECTION;
        };
        Set<QualityFlag> portFlags = EnumSet.noneOf(QualityFlag.class);
        if (topology == Topology.TRANSMISSION && options.method() != Method.HALF_POWER) {
            Optional<List<TraceFit>> ports = fitPorts(sweep);
            if (ports.isPresent() && sameResonance(mainFit, ports.get())) {
                fits.addAll(ports.get());
                route = CouplingRoute.TRANSMISSION_PORTS;
            } else if (ports.isPresent()) {
                // The reflection circles describe another resonance than S21: trust S21 alone, and say so.
                portFlags.add(QualityFlag.COUPLING_MISMATCH);
            }
        }
        ResonanceResult result = assemble(sweep, main, fits, route);
        if (portFlags.isEmpty()) {
            return result;
        }
        List<QualityFlag> flags = new ArrayList<>(result.flags());
        flags.addAll(portFlags);
        return new ResonanceResult(result.f0Hz(), result.f0UncertaintyHz(), result.qLoaded(), result.qLoadedUncertainty(),
                result.qUnloaded(), result.qUnloadedUncertainty(), result.qExternal(), result.coupling1(), result.coupling2(),
                result.resonanceDb(), result.method(), result.route(), result.snrDb(), result.residualRatio(),
                flags.stream().distinct().toList(), result.model());
    }

    private TraceFit fitTrace(double[] f, Trace trace, Topology topology, Method method) throws FitException {
        Method chosen = method != null ? method : trace.phaseKnown() ? Method.COMPLEX_CIRCLE : Method.LORENTZIAN;
        return estimators.get(chosen).fit(f, trace, topology);
    }

    /** S11 and S22 circles when both are there with phase and show a resonance; empty otherwise. */
    private Optional<List<TraceFit>> fitPorts(Sweep sweep) {
        Optional<Trace> s11 = sweep.trace(SParameter.S11);
        Optional<Trace> s22 = sweep.trace(SParameter.S22);
        if (s11.isEmpty() || s22.isEmpty() || !s11.get().phaseKnown() || !s22.get().phaseKnown()) {
            return Optional.empty();
        }
        try {
            TraceFit f11 = fitTrace(sweep.frequencyHz(), s11.get(), Topology.REFLECTION, Method.COMPLEX_CIRCLE);
            TraceFit f22 = fitTrace(sweep.frequencyHz(), s22.get(), Topology.REFLECTION, Method.COMPLEX_CIRCLE);
            if (!usable(f11) || !usable(f22)) {
                return Optional.empty();
            }
            return Optional.of(List.of(f11, f22));
        } catch (FitException e) {
            return Optional.empty();
        }
    }

    /**
     * Whether the reflection circles show the resonance S21 shows: f0 and QL agree within five
     * combined standard uncertainties, or 1 % of the width and 2 % of QL when the data are nearly noiseless.
     */
    private static boolean sameResonance(TraceFit main, List<TraceFit> ports) {
        ResonanceShape s21 = main.shape();
        double sf = Propagation.standardUncertainty(List.of(main), s -> s.get(0).f0Hz());
        double sq = Propagation.standardUncertainty(List.of(main), s -> s.get(0).qLoaded());
        double width = s21.f0Hz() / s21.qLoaded();
        for (TraceFit port : ports) {
            ResonanceShape p = port.shape();
            double pf = Propagation.standardUncertainty(List.of(port), s -> s.get(0).f0Hz());
            double pq = Propagation.standardUncertainty(List.of(port), s -> s.get(0).qLoaded());
            boolean f0Agrees = Math.abs(p.f0Hz() - s21.f0Hz()) <= Math.max(5 * Math.hypot(sf, pf), 0.01 * width);
            boolean qlAgrees = Math.abs(p.qLoaded() - s21.qLoaded()) <= Math.max(5 * Math.hypot(sq, pq), 0.02 * s21.qLoaded());
            if (!f0Agrees || !qlAgrees) {
                return false;
            }
        }
        return true;
    }

    /** A port circle is usable when it has a background to normalize by and stands out of the noise. */
    private static boolean usable(TraceFit fit) {
        ResonanceShape s = fit.shape();
        return s.background() > 0 && s.amplitude() > 5 * fit.residualSigma() && s.relativeDiameter() < 2
                && s.qLoaded() > 0 && Double.isFinite(s.qLoaded());
    }

    private static ResonanceResult assemble(Sweep sweep, Trace main, List<TraceFit> fits, CouplingRoute route)
            throws FitException {
        TraceFit mainFit = fits.get(0);
        ResonanceShape shape = mainFit.shape();
        double[] f = sweep.frequencyHz();
        checkPhysical(shape, f, route, fits);
        double[] weights = route == CouplingRoute.TRANSMISSION_PORTS ? inverseVariances(fits, s -> s.qLoaded()) : null;
        double[] f0Weights = route == CouplingRoute.TRANSMISSION_PORTS ? inverseVariances(fits, s -> s.f0Hz()) : null;
        Coupling coupling = CouplingCorrection.apply(route, shapesOf(fits), weights);
        if (!(coupling.qUnloaded() > 0) || !Double.isFinite(coupling.qUnloaded())) {
            throw new FitException(String.format(
                    "the coupling correction gives no finite positive Qu (QL %.4g, circle %.4g); check the topology and calibration",
                    shape.qLoaded(), shape.amplitude()));
        }
        double sigmaQu = Propagation.standardUncertainty(fits, s -> CouplingCorrection.apply(route, s, weights).qUnloaded());
        double ql = CouplingCorrection.loadedQ(shapesOf(fits), weights);
        double sigmaQl = Propagation.standardUncertainty(fits, s -> CouplingCorrection.loadedQ(s, weights));
        double f0 = weightedMean(shapesOf(fits), f0Weights, ResonanceShape::f0Hz);
        double sigmaF0 = Propagation.standardUncertainty(fits, s -> weightedMean(s, f0Weights, ResonanceShape::f0Hz));

        Set<QualityFlag> flags = EnumSet.noneOf(QualityFlag.class);
        flags.addAll(QualityChecks.sweepDesign(f, shape.f0Hz(), shape.qLoaded()));
        flags.addAll(QualityChecks.residuals(f, mainFit));
        double snrDb = 20 * Math.log10(shape.amplitude() / mainFit.noiseSigma());
        if (snrDb < QualityChecks.MIN_SNR_DB) {
            flags.add(QualityFlag.LOW_SNR);
        }
        if (QualityChecks.strongCoupling(route, coupling, shape, shape.qLoaded())) {
            flags.add(QualityFlag.STRONG_COUPLING);
        }
        if (route == CouplingRoute.TRANSMISSION_PORTS && portsDisagree(fits, coupling)) {
            flags.add(QualityFlag.COUPLING_MISMATCH);
        }
        double residualRatio = mainFit.residualSigma() / mainFit.noiseSigma();
        return new ResonanceResult(f0, sigmaF0, ql, sigmaQl,
                coupling.qUnloaded(), sigmaQu, coupling.qExternal(), coupling.coupling1(), coupling.coupling2(),
                coupling.resonanceDb(), mainFit.method(), route, snrDb, residualRatio, new ArrayList<>(flags),
                mainFit.model());
    }

    private static void checkPhysical(ResonanceShape shape, double[] f, CouplingRoute route, List<TraceFit> fits)
            throws FitException {
        if (!(shape.qLoaded() > 0) || !Double.isFinite(shape.qLoaded())) {
            throw new FitException("no resonance found: the fitted loaded Q is not a finite positive number");
        }
        double bandwidth = shape.f0Hz() / shape.qLoaded();
        double span = f[f.length - 1] - f[0];
        if (bandwidth > 3 * span) {
            throw new FitException(String.format(
                    "no resonance found: the fitted line (QL %.3g) is wider than three times the sweep; widen the span or check the data",
                    shape.qLoaded()));
        }
        if (shape.f0Hz() < f[0] - bandwidth || shape.f0Hz() > f[f.length - 1] + bandwidth) {
            throw new FitException(String.format("no resonance inside the sweep (fitted f0 %.6g Hz lies outside %.6g-%.6g Hz)",
                    shape.f0Hz(), f[0], f[f.length - 1]));
        }
        if (route == CouplingRoute.TRANSMISSION_SYMMETRIC && shape.amplitude() >= 1) {
            throw new FitException(String.format(
                    "|S21(f0)| = %.4f is not below 1: Qu is undefined; check the calibration of the station", shape.amplitude()));
        }
        if (route == CouplingRoute.NOTCH && shape.amplitude() > 2 * shape.background()) {
            throw new FitException("the sweep shows a peak on a weak background, not a dip: "
                    + "is it a transmission measurement (--topology transmission)?");
        }
        if (route == CouplingRoute.REFLECTION && shape.relativeDiameter() >= 2) {
            throw new FitException("the reflection circle is larger than the unit circle allows; check the calibration");
        }
    }

    private static boolean portsDisagree(List<TraceFit> fits, Coupling coupling) {
        double measured = fits.get(0).shape().amplitude();
        double predicted = CouplingCorrection.predictedTransmission(coupling);
        double sigma = Propagation.standardUncertainty(List.of(fits.get(0)), s -> s.get(0).amplitude());
        // 5 % relative, or three standard uncertainties when the data are noisier than that.
        return Math.abs(measured - predicted) > Math.max(0.05 * predicted, 3 * sigma);
    }

    /**
     * Inverse variances of one quantity in each fit: the traces of one resonance are independent
     * measurements of the same f0 and QL, best combined by these weights.
     */
    private static double[] inverseVariances(List<TraceFit> fits, java.util.function.ToDoubleFunction<ResonanceShape> quantity) {
        double[] w = new double[fits.size()];
        for (int i = 0; i < w.length; i++) {
            double sigma = Propagation.standardUncertainty(List.of(fits.get(i)), s -> quantity.applyAsDouble(s.get(0)));
            // A trace whose uncertainty is unknown or infinite does not vote; the main trace always counts.
            w[i] = sigma > 0 && Double.isFinite(sigma) ? 1 / (sigma * sigma) : (i == 0 ? 1 : 0);
        }
        return w;
    }

    private static double weightedMean(List<ResonanceShape> shapes, double[] weights,
                                       java.util.function.ToDoubleFunction<ResonanceShape> quantity) {
        if (weights == null) {
            return quantity.applyAsDouble(shapes.get(0));
        }
        double sum = 0;
        double total = 0;
        for (int i = 0; i < weights.length; i++) {
            sum += weights[i] * quantity.applyAsDouble(shapes.get(i));
            total += weights[i];
        }
        return sum / total;
    }

    private static List<ResonanceShape> shapesOf(List<TraceFit> fits) {
        List<ResonanceShape> shapes = new ArrayList<>(fits.size());
        for (TraceFit fit : fits) {
            shapes.add(fit.shape());
        }
        return shapes;
    }

}
