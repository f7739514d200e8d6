package org.qfleet.sweep;

import java.util.Optional;

/** An input that cannot become a sweep, with a stable reason code and a message saying where. */
public final class InvalidSweepException extends Exception {

    private final SweepError error;
    private final String sweepId;

    public InvalidSweepException(SweepError error, String message) {
        this(error, message, null, null);
    }

    public InvalidSweepException(SweepError error, String message, Throwable cause) {
        this(error, message, cause, null);
    }

    private InvalidSweepException(SweepError error, String message, Throwable cause, String sweepId) {
        super(message, cause);
        this.error = error;
        this.sweepId = sweepId;
    }

    public SweepError error() {
        return error;
    }

    /** The {@code sweepId} of the rejected message, when it was read before the problem was found. */
    public Optional<String> sweepId() {
        return Optional.ofNullable(sweepId);
    }

    /** The same error, naming the sweep it belongs to. */
    public InvalidSweepException withSweepId(String id) {
        InvalidSweepException copy = new InvalidSweepException(error, getMessage(), getCause(), id);
        copy.setStackTrace(getStackTrace());
        return copy;
    }
}
