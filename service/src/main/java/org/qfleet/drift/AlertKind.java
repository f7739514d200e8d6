package org.qfleet.drift;

/** What an alert blames. */
public enum AlertKind {
    /** A lot whose mean Qu fell, seen across its stations. */
    LOT("lot"),
    /** A station that drifts against the other stations measuring the same lots. */
    STATION("station");

    private final String code;

    AlertKind(String code) {
        this.code = code;
    }

    public String code() {
        return code;
    }
}
