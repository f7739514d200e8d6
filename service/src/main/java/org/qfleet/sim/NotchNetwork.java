package org.qfleet.sim;

import java.util.List;
import org.qfleet.sweep.SParameter;

/**
 * Resonator side-coupled to a through line. The resonator is a series RLC with R = 1 ohm,
 * L = Qu R / omega0 and C = 1 / (omega0^2 L), so Qu = omega0 L / R = 1 / (omega0 R C) (Pozar,
 * Microwave Engineering, ch. 6); behind an ideal transformer of turns ratio m : 1 it shunts the line
 * at one point, and the line dips where the branch impedance is lowest.
 *
 * <p>Feed-line mismatch (Khalil et al., J. Appl. Phys. 111, 054510, 2012): a series reactance
 * jX = j Z0 tan(phi) sits on each side of the coupling point. It is ideal, i.e. constant over the
 * sweep, which is what keeps the truth exact. Seen from the resonator, the line is the Thevenin
 * impedance (Z0 + jX) / 2 divided by m^2; with m^2 = Z0 / (2 beta R) its resistive part is beta R,
 * so Qe = omega0 L / (beta R) = Qu / beta for every phi and Qu stays the resonator's own. Its
 * reactive part X' = beta R tan(phi) only detunes: the loop is resonant where
 * omega L - 1/(omega C) = -X', i.e. at omega0 (sqrt(1 + s^2) - s), s = beta tan(phi) / (2 Qu), and
 * the resonant part of S21 is rotated by phi. The circle diameter is beta / (1 + beta) for every phi:
 * the resonant part (beta / (1 + beta)) / cos(phi) times the background |S21| = cos(phi).
 * With phi = 0 the reactances vanish and S21(f0) = 1 / (1 + beta).
 *
 * <p>For phi != 0 the half-power width equals f0 / QL to second order in s (about 1e-8 here).
 */
final class NotchNetwork implements ResonatorNetwork {

    private static final double RESISTANCE_OHMS = 1;
    private static final List<SParameter> PARAMETERS = List.of(SParameter.S21, SParameter.S11);

    private final double f0Hz;
    private final double omega0L;
    private final double turnsSquared;
    private final Abcd feed;
    private final double loadedF0Hz;
    private final double circleDiameter;

    NotchNetwork(ResonatorCircuit circuit) {
        double beta = circuit.coupling1();
        double tanPhi = Math.tan(circuit.asymmetryRad());
        f0Hz = circuit.f0Hz();
        omega0L = circuit.qUnloaded() * RESISTANCE_OHMS;
        turnsSquared = Z0 / (2 * beta * RESISTANCE_OHMS);
        feed = Abcd.series(Complex.imaginary(Z0 * tanPhi));
        double s = beta * tanPhi / (2 * circuit.qUnloaded());
        loadedF0Hz = f0Hz / (Math.sqrt(1 + s * s) + s);
        circleDiameter = beta / (1 + beta);
    }

    @Override
    public SMatrix at(double fHz) {
        // Z = R + j(omega L - 1/(omega C)), seen from the line as m^2 Z
        Complex resonator = new Complex(RESISTANCE_OHMS, omega0L * ResonatorNetwork.detuning(fHz, f0Hz));
        Complex branch = resonator.times(turnsSquared).reciprocal();
        return feed.then(Abcd.shunt(branch)).then(feed).toS(Z0);
    }

    @Override
    public List<SParameter> parameters() {
        return PARAMETERS;
    }

    @Override
    public double loadedF0Hz() {
        return loadedF0Hz;
    }

    /** beta / (1 + beta) = QL / Qe = 1 - S21min of a symmetric dip. */
    @Override
    public double circleDiameter() {
        return circleDiameter;
    }
}
