package org.qfleet.app.http;

/** The HTTP endpoints could not start; the message says why in one line. */
public final class HttpStartException extends Exception {

    public HttpStartException(String message, Throwable cause) {
        super(message, cause);
    }
}
