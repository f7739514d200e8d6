package org.qfleet.drift;

/** A rule that can raise or update an alert. */
public enum Rule {
    /** Lot mean below the X-bar limit, see {@link Baseline#xbarLowerLimit}. */
    LOT_MEAN_BELOW_XBAR_LIMIT("lot-mean-below-xbar-limit", AlertKind.LOT),
    /** Lot mean below the product's lot limit. */
    LOT_MEAN_BELOW_LOT_LIMIT("lot-mean-below-lot-limit", AlertKind.LOT),
    /** EWMA of the station's standardized Qu beyond its limit. */
    QU_EWMA("qu-ewma", AlertKind.STATION),
    /** CUSUM of the station's standardized f0 beyond h. */
    F0_CUSUM("f0-cusum", AlertKind.STATION),
    /** CUSUM of the station's standardized coupling level beyond h. */
    COUPLING_CUSUM("coupling-cusum", AlertKind.STATION),
    /** More than half of the lot's recent units excluded for their flags. */
    LOT_EXCLUDED_SHARE("lot-excluded-share", AlertKind.LOT),
    /** More than half of the station's recent units excluded for their flags. */
    STATION_EXCLUDED_SHARE("station-excluded-share", AlertKind.STATION);

    private final String code;
    private final AlertKind kind;

    Rule(String code, AlertKind kind) {
        this.code = code;
        this.kind = kind;
    }

    public String code() {
        return code;
    }

    public AlertKind kind() {
        return kind;
    }
}
