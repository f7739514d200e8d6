package org.qfleet.stream;

/** What became of one sweep message: a result message, or the reason there is none. */
public sealed interface SweepOutcome {

    /** The sweep was fitted; {@code json} is the result message. */
    record Fitted(String sweepId, byte[] json) implements SweepOutcome {
    }

    /** The message could not be processed; {@code sweepId} is null when it could not be read. */
    record Failed(String code, String message, String sweepId) implements SweepOutcome {
    }
}
