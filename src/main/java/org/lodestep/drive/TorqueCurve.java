package org.lodestep.drive;

import java.util.List;

/**
 * The pull-out torque of one motor on one drive from standstill until it has fallen away.
 *
 * @param motor                       the motor constants used
 * @param drive                       the driver and supply used
 * @param holdingTorqueNm             static holding torque at the set current, N·m
 * @param lowSpeedTorqueNm            running pull-out torque as the speed tends to zero, N·m
 * @param fullCurrentRateFullStepsPerS rate up to which the set current is reached, full steps/s (+inf for a
 *                                    constant-voltage drive)
 * @param zeroTorqueRateFullStepsPerS rate where the model's torque reaches zero, full steps/s; +inf when it only
 *                                    tends to zero
 * @param endRateFullStepsPerS        last rate of the curve: the zero-torque rate, or where the torque has fallen
 *                                    to {@link TorqueCurves#END_FRACTION} of its low-speed value
 * @param maxPowerW                   highest mechanical power along the curve, W
 * @param maxPowerRateFullStepsPerS   lowest rate at which the power comes within 1 % of that peak, full steps/s
 * @param points                      the curve, by rising rate, first point at standstill
 */
public record TorqueCurve(PhaseModel motor, Driver drive, double holdingTorqueNm, double lowSpeedTorqueNm,
                          double fullCurrentRateFullStepsPerS, double zeroTorqueRateFullStepsPerS,
                          double endRateFullStepsPerS, double maxPowerW, double maxPowerRateFullStepsPerS,
                          List<TorquePoint> points) {
    public TorqueCurve {
        points = List.copyOf(points);
        if (points.size() < 2) {
            throw new IllegalArgumentException("a torque curve needs at least two points, got " + points.size());
        }
    }

    /** Pull-out torque at a rate, N·m, from the model itself (not interpolated). */
    public double torqueNm(double rateFullStepsPerS) {
        return PhasorTorque.pullOutTorqueNm(motor, drive, motor.radPerS(rateFullStepsPerS));
    }
}
