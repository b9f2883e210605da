package org.lodestep.workflow;

import java.util.ArrayList;
import java.util.List;

import org.lodestep.drive.Load;
import org.lodestep.drive.TorqueCurve;
import org.lodestep.rig.Dynamometer;
import org.lodestep.rig.RotorSettings;

/**
 * Use case: the virtual rig's dynamometer on this motor and drive (phase circuits with back-EMF), at rates spread
 * around the corner, beside the predicted pull-out torque.
 */
public final class DriveDynamometer {
    /** Rates measured, as multiples of the corner (the rate up to which the set current is reached). */
    static final double[] CORNER_MULTIPLES = {0.1, 0.25, 0.5, 0.75, 1.0, 1.5, 2.0, 3.0};

    private DriveDynamometer() {
    }

    /**
     * One rate.
     *
     * @param rateFullStepsPerS rate, full steps/s
     * @param predictedNm       the model's pull-out torque, N·m
     * @param simulatedNm       the dynamometer's, with the simulated rotor's own viscous torque c·ω added back, N·m;
     *                          0 when the rotor was lost with no load
     * @param lostWithoutLoad   true when the rotor slipped on the run-up or settling (resonance or instability)
     */
    public record Point(double rateFullStepsPerS, double predictedNm, double simulatedNm, boolean lostWithoutLoad) {
        /** Simulated over predicted. */
        public double ratio() {
            return predictedNm > 0 ? simulatedNm / predictedNm : Double.NaN;
        }
    }

    /** Measures the points (the load's friction and gravity are not applied: the dynamometer is the load). */
    public static List<Point> run(TorqueCurve curve, Load load, Progress progress) {
        RotorSettings rotor = DriveSimulation.rigRotor(curve, load);
        Dynamometer dyno = new Dynamometer(DriveSimulation.rigDrive(curve), rotor, curve.drive().microsteps());
        double corner = Double.isFinite(curve.fullCurrentRateFullStepsPerS()) && curve.fullCurrentRateFullStepsPerS() > 0
                ? curve.fullCurrentRateFullStepsPerS() : curve.endRateFullStepsPerS() / 8;
        List<Point> out = new ArrayList<>();
        int done = 0;
        progress.step("virtual dynamometer");
        for (double f : CORNER_MULTIPLES) {
            double rate = Math.min(f * corner, curve.endRateFullStepsPerS());
            Dynamometer.Reading r = dyno.measure(rate);
            double w = curve.motor().radPerS(rate);
            double sim = r.lostOnRunUp() ? 0 : r.pullOutTorqueNm() + rotor.dampingNmsPerRad() * w;
            out.add(new Point(rate, curve.torqueNm(rate), sim, r.lostOnRunUp()));
            progress.advanced(++done, CORNER_MULTIPLES.length);
        }
        return out;
    }
}
