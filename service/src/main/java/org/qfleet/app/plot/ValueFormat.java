package org.qfleet.app.plot;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Locale;
import org.qfleet.sweep.FrequencyUnit;

/** Numbers for people: a value shown to the precision its uncertainty supports. */
final class ValueFormat {

    /** Digits shown when no uncertainty is known. */
    private static final int DEFAULT_SIGNIFICANT = 4;

    private ValueFormat() {
    }

    /** For example {@code 6012 ± 45}; {@code n/a} when the value is not finite. */
    static String withUncertainty(double value, double uncertainty) {
        if (!Double.isFinite(value)) {
            return "n/a";
        }
        if (!(Double.isFinite(uncertainty) && uncertainty > 0)) {
            return significant(value, DEFAULT_SIGNIFICANT);
        }
        return fixed(value, decimalsFor(uncertainty)) + " ± " + significant(uncertainty, 2);
    }

    /** For example {@code 10.4001234 GHz ± 1.2 kHz}, each part in its own unit. */
    static String frequency(double hz, double uncertaintyHz) {
        if (!Double.isFinite(hz)) {
            return "n/a";
        }
        FrequencyUnit unit = AxisUnits.forValue(hz);
        if (!(Double.isFinite(uncertaintyHz) && uncertaintyHz > 0)) {
            return significant(hz / unit.hertz(), 7) + " " + unit.symbol();
        }
        FrequencyUnit uUnit = AxisUnits.forValue(uncertaintyHz);
        return fixed(hz / unit.hertz(), decimalsFor(uncertaintyHz / unit.hertz())) + " " + unit.symbol()
                + " ± " + significant(uncertaintyHz / uUnit.hertz(), 2) + " " + uUnit.symbol();
    }

    /** Decimals that show the uncertainty's first two significant digits (never negative, at most 12). */
    private static int decimalsFor(double uncertainty) {
        int d = (int) -Math.floor(Math.log10(uncertainty)) + 1;
        return Math.max(0, Math.min(12, d));
    }

    private static String fixed(double value, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", value);
    }

    private static String significant(double value, int digits) {
        return new BigDecimal(value).round(new MathContext(digits)).stripTrailingZeros().toPlainString();
    }
}
