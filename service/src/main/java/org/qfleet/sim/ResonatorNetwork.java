package org.qfleet.sim;

import java.util.List;
import org.qfleet.sweep.SParameter;

/**
 * The lumped RLC network that realises a {@link ResonatorCircuit}, solved exactly at any frequency
 * with two-port (ABCD) algebra. Implementations choose element values so that the circuit's Qu,
 * couplings and f0 are the network's exact properties.
 */
interface ResonatorNetwork {

    /** Reference impedance of every port, ohms. */
    double Z0 = 50;

    /** The S-parameters of the ideal network at {@code fHz}. */
    SMatrix at(double fHz);

    /** The traces this network produces, in the order the simulator draws their noise. */
    List<SParameter> parameters();

    /** Frequency where the loaded response is resonant (the resonant part is real and extreme). */
    double loadedF0Hz();

    /** Diameter of the resonance circle traced by the main trace, linear. */
    double circleDiameter();

    static ResonatorNetwork of(ResonatorCircuit circuit) {
        return switch (circuit.topology()) {
            case TRANSMISSION -> new TransmissionNetwork(circuit);
            case NOTCH -> new NotchNetwork(circuit);
            case REFLECTION -> new ReflectionNetwork(circuit);
        };
    }

    /**
     * omega/omega0 - omega0/omega, written as (f - f0)(f + f0) / (f f0) so that it keeps full
     * precision near resonance. omega C - 1/(omega L) = omega0 C times this when L = 1/(omega0^2 C).
     */
    static double detuning(double fHz, double f0Hz) {
        return (fHz - f0Hz) * (fHz + f0Hz) / (fHz * f0Hz);
    }
}
