package org.qfleet.drift;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;

/**
 * Directly generated fit values of an invented plant for the drift tests: one product with the
 * demo cavity's spread (Qu 6000 +- 1.5 %, f0 10.4 GHz +- 3 MHz, insertion loss 25 +- 1 dB), lots
 * measured round robin on a few stations, one unit a minute. Lots can be made low, stations faulty.
 */
public final class PlantValues {

    public static final String PRODUCT = "cav-test";
    public static final double QU = 6000;
    public static final double QU_SIGMA = 90;
    public static final double F0 = 10.4e9;
    public static final double F0_SIGMA = 3e6;
    public static final double LEVEL = 25;
    public static final double LEVEL_SIGMA = 1;
    public static final double LOT_LIMIT = 5700;

    private final SplittableRandom random;
    private final List<String> stations;
    private long minute;

    public PlantValues(long seed, int stationCount) {
        this.random = new SplittableRandom(seed);
        this.stations = new ArrayList<>();
        for (int s = 1; s <= stationCount; s++) {
            stations.add(String.format(Locale.ROOT, "st-%02d", s));
        }
    }

    public static Baseline baseline() {
        return new Baseline(PRODUCT, QU, QU_SIGMA, F0, F0_SIGMA, LEVEL, LEVEL_SIGMA, LOT_LIMIT, Baseline.CONFIGURED, 0);
    }

    public static DriftSettings settings() {
        return DriftSettings.DEFAULT.withBaselines(java.util.Map.of(PRODUCT, baseline()));
    }

    /** A lot of {@code size} units with its Qu scaled by {@code quFactor}; {@code faulty} reads f0 and coupling off. */
    public List<Measurement> lot(String lot, int size, double quFactor, String faulty, Fault fault) {
        List<Measurement> units = new ArrayList<>();
        for (int i = 0; i < size; i++) {
            String station = stations.get(i % stations.size());
            boolean bad = station.equals(faulty);
            double qu = QU * quFactor + QU_SIGMA * random.nextGaussian() + (bad ? fault.quShift() : 0);
            double f0 = F0 + F0_SIGMA * random.nextGaussian() + (bad ? fault.f0ShiftHz() : 0);
            double level = LEVEL + LEVEL_SIGMA * random.nextGaussian() + (bad ? fault.levelShiftDb() : 0);
            units.add(new Measurement(PRODUCT, lot, station, String.format(Locale.ROOT, "%s-%04d", lot, i + 1),
                    60_000 * minute++, qu, f0, level, List.of()));
        }
        return units;
    }

    public List<Measurement> lot(String lot, int size, double quFactor) {
        return lot(lot, size, quFactor, null, Fault.NONE);
    }

    /** Lets {@code minutes} of event time pass without units. */
    public void pause(long minutes) {
        minute += minutes;
    }

    /** A station fault: shifts of what the station reads. */
    public record Fault(double quShift, double f0ShiftHz, double levelShiftDb) {
        public static final Fault NONE = new Fault(0, 0, 0);
        /** A connector working loose: 1.5 dB more insertion loss, f0 pulled by -150 ppm (invented). */
        public static final Fault LOOSE_CONNECTOR = new Fault(0, -1.56e6, 1.5);
    }
}
