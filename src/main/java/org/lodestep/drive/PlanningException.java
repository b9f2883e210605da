package org.lodestep.drive;

/**
 * No profile meets the constraints (the torque with margin cannot reach the target, or cannot cross a band fast
 * enough, or the target lies in a band). A finding about the axis, not bad input; the message says why and what to
 * change.
 */
public final class PlanningException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public PlanningException(String message) {
        super(message);
    }
}
