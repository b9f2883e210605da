package org.lodestep.report;

import java.util.List;

/** The cautions printed with every resonance command: a sweep moves the axis, a ring-down energises the motor. */
public final class ResonanceSafety {
    private ResonanceSafety() {
    }

    /** Lines of caution, one sentence each. */
    public static List<String> lines() {
        return List.of(
                "A sweep drives the axis through its whole speed range, and at a resonance it can stall, jump or"
                        + " run away: clear the travel, fit the guards, keep the emergency stop within reach.",
                "Set the drive's current limit to the motor's rating before sweeping; a stalled motor still carries"
                        + " full current and its case can get hot enough to burn.",
                "Follow your local electrical and machine-safety codes and your site's licensed practice; they take"
                        + " precedence over anything printed here.");
    }
}
