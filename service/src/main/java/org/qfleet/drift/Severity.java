package org.qfleet.drift;

/** How serious an alert is; it only ever rises during one episode. */
public enum Severity {
    /** One statistical rule fired: a drift, not yet a product out of its limits. */
    WARNING("warning"),
    /** A lot mean below the product's lot limit, or a station on which two or more charts fired. */
    CRITICAL("critical");

    private final String code;

    Severity(String code) {
        this.code = code;
    }

    public String code() {
        return code;
    }
}
