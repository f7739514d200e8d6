package org.qfleet.fit;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

/**
 * Turns the fitted traces of one sweep into the result: physical checks, coupling correction,
 * uncertainties propagated to every reported quantity, and the quality flags.
 */
final class ResultAssembly {

    private ResultAssembly() {
    }

    static ResonanceResult assemble(double[] f, List<TraceFit> fits, CouplingRoute route, Set<QualityFlag> extraFlags)
            throws FitException {
        TraceFit mainFit = fits.get(0);
        ResonanceShape shape = mainFit.shape();
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
        flags.addAll(extraFlags);
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
