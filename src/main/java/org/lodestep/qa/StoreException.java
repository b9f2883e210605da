package org.lodestep.qa;

/** The QA record store could not be opened, migrated, read or written. */
public class StoreException extends Exception {
    private static final long serialVersionUID = 1L;

    public StoreException(String message) {
        super(message);
    }

    public StoreException(String message, Throwable cause) {
        super(message, cause);
    }
}
