package org.qfleet.verdict;

/** A product catalogue file that cannot be used; the message names the file and the problem. */
public final class InvalidCatalogueException extends Exception {

    public InvalidCatalogueException(String message) {
        super(message);
    }
}
