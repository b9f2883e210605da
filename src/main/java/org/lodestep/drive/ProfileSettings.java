package org.lodestep.drive;

/**
 * What to plan.
 *
 * @param shape              trapezoidal or S-curve
 * @param targetFullStepsPerS cruise rate, full steps/s
 * @param margin             torque margin kept at every speed (common practice 0.3 to 0.5)
 * @param maxAccelerationFullStepsPerS2 an upper limit of the user's, full steps/s²; +inf for the torque's own
 * @param jerkFullStepsPerS3 jerk limit of an S-curve, full steps/s³; NaN for the default (the ramp from 0 to the
 *                           base acceleration gains a tenth of the target rate, or more where a band needs
 *                           it); ignored for trapezoidal
 * @param cruiseS            time at the cruise rate between acceleration and deceleration, s
 * @param tableStepS         time step of the exported step-rate table, s
 */
public record ProfileSettings(ProfileShape shape, double targetFullStepsPerS, double margin,
                              double maxAccelerationFullStepsPerS2, double jerkFullStepsPerS3, double cruiseS,
                              double tableStepS) {
    /** Default table step, 1 ms. */
    public static final double DEFAULT_TABLE_STEP_S = 0.001;

    public ProfileSettings {
        java.util.Objects.requireNonNull(shape, "shape");
        Require.positive(targetFullStepsPerS, "target rate", "full steps/s");
        Margin.check(margin);
        if (!(maxAccelerationFullStepsPerS2 > 0)) {
            throw new IllegalArgumentException("acceleration limit must be positive, got "
                    + maxAccelerationFullStepsPerS2 + " full steps/s²");
        }
        if (!Double.isNaN(jerkFullStepsPerS3)) {
            Require.positive(jerkFullStepsPerS3, "jerk limit", "full steps/s³");
        }
        Require.nonNegative(cruiseS, "cruise time", "s");
        Require.positive(tableStepS, "table step", "s");
        if (tableStepS > 0.1) {
            throw new IllegalArgumentException("table step must be at most 0.1 s, got " + tableStepS + " s");
        }
    }
}
