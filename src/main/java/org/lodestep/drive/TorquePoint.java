package org.lodestep.drive;

/**
 * One point of a torque curve.
 *
 * @param rateFullStepsPerS full-step rate, full steps/s
 * @param speedRpm          shaft speed, rpm
 * @param pullOutTorqueNm   pull-out torque, N·m
 * @param powerW            mechanical power at pull-out, W
 * @param currentLimited    true where the drive still holds its set current
 */
public record TorquePoint(double rateFullStepsPerS, double speedRpm, double pullOutTorqueNm, double powerW,
                          boolean currentLimited) {
    public TorquePoint {
        Require.nonNegative(rateFullStepsPerS, "rate", "full steps/s");
        Require.nonNegative(pullOutTorqueNm, "pull-out torque", "N·m");
    }
}
