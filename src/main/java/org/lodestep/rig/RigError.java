package org.lodestep.rig;

/** The error codes of {@code firmware-protocol.md}, carried in 'E' frames as {@code <code> <NAME> <text>}. */
public enum RigError {
    UNKNOWN_COMMAND(1),
    BAD_ARGUMENT(2),
    BUSY(3),
    NOT_ARMED(4),
    ARM_EXPIRED(5),
    BLOCK_GONE(6),
    OVER_LIMIT(7),
    WATCHDOG(8),
    HARDWARE(9),
    VERSION(10),
    STOPPED(11);

    private final int code;

    RigError(int code) {
        this.code = code;
    }

    public int code() {
        return code;
    }

    static RigError of(int code) {
        for (RigError e : values()) {
            if (e.code == code) {
                return e;
            }
        }
        return HARDWARE;
    }

    /** The ASCII payload of an 'E' frame. */
    String payload(String text) {
        return code + " " + name() + " " + text;
    }
}
