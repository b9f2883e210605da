package org.lodestep.rig;

/** The rig answered a command with an error frame; {@link #error()} says which. */
public final class RigRefusedException extends RigException {
    private static final long serialVersionUID = 1L;
    private final RigError error;

    RigRefusedException(String message, RigError error) {
        super(message);
        this.error = error;
    }

    public RigError error() {
        return error;
    }
}
