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
        Set<QualityFlag> extraFlags = EnumSet.noneOf(QualityFlag.class);
        if (topology == Topology.TRANSMISSION && options.method() != Method.HALF_POWER) {
            Optional<List<TraceFit>> ports = portCircles.fit(sweep, mainFit.shape());
            if (ports.isPresent() && PortCircles.showSameResonance(mainFit, ports.get())) {
                fits.addAll(ports.get());
                route = CouplingRoute.TRANSMISSION_PORTS;
            } else if (ports.isPresent()) {
                // The reflection circles describe another resonance than S21: trust S21 alone, and say so.
                extraFlags.add(QualityFlag.COUPLING_MISMATCH);
            }
        }
        return ResultAssembly.assemble(sweep.frequencyHz(), fits, route, extraFlags);
    }

    private final PortCircles portCircles = new PortCircles();

    private TraceFit fitTrace(double[] f, Trace trace, Topology topology, Method method) throws FitException {
        Method chosen = method != null ? method : trace.phaseKnown() ? Method.COMPLEX_CIRCLE : Method.LORENTZIAN;
        return estimators.get(chosen).fit(f, trace, topology);
    }

}
