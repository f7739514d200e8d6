package org.qfleet.drift;

/** The state an alert message announces. */
public enum AlertStatus {
    RAISED("raised"),
    CLEARED("cleared");

    private final String code;

    AlertStatus(String code) {
        this.code = code;
    }

    public String code() {
        return code;
    }
}
