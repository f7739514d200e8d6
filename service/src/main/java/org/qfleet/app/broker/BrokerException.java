package org.qfleet.app.broker;

/** The embedded broker could not be started; the message says why in one line. */
public final class BrokerException extends Exception {

    public BrokerException(String message, Throwable cause) {
        super(message, cause);
    }
}
