package org.qfleet.sim;

import java.util.List;
import org.qfleet.sweep.SParameter;

/**
 * Two-port resonator: a parallel RLC with R = 1 kOhm, C = Qu / (omega0 R) and
 * L = 1 / (omega0^2 C), so that f0 = 1 / (2 pi sqrt(LC)) and Qu = omega0 R C (Pozar, Microwave
 * Engineering, ch. 6). Port k is coupled by an ideal transformer of turns ratio m_k : 1 (port side to
 * resonator side) with m_k^2 = beta_k Z0 / R: the port's Z0 appears across the resonator as
 * R / beta_k, an external conductance beta_k / R, hence Qe_k = omega0 C R / beta_k = Qu / beta_k
 * exactly. The transformers are frequency independent, so the loaded resonance stays at f0.
 */
final class TransmissionNetwork implements ResonatorNetwork {

    private static final double RESISTANCE_OHMS = 1000;
    private static final List<SParameter> PARAMETERS =
            List.of(SParameter.S21, SParameter.S12, SParameter.S11, SParameter.S22);

    private final double f0Hz;
    private final double conductance;
    private final double omega0C;
    private final Abcd port1;
    private final Abcd port2;
    private final double circleDiameter;

    TransmissionNetwork(ResonatorCircuit circuit) {
        double beta1 = circuit.coupling1();
        double beta2 = circuit.coupling2();
        f0Hz = circuit.f0Hz();
        conductance = 1 / RESISTANCE_OHMS;
        omega0C = circuit.qUnloaded() / RESISTANCE_OHMS;
        port1 = Abcd.transformer(Math.sqrt(beta1 * Z0 / RESISTANCE_OHMS));
        port2 = Abcd.transformer(1 / Math.sqrt(beta2 * Z0 / RESISTANCE_OHMS));
        circleDiameter = 2 * Math.sqrt(beta1 * beta2) / (1 + beta1 + beta2);
    }

    @Override
    public SMatrix at(double fHz) {
        // Y = G + j(omega C - 1/(omega L))
        Complex resonator = new Complex(conductance, omega0C * ResonatorNetwork.detuning(fHz, f0Hz));
        return port1.then(Abcd.shunt(resonator)).then(port2).toS(Z0);
    }

    @Override
    public List<SParameter> parameters() {
        return PARAMETERS;
    }

    @Override
    public double loadedF0Hz() {
        return f0Hz;
    }

    /** |S21(f0)| = 2 sqrt(beta1 beta2) / (1 + beta1 + beta2). */
    @Override
    public double circleDiameter() {
        return circleDiameter;
    }
}
