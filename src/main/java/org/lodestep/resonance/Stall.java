package org.lodestep.resonance;

import java.util.Objects;

/**
 * Whether the rotor lost synchronism with the step command during a sweep, and where.
 *
 * @param lostSynchronism            true when some stretch of the sweep did not follow the command
 * @param firstSlipFullStepsPerS     commanded rate where the first slip began, full steps/s (NaN when not lost)
 * @param relockFullStepsPerS        rate from which the rotor followed the command again to the end of the sweep,
 *                                   full steps/s (NaN when not lost, or when it never re-locked)
 * @param stepsLost                  full steps lost, when the evidence allows a count; NaN otherwise
 * @param lowestSynchronousShare     the smallest share of the response's power that followed the step command in a
 *                                   window, 0 ... 1 (near 1 when locked)
 * @param evidence                   which channel and measure the verdict rests on, one line
 */
public record Stall(boolean lostSynchronism, double firstSlipFullStepsPerS, double relockFullStepsPerS,
                    double stepsLost, double lowestSynchronousShare, String evidence) {
    public Stall {
        Objects.requireNonNull(evidence, "evidence");
        if (lostSynchronism) {
            Require.positive(firstSlipFullStepsPerS, "first-slip rate", "full steps/s");
        } else if (!Double.isNaN(firstSlipFullStepsPerS) || !Double.isNaN(relockFullStepsPerS)) {
            throw new IllegalArgumentException("slip and re-lock rates are NaN when synchronism was kept");
        }
        if (!Double.isNaN(relockFullStepsPerS)) {
            Require.positive(relockFullStepsPerS, "re-lock rate", "full steps/s");
        }
        if (!(Double.isNaN(lowestSynchronousShare) || lowestSynchronousShare >= 0 && lowestSynchronousShare <= 1)) {
            throw new IllegalArgumentException("synchronous share must be 0 ... 1, got " + lowestSynchronousShare);
        }
    }

    /** No verdict: the analysis had no windows to judge (too short, or no step phase). */
    static Stall notJudged(String why) {
        return new Stall(false, Double.NaN, Double.NaN, Double.NaN, Double.NaN, why);
    }

    /** What a commissioning engineer should do about it, one paragraph; empty when synchronism was kept. */
    public String advice() {
        if (!lostSynchronism) {
            return "";
        }
        return "The rotor stopped following the step command: the axis lost position. Do not run through this"
                + " range open loop; re-home after such a move. Keep below the first-slip rate, or cross the range"
                + " faster than the rotor can respond, add damping, reduce the load inertia, or run finer"
                + " microsteps; check the drive's current setting and supply.";
    }
}
