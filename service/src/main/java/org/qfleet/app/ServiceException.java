package org.qfleet.app;

/** The service could not start; the message says what and why in one line. */
final class ServiceException extends Exception {

    ServiceException(String message) {
        super(message);
    }

    ServiceException(String message, Throwable cause) {
        super(message, cause);
    }
}
