package org.qfleet.sweep;

import java.util.Optional;

/** The frequency units of a Touchstone option line, each with its size in hertz. */
public enum FrequencyUnit {
    HZ("Hz", 1.0),
    KHZ("kHz", 1.0e3),
    MHZ("MHz", 1.0e6),
    GHZ("GHz", 1.0e9);

    private final String symbol;
    private final double hertz;

    FrequencyUnit(String symbol, double hertz) {
        this.symbol = symbol;
        this.hertz = hertz;
    }

    /** The unit as conventionally written ({@code Hz}, {@code kHz}, {@code MHz}, {@code GHz}). */
    public String symbol() {
        return symbol;
    }

    /** How many hertz one of this unit is. */
    public double hertz() {
        return hertz;
    }

    /** The unit for a symbol in any letter case ({@code ghz} and {@code GHZ} both give {@link #GHZ}). */
    public static Optional<FrequencyUnit> fromSymbol(String text) {
        for (FrequencyUnit unit : values()) {
            if (unit.symbol.equalsIgnoreCase(text)) {
                return Optional.of(unit);
            }
        }
        return Optional.empty();
    }
}
