package org.qfleet.drift;

import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * One fitted unit as the drift monitors see it.
 *
 * @param product     product id
 * @param lot         lot id
 * @param station     test station id
 * @param unit        unit id; the same product, lot and unit again is a retest
 * @param measuredAt  event time, epoch milliseconds
 * @param qUnloaded   Qu, NaN when it could not be determined
 * @param f0Hz        resonant frequency, NaN when not determined
 * @param levelDb     coupling level: the insertion loss in dB (transmission), NaN when not known
 * @param flags       quality flags of the fit
 */
public record Measurement(String product, String lot, String station, String unit, long measuredAt,
        double qUnloaded, double f0Hz, double levelDb, List<String> flags) {

    /**
     * Flags that make Qu untrustworthy: such units are counted but kept out of the statistics. Not
     * {@code strong-coupling}: a strongly coupled design gives a less precise Qu, not a wrong one,
     * and excluding it would leave such a product unwatched.
     */
    public static final Set<String> UNTRUSTED_FLAGS = Set.of("poor-fit", "low-snr", "multiple-resonances");

    public Measurement {
        Objects.requireNonNull(product, "product");
        Objects.requireNonNull(lot, "lot");
        Objects.requireNonNull(station, "station");
        Objects.requireNonNull(unit, "unit");
        flags = List.copyOf(flags);
    }

    /** Whether the unit may enter the statistics: a finite Qu and f0 and no flag that spoils Qu. */
    public boolean trusted() {
        return Double.isFinite(qUnloaded) && Double.isFinite(f0Hz) && flags.stream().noneMatch(UNTRUSTED_FLAGS::contains);
    }
}
