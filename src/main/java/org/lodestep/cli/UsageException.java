package org.lodestep.cli;

/**
 * A combination of options or values that parses but cannot work (for example a rate range that ends before it
 * starts); maps to exit code 2 with this message as the one line shown.
 */
public final class UsageException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public UsageException(String message) {
        super(message);
    }
}
