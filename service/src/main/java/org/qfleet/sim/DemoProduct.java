package org.qfleet.sim;

/**
 * A product of the invented demo plant and its unit-to-unit spread. Units draw f0, Qu, insertion
 * loss and coupling ratio from normal distributions cut off at three sigma; every number here is
 * made up for the demo.
 *
 * @param id                     product id carried in sweep messages
 * @param description            what the product is, for people
 * @param lotCode                short code that starts the product's lot ids
 * @param f0Hz                   nominal resonant frequency, also the centre of every sweep
 * @param f0SigmaHz              unit-to-unit standard deviation of f0
 * @param qUnloaded              nominal unloaded Q
 * @param qUnloadedSigmaFraction unit-to-unit standard deviation of Qu as a fraction of it
 * @param insertionLossDb        nominal -20 log10 |S21(f0)| of the test fixture
 * @param insertionLossSigmaDb   unit-to-unit standard deviation of the insertion loss
 * @param couplingRatioSigma     standard deviation of ln(beta1 / beta2): 0 for perfectly symmetric coupling
 * @param spanHz                 width of every sweep
 * @param points                 points per sweep
 */
public record DemoProduct(
        String id,
        String description,
        String lotCode,
        double f0Hz,
        double f0SigmaHz,
        double qUnloaded,
        double qUnloadedSigmaFraction,
        double insertionLossDb,
        double insertionLossSigmaDb,
        double couplingRatioSigma,
        double spanHz,
        int points) {

    /** Silver-plated aluminium cavity near 10.4 GHz, Qu around 6000. */
    public static final DemoProduct CAVITY_X104 = new DemoProduct(
            "cav-x104", "silver-plated aluminium cavity, 10.4 GHz", "X104",
            10.4e9, 3e6, 6000, 0.015, 25, 1.0, 0.10, 30e6, 401);

    /** Ceramic coaxial resonator near 3.6 GHz, Qu around 900. */
    public static final DemoProduct COAX_S36 = new DemoProduct(
            "coax-s36", "ceramic coaxial resonator, 3.6 GHz", "S36",
            3.6e9, 2e6, 900, 0.015, 25, 1.0, 0.10, 32e6, 401);

    /** The sweep every station runs for this product. */
    public SweepPlan sweepPlan() {
        return SweepPlan.centred(f0Hz, spanHz, points);
    }
}
