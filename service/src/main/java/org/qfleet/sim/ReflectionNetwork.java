package org.qfleet.sim;

import java.util.List;
import org.qfleet.sweep.SParameter;

/**
 * One-port resonator: the parallel RLC of {@link TransmissionNetwork} (Qu = omega0 R C) behind an
 * ideal transformer of turns ratio m : 1 with m^2 = beta Z0 / R, so the port's Z0 loads the
 * resonator with R / beta and Qe = Qu / beta exactly. The far side of the resonator is open.
 * S11 = (beta - 1 - j Qu x) / (beta + 1 + j Qu x), x the detuning: under-coupled for beta < 1,
 * over-coupled (circle around the origin) for beta > 1.
 */
final class ReflectionNetwork implements ResonatorNetwork {

    private static final double RESISTANCE_OHMS = 1000;
    private static final List<SParameter> PARAMETERS = List.of(SParameter.S11);

    private final double f0Hz;
    private final double conductance;
    private final double omega0C;
    private final Abcd port;
    private final double circleDiameter;

    ReflectionNetwork(ResonatorCircuit circuit) {
        double beta = circuit.coupling1();
        f0Hz = circuit.f0Hz();
        conductance = 1 / RESISTANCE_OHMS;
        omega0C = circuit.qUnloaded() / RESISTANCE_OHMS;
        port = Abcd.transformer(Math.sqrt(beta * Z0 / RESISTANCE_OHMS));
        circleDiameter = 2 * beta / (1 + beta);
    }

    @Override
    public SMatrix at(double fHz) {
        Complex resonator = new Complex(conductance, omega0C * ResonatorNetwork.detuning(fHz, f0Hz));
        Complex inputImpedance = port.then(Abcd.shunt(resonator)).inputImpedanceOpen();
        return SMatrix.reflectionOf(inputImpedance, Z0);
    }

    @Override
    public List<SParameter> parameters() {
        return PARAMETERS;
    }

    @Override
    public double loadedF0Hz() {
        return f0Hz;
    }

    /** 2 beta / (1 + beta). */
    @Override
    public double circleDiameter() {
        return circleDiameter;
    }
}
