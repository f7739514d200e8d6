package org.qfleet.app.plot;

/** The unit a frequency axis is labelled in: the largest one that keeps tick labels short. */
enum FrequencyUnit {
    GHZ("GHz", 1e9),
    MHZ("MHz", 1e6),
    KHZ("kHz", 1e3),
    HZ("Hz", 1);

    /** Tick labels with more decimals than this read badly; a smaller unit is chosen instead. */
    private static final int MAX_DECIMALS = 3;

    private final String symbol;
    private final double hertz;

    FrequencyUnit(String symbol, double hertz) {
        this.symbol = symbol;
        this.hertz = hertz;
    }

    public String symbol() {
        return symbol;
    }

    public double hertz() {
        return hertz;
    }

    /** The unit for an axis whose ticks follow {@code scale} (in hertz). */
    public static FrequencyUnit forAxis(NiceScale scale) {
        double largest = Math.max(Math.abs(scale.min()), Math.abs(scale.max()));
        for (FrequencyUnit unit : values()) {
            if (unit.hertz <= largest && scale.decimals(unit.hertz) <= MAX_DECIMALS) {
                return unit;
            }
        }
        return HZ;
    }

    /** The unit for a single frequency, e.g. in a title. */
    public static FrequencyUnit forValue(double hz) {
        for (FrequencyUnit unit : values()) {
            if (unit.hertz <= Math.abs(hz)) {
                return unit;
            }
        }
        return HZ;
    }
}
