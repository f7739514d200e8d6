package org.qfleet.sweep;

/** An input that cannot become a sweep, with a stable reason code and a message saying where. */
public final class InvalidSweepException extends Exception {

    private final SweepError error;

    public InvalidSweepException(SweepError error, String message) {
        super(message);
        this.error = error;
    }

    public InvalidSweepException(SweepError error, String message, Throwable cause) {
        super(message, cause);
        this.error = error;
    }

    public SweepError error() {
        return error;
    }
}
