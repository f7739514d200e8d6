package org.qfleet.app;

/** A setting of the service that cannot be used; the message names the setting and where it came from. */
final class ConfigException extends Exception {

    ConfigException(String message) {
        super(message);
    }
}
