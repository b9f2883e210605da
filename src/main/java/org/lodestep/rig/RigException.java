package org.lodestep.rig;

/** The rig could not be reached, stopped answering, or answered with an error after retries. */
public class RigException extends Exception {
    private static final long serialVersionUID = 1L;

    public RigException(String message) {
        super(message);
    }

    public RigException(String message, Throwable cause) {
        super(message, cause);
    }
}
