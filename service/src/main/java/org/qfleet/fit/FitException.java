package org.qfleet.fit;

/** The sweep is valid but holds no resonance the engine can fit; the message says why. */
public final class FitException extends Exception {

    public FitException(String message) {
        super(message);
    }
}
