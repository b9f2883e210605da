package org.lodestep.drive;

import java.util.ArrayList;
import java.util.List;

/** Samples {@link PhasorTorque} into a {@link TorqueCurve}. */
public final class TorqueCurves {
    /** The curve ends where the torque has fallen to this share of its low-speed value (when it never reaches 0). */
    public static final double END_FRACTION = 0.10;
    /** Points of a curve. */
    static final int POINTS = 241;

    private TorqueCurves() {
    }

    /** The curve of {@code motor} on {@code drive}. */
    public static TorqueCurve of(PhaseModel motor, Driver drive) {
        double t0 = PhasorTorque.pullOutTorqueNm(motor, drive, 0);
        if (!(t0 > 0)) {
            throw new IllegalArgumentException("the drive gives no torque at standstill");
        }
        double zero = motor.fullStepsPerS(PhasorTorque.zeroTorqueSpeedRadPerS(motor, drive));
        double end = rateWhereTorqueFalls(motor, drive, END_FRACTION * t0);
        if (Double.isFinite(zero)) {
            end = Math.min(end, zero);
        }
        double corner = motor.fullStepsPerS(PhasorTorque.fullCurrentSpeedRadPerS(motor, drive));
        List<TorquePoint> points = new ArrayList<>(POINTS);
        double bestP = 0;
        double bestRate = 0;
        for (int k = 0; k < POINTS; k++) {
            double rate = end * k / (POINTS - 1);
            double w = motor.radPerS(rate);
            double t = PhasorTorque.pullOutTorqueNm(motor, drive, w);
            double p = t * w;
            bestP = Math.max(bestP, p);
            points.add(new TorquePoint(rate, rate / motor.fullStepsPerRev() * 60, t, p, rate <= corner));
        }
        // above the corner the power levels off (T falls as 1/ω): name where it first comes within 1 % of its peak
        for (TorquePoint p : points) {
            if (p.powerW() >= 0.99 * bestP) {
                bestRate = p.rateFullStepsPerS();
                break;
            }
        }
        return new TorqueCurve(motor, drive, PhasorTorque.holdingTorqueNm(motor, drive), t0, corner, zero, end,
                bestP, bestRate, points);
    }

    /** First rate above which the torque is at or below {@code levelNm}, full steps/s (bracket, then bisect). */
    static double rateWhereTorqueFalls(PhaseModel motor, Driver drive, double levelNm) {
        double lo = 0;
        double hi = 10;
        while (torque(motor, drive, hi) > levelNm) {
            lo = hi;
            hi *= 2;
            if (hi > 1e8) {
                return Double.POSITIVE_INFINITY; // the torque stays above the level at any rate a drive can step
            }
        }
        for (int k = 0; k < 100 && hi - lo > 1e-9 * hi; k++) {
            double mid = 0.5 * (lo + hi);
            if (torque(motor, drive, mid) > levelNm) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return hi;
    }

    private static double torque(PhaseModel m, Driver d, double rate) {
        return PhasorTorque.pullOutTorqueNm(m, d, m.radPerS(rate));
    }
}
