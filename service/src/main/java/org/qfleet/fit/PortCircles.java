package org.qfleet.fit;

import java.util.List;
import java.util.Optional;
import org.qfleet.sweep.SParameter;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.Topology;
import org.qfleet.sweep.Trace;

/**
 * The reflection circles of a two-port sweep (S11 and S22), which give each port's coupling when
 * they show the same resonance as S21 (DESIGN.md section 4: transmission with asymmetric coupling).
 */
final class PortCircles {

    private final ComplexCircleEstimator circles = new ComplexCircleEstimator();

    /**
     * S11 and S22 circles when both are there with phase and show a resonance; empty otherwise. The
     * fits start from the resonance the main trace found ({@code near}), which the reflections share.
     */
    Optional<List<TraceFit>> fit(Sweep sweep, ResonanceShape near) {
        Optional<Trace> s11 = sweep.trace(SParameter.S11);
        Optional<Trace> s22 = sweep.trace(SParameter.S22);
        if (s11.isEmpty() || s22.isEmpty() || !s11.get().phaseKnown() || !s22.get().phaseKnown()) {
            return Optional.empty();
        }
        try {
            TraceFit f11 = circles.fitNear(sweep.frequencyHz(), s11.get(), Topology.REFLECTION, near);
            TraceFit f22 = circles.fitNear(sweep.frequencyHz(), s22.get(), Topology.REFLECTION, near);
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
    static boolean showSameResonance(TraceFit main, List<TraceFit> ports) {
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
}
