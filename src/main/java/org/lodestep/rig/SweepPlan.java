package org.lodestep.rig;

import org.lodestep.sample.SweepShape;

/**
 * A step-rate sweep: the rate rises (or falls) linearly from {@code fromFullStepsPerS} to {@code toFullStepsPerS}
 * over {@code seconds}, at 1/{@code microsteps} resolution, sampled at {@code sampleRateHz}.
 */
public record SweepPlan(double fromFullStepsPerS, double toFullStepsPerS, double seconds, int microsteps,
                           double sampleRateHz) {
    public SweepPlan {
        if (!(fromFullStepsPerS > 0) || !(toFullStepsPerS > 0) || !Double.isFinite(fromFullStepsPerS)
                || !Double.isFinite(toFullStepsPerS)) {
            throw new IllegalArgumentException("step rates must be positive full steps/s, got " + fromFullStepsPerS
                    + " and " + toFullStepsPerS);
        }
        if (!(seconds > 0) || !Double.isFinite(seconds)) {
            throw new IllegalArgumentException("sweep duration must be positive, got " + seconds + " s");
        }
        if (microsteps < 1 || microsteps > 256 || Integer.bitCount(microsteps) != 1) {
            throw new IllegalArgumentException("microsteps must be a power of two 1..256, got " + microsteps);
        }
        if (!(sampleRateHz > 0) || !Double.isFinite(sampleRateHz)) {
            throw new IllegalArgumentException("sample rate must be positive, got " + sampleRateHz + " Hz");
        }
    }

    /** The rig ramps the rate linearly in time (firmware-protocol.md, the sweep command). */
    public SweepShape shape() {
        return SweepShape.LINEAR;
    }
}
