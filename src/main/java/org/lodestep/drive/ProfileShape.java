package org.lodestep.drive;

/** The shape of the acceleration of a motion profile. */
public enum ProfileShape {
    /** Acceleration switches between constant levels (infinite jerk): rate rises in straight lines. */
    TRAPEZOIDAL,
    /** Acceleration changes at no more than the jerk limit: rate rises in S-shaped curves. */
    S_CURVE
}
