package org.qfleet.sim;

import java.util.Objects;
import org.qfleet.sweep.Topology;

/**
 * A resonator and its coupling, described by the numbers a test wants to recover. The simulator
 * turns it into an RLC network and solves it as a two-port; these values are its exact truth.
 *
 * @param topology      how the resonator is connected
 * @param f0Hz          resonant frequency of the resonator itself, 1 / (2 pi sqrt(LC))
 * @param qUnloaded     unloaded Q: omega0 R C for the parallel RLC (transmission, reflection),
 *                      omega0 L / R for the series RLC of a notch
 * @param coupling1     beta1 = Qu / Qe1 (port 1; for a notch, the coupling to the through line)
 * @param coupling2     beta2 = Qu / Qe2 (port 2 of a transmission resonator; ignored otherwise)
 * @param asymmetryRad  notch only: rotation phi of the resonance circle caused by an impedance
 *                      mismatch of the feed line (Khalil et al., J. Appl. Phys. 111, 054510, 2012);
 *                      0 for a symmetric dip, and 0 for the other topologies
 */
public record ResonatorCircuit(
        Topology topology, double f0Hz, double qUnloaded, double coupling1, double coupling2, double asymmetryRad) {

    public ResonatorCircuit {
        Objects.requireNonNull(topology, "topology");
        requirePositive("f0Hz", f0Hz);
        requirePositive("qUnloaded", qUnloaded);
        requirePositive("coupling1", coupling1);
        if (topology == Topology.TRANSMISSION) {
            requirePositive("coupling2", coupling2);
        }
        if (!(Math.abs(asymmetryRad) < Math.PI / 2)) {
            throw new IllegalArgumentException("asymmetryRad must lie strictly between -pi/2 and pi/2, got " + asymmetryRad);
        }
        if (asymmetryRad != 0 && topology != Topology.NOTCH) {
            throw new IllegalArgumentException("asymmetryRad applies to a notch only, got " + asymmetryRad
                    + " for " + topology.wireName());
        }
    }

    /** A circuit without notch asymmetry. */
    public ResonatorCircuit(Topology topology, double f0Hz, double qUnloaded, double coupling1, double coupling2) {
        this(topology, f0Hz, qUnloaded, coupling1, coupling2, 0);
    }

    /** A two-port transmission resonator with couplings beta1, beta2. */
    public static ResonatorCircuit transmission(double f0Hz, double qUnloaded, double beta1, double beta2) {
        return new ResonatorCircuit(Topology.TRANSMISSION, f0Hz, qUnloaded, beta1, beta2, 0);
    }

    /**
     * A transmission resonator whose |S21(f0)| is {@code 10^(-insertionLossDb/20)}, with
     * beta1 / beta2 = {@code couplingRatio}. Inverts |S21(f0)| = 2 sqrt(b1 b2) / (1 + b1 + b2)
     * (coupled-resonator two-port; DESIGN section 4).
     */
    public static ResonatorCircuit transmissionWithInsertionLoss(
            double f0Hz, double qUnloaded, double insertionLossDb, double couplingRatio) {
        requirePositive("insertionLossDb", insertionLossDb);
        requirePositive("couplingRatio", couplingRatio);
        double s = Math.pow(10, -insertionLossDb / 20);
        double beta2 = s / (2 * Math.sqrt(couplingRatio) - s * (1 + couplingRatio));
        if (!(beta2 > 0)) {
            throw new IllegalArgumentException("no passive coupling gives " + insertionLossDb
                    + " dB insertion loss with coupling ratio " + couplingRatio);
        }
        return transmission(f0Hz, qUnloaded, couplingRatio * beta2, beta2);
    }

    /** A symmetric notch (resonator side-coupled to a matched through line). */
    public static ResonatorCircuit notch(double f0Hz, double qUnloaded, double beta) {
        return new ResonatorCircuit(Topology.NOTCH, f0Hz, qUnloaded, beta, 0, 0);
    }

    /** A notch whose circle is rotated by {@code asymmetryRad} by a feed-line mismatch. */
    public static ResonatorCircuit notch(double f0Hz, double qUnloaded, double beta, double asymmetryRad) {
        return new ResonatorCircuit(Topology.NOTCH, f0Hz, qUnloaded, beta, 0, asymmetryRad);
    }

    /** A one-port resonator; beta below 1 under-coupled, above 1 over-coupled. */
    public static ResonatorCircuit reflection(double f0Hz, double qUnloaded, double beta) {
        return new ResonatorCircuit(Topology.REFLECTION, f0Hz, qUnloaded, beta, 0, 0);
    }

    /** Sum of the couplings of every port: Qu / Qe with 1 / Qe = sum 1 / Qe_k. */
    public double totalCoupling() {
        return topology == Topology.TRANSMISSION ? coupling1 + coupling2 : coupling1;
    }

    /** External Q of all ports together. */
    public double qExternal() {
        return qUnloaded / totalCoupling();
    }

    /** Loaded Q: 1 / QL = 1 / Qu + 1 / Qe. */
    public double qLoaded() {
        return qUnloaded / (1 + totalCoupling());
    }

    private static void requirePositive(String name, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be positive and finite, got " + value);
        }
    }
}
