package org.qfleet.sim;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.SplittableRandom;
import org.qfleet.sweep.SParameter;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepInfo;
import org.qfleet.sweep.Topology;
import org.qfleet.sweep.Trace;

/**
 * Generates sweeps by solving the lumped RLC network of a {@link ResonatorCircuit} at each
 * frequency (ABCD two-port algebra, Z0 = 50 ohm), then adding {@link Impairments}. Transmission
 * sweeps carry S21, S12, S11 and S22; notch sweeps S21 and S11; reflection sweeps S11.
 *
 * <p>Deterministic: the same seed and the same sequence of calls give the same sweeps. Not
 * thread-safe; use one simulator per thread.
 */
public final class SweepSimulator {

    /** The {@link Sweep#source()} of every simulated sweep. */
    public static final String SOURCE = "sim";

    private final SplittableRandom random;

    public SweepSimulator(long seed) {
        this.random = new SplittableRandom(seed);
    }

    public SimulatedSweep simulate(ResonatorCircuit circuit, SweepPlan plan, Impairments impairments) {
        return simulate(circuit, plan, impairments, SweepInfo.NONE);
    }

    public SimulatedSweep simulate(ResonatorCircuit circuit, SweepPlan plan, Impairments impairments, SweepInfo info) {
        Objects.requireNonNull(circuit, "circuit");
        Objects.requireNonNull(plan, "plan");
        Objects.requireNonNull(impairments, "impairments");
        Objects.requireNonNull(info, "info");
        ResonatorNetwork network = ResonatorNetwork.of(circuit);
        Truth truth = truth(circuit, network, impairments);
        double[] frequencyHz = plan.frequencies();
        List<SParameter> parameters = network.parameters();
        int n = frequencyHz.length;
        double[][] re = new double[parameters.size()][n];
        double[][] im = new double[parameters.size()][n];
        for (int i = 0; i < n; i++) {
            SMatrix s = network.at(frequencyHz[i]);
            for (int k = 0; k < parameters.size(); k++) {
                Complex value = s.get(parameters.get(k));
                re[k][i] = value.re();
                im[k][i] = value.im();
            }
        }
        ImpairmentChain chain = new ImpairmentChain(impairments, truth.noiseSigma(), plan, random);
        Map<SParameter, Trace> traces = new EnumMap<>(SParameter.class);
        for (int k = 0; k < parameters.size(); k++) {
            SParameter parameter = parameters.get(k);
            boolean transmission = parameter == SParameter.S21 || parameter == SParameter.S12;
            traces.put(parameter, chain.apply(frequencyHz, re[k], im[k], transmission));
        }
        Sweep sweep = new Sweep(SOURCE, info, circuit.topology(), frequencyHz, traces, ResonatorNetwork.Z0);
        return new SimulatedSweep(sweep, truth);
    }

    private static Truth truth(ResonatorCircuit circuit, ResonatorNetwork network, Impairments impairments) {
        double diameter = network.circleDiameter();
        boolean twoPort = circuit.topology() == Topology.TRANSMISSION;
        return new Truth(
                network.loadedF0Hz(),
                circuit.qUnloaded(),
                circuit.qLoaded(),
                circuit.qExternal(),
                circuit.coupling1(),
                twoPort ? circuit.coupling2() : 0,
                diameter,
                impairments.noiseSigma(diameter));
    }
}
