package org.qfleet.app.plot;

import org.qfleet.sweep.FrequencyUnit;

/** Chooses the frequency unit of an axis or a label: the largest one that keeps the numbers short. */
final class AxisUnits {

    /** Tick labels with more decimals than this read badly; a smaller unit is chosen instead. */
    private static final int MAX_DECIMALS = 3;
    private static final FrequencyUnit[] LARGEST_FIRST = {FrequencyUnit.GHZ, FrequencyUnit.MHZ, FrequencyUnit.KHZ, FrequencyUnit.HZ};

    private AxisUnits() {
    }

    /** The unit for an axis whose ticks follow {@code scale} (in hertz). */
    static FrequencyUnit forAxis(NiceScale scale) {
        double largest = Math.max(Math.abs(scale.min()), Math.abs(scale.max()));
        for (FrequencyUnit unit : LARGEST_FIRST) {
            if (unit.hertz() <= largest && scale.decimals(unit.hertz()) <= MAX_DECIMALS) {
                return unit;
            }
        }
        return FrequencyUnit.HZ;
    }

    /** The unit for a single frequency, e.g. in a title. */
    static FrequencyUnit forValue(double hz) {
        for (FrequencyUnit unit : LARGEST_FIRST) {
            if (unit.hertz() <= Math.abs(hz)) {
                return unit;
            }
        }
        return FrequencyUnit.HZ;
    }
}
