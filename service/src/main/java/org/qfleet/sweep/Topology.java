package org.qfleet.sweep;

import java.util.Locale;
import java.util.Optional;

/** How the resonator is connected to the analyzer; decides which coupling correction applies. */
public enum Topology {
    /** Two-port, resonator in the signal path: S21 peaks at resonance. */
    TRANSMISSION,
    /** Resonator side-coupled to a through line: S21 dips at resonance. */
    NOTCH,
    /** One port: S11 traces the resonance circle. */
    REFLECTION;

    /** The name used in messages, files and options ({@code transmission}, {@code notch}, {@code reflection}). */
    public String wireName() {
        return name().toLowerCase(Locale.ROOT);
    }

    public static Optional<Topology> fromWireName(String name) {
        for (Topology t : values()) {
            if (t.wireName().equals(name)) {
                return Optional.of(t);
            }
        }
        return Optional.empty();
    }
}
