package org.qfleet.fit;

import java.util.Locale;

/** Which coupling correction turned QL into Qu. */
public enum CouplingRoute {
    /** Two ports, equal coupling assumed: Qu = QL / (1 - |S21(f0)|). */
    TRANSMISSION_SYMMETRIC,
    /** Two ports, couplings from the S11 and S22 circle diameters: Qu = 2 QL / (2 - D11 - D22). */
    TRANSMISSION_PORTS,
    /** Side-coupled notch, diameter correction for asymmetric dips: 1/Qu = 1/QL - Re(1/Qc). */
    NOTCH,
    /** One port: beta = D / (2 - D), Qu = QL (1 + beta). */
    REFLECTION;

    public String code() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }
}
