package org.qfleet.app;

import java.util.concurrent.ExecutionException;

/** A {@code bench} run that cannot go on; the message says what and why. */
final class BenchException extends Exception {

    BenchException(String message) {
        super(message);
    }

    BenchException(String message, Throwable cause) {
        super(message, cause);
    }

    /** The most telling message of a failure from a Kafka client. */
    static String reason(Throwable e) {
        Throwable t = e instanceof ExecutionException && e.getCause() != null ? e.getCause() : e;
        if (t instanceof java.util.concurrent.TimeoutException) {
            return "no answer in time";
        }
        String message = t.getMessage();
        return message == null ? t.getClass().getSimpleName() : message;
    }
}
