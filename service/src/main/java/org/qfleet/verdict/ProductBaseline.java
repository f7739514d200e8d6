package org.qfleet.verdict;

/**
 * A product's in-control figures as the plant knows them, for the drift monitors: given here they
 * are used from the first unit instead of being learned. Mean and sigma of Qu are required; f0 and
 * the insertion loss are optional (null: that chart is not kept).
 *
 * @param quMean               mean Qu of good units
 * @param quSigma              unit-to-unit standard deviation of Qu
 * @param f0MeanHz             mean resonant frequency, or null
 * @param f0SigmaHz            its standard deviation, or null
 * @param insertionLossMeanDb  mean insertion loss (transmission), or null
 * @param insertionLossSigmaDb its standard deviation, or null
 */
public record ProductBaseline(double quMean, double quSigma, Double f0MeanHz, Double f0SigmaHz,
        Double insertionLossMeanDb, Double insertionLossSigmaDb) {

    public ProductBaseline {
        if (!Double.isFinite(quMean) || !(quMean > 0) || !Double.isFinite(quSigma) || !(quSigma > 0)) {
            throw new IllegalArgumentException("baseline quMean and quSigma must be finite and above 0, got " + quMean + " and " + quSigma);
        }
        requirePair("f0MeanHz", f0MeanHz, "f0SigmaHz", f0SigmaHz);
        requirePair("insertionLossMeanDb", insertionLossMeanDb, "insertionLossSigmaDb", insertionLossSigmaDb);
    }

    private static void requirePair(String meanName, Double mean, String sigmaName, Double sigma) {
        if ((mean == null) != (sigma == null)) {
            throw new IllegalArgumentException("baseline " + meanName + " and " + sigmaName + " go together: give both or neither");
        }
        if (sigma != null && (!Double.isFinite(mean) || !Double.isFinite(sigma) || !(sigma > 0))) {
            throw new IllegalArgumentException("baseline " + sigmaName + " must be above 0 and " + meanName + " finite");
        }
    }
}
