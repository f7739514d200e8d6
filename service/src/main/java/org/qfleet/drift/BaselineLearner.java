package org.qfleet.drift;

import java.util.ArrayList;
import java.util.List;

/**
 * Learns a product's baseline from its first accepted units, wherever they were measured: median
 * and MAD x 1.4826 of Qu, f0 and the coupling level, robust to the odd bad unit among them.
 * Immutable: {@link #plus} returns the next state.
 *
 * @param product   product id
 * @param target    units to learn from (default 200)
 * @param qu        Qu of the units so far
 * @param f0        f0 of the units so far
 * @param level     coupling levels of the units so far (NaN where unknown)
 */
public record BaselineLearner(String product, int target, List<Double> qu, List<Double> f0, List<Double> level) {

    public BaselineLearner {
        qu = List.copyOf(qu);
        f0 = List.copyOf(f0);
        level = List.copyOf(level);
    }

    public static BaselineLearner start(String product, int target) {
        return new BaselineLearner(product, target, List.of(), List.of(), List.of());
    }

    public BaselineLearner plus(Measurement m) {
        return new BaselineLearner(product, target, append(qu, m.qUnloaded()), append(f0, m.f0Hz()), append(level, m.levelDb()));
    }

    public boolean complete() {
        return qu.size() >= target;
    }

    /** The learned baseline; call once {@link #complete()}. */
    public Baseline baseline(double lotLimit) {
        double[] levels = level.stream().filter(Double::isFinite).mapToDouble(Double::doubleValue).toArray();
        boolean levelKnown = levels.length >= target / 2;
        double quSigma = RobustStats.madSigma(array(qu));
        return new Baseline(product, RobustStats.median(array(qu)), quSigma > 0 ? quSigma : Double.MIN_NORMAL,
                RobustStats.median(array(f0)), RobustStats.madSigma(array(f0)),
                levelKnown ? RobustStats.median(levels) : Double.NaN, levelKnown ? RobustStats.madSigma(levels) : Double.NaN,
                lotLimit, Baseline.LEARNED, qu.size());
    }

    private static List<Double> append(List<Double> list, double value) {
        List<Double> next = new ArrayList<>(list.size() + 1);
        next.addAll(list);
        next.add(value);
        return next;
    }

    private static double[] array(List<Double> values) {
        return values.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
