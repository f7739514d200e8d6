package org.qfleet.drift;

/** The value a unit holds in its lot's statistics, kept so that a retest can replace it. */
public record UnitValue(String station, double qUnloaded, double f0Hz, double levelDb) {

    public static UnitValue of(Measurement m) {
        return new UnitValue(m.station(), m.qUnloaded(), m.f0Hz(), m.levelDb());
    }
}
