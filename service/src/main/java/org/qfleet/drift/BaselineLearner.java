package org.qfleet.drift;

import java.util.ArrayList;
import java.util.List;

/**
 * Learns a product's baseline from its first accepted units, wherever they were measured: mean
 * and standard deviation of Qu, f0 and the coupling level after rejecting outliers far from the
 * median ({@link RobustStats#clipped}), robust to the odd bad unit among them.
 * Immutable: {@link #plus} returns the next state.
 *
 * @param product   product id
 * @param target    units to learn from (default 200)
 * @param qu        Qu of the units so far
 * @param f0        f0 of the units so far
 * @param level     coupling levels of the units so far (NaN where unknown)
 *
 * <p>Learned sigmas have floors: 0.5 % of Qu, 2 ppm of f0 and 0.05 dB of coupling level. Units
 * made alike enough to scatter less than that would otherwise make every small difference between
 * stations' fixtures and cables a many-sigma "shift"; deviations below the floors are not worth a
 * fixture alert (common practice: alert on practically significant changes).
 */
public record BaselineLearner(String product, int target, List<Double> qu, List<Double> f0, List<Double> level) {

    public BaselineLearner {
        qu = List.copyOf(qu);
        f0 = List.copyOf(f0);
        level = List.copyOf(level);
    }

    static final double QU_SIGMA_FLOOR = 0.005;
    static final double F0_SIGMA_FLOOR = 2e-6;
    static final double LEVEL_SIGMA_FLOOR_DB = 0.05;

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
        double[] q = RobustStats.clipped(array(qu));
        double[] f = RobustStats.clipped(array(f0));
        double[] l = levelKnown ? RobustStats.clipped(levels) : new double[] {Double.NaN, Double.NaN};
        return new Baseline(product, q[0], Math.max(q[1], QU_SIGMA_FLOOR * q[0]), f[0], Math.max(f[1], F0_SIGMA_FLOOR * f[0]),
                l[0], Double.isNaN(l[1]) ? l[1] : Math.max(l[1], LEVEL_SIGMA_FLOOR_DB),
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
