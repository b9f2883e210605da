package org.lodestep.rig;

import org.lodestep.drive.DriveMode;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.lodestep.drive.Band;

import org.lodestep.drive.Load;
import org.lodestep.drive.MotionPlanner;
import org.lodestep.drive.PhaseModel;
import org.lodestep.drive.Profile;
import org.lodestep.drive.ProfileSettings;
import org.lodestep.drive.ProfileShape;
import org.lodestep.drive.TorqueCurve;
import org.lodestep.drive.TorqueCurves;
import org.lodestep.resonance.RateUnits;

/**
 * Planned profiles played on the driven-motor model (the gantry-axis scenario's motor and load, bipolar series, a
 * 24 V chopper at 2.5 A, 1/16 microsteps) against a naive constant-acceleration profile to the same peak rate.
 */
class ProfileRunnerTest {
    static final double JR = 8.2e-6;
    static final double JL = 5.5126e-5;
    static final double FRICTION = 0.03;
    static final PhaseModel MOTOR = new PhaseModel(DynamometerTest.R, DynamometerTest.L, DynamometerTest.K, 50, JR, 0);
    static final org.lodestep.drive.Driver DRIVE =
            new org.lodestep.drive.Driver(org.lodestep.drive.DriveMode.CHOPPER, 24, 2.5, 16);
    static final TorqueCurve CURVE = TorqueCurves.of(MOTOR, DRIVE);
    static final Load LOAD = new Load(JL, FRICTION, 0, 40);
    // the bands a sweep of this axis gives (f_n/2 and f_n of its 100 Hz natural frequency), a = span·f/5
    static final List<Band> BANDS = List.of(new Band(42, 55, 13 * 50 / 5.0), new Band(76, 147, 71 * 100 / 5.0));
    static final ProfileRunner RUNNER = new ProfileRunner(
            DriveSettings.chopper(DynamometerTest.R, DynamometerTest.L, DynamometerTest.K, 24, 2.5),
            new RotorSettings(JR + JL, DynamometerTest.C, 0, 50), 16);

    /** The exported CSV's time and rate columns. */
    static double[][] columns(String csv) {
        List<double[]> rows = new ArrayList<>();
        for (String line : csv.split("\n")) {
            if (line.startsWith("#") || line.startsWith("time_s")) {
                continue;
            }
            String[] c = line.split(",");
            rows.add(new double[] {Double.parseDouble(c[0]), Double.parseDouble(c[1])});
        }
        double[][] out = new double[2][rows.size()];
        for (int k = 0; k < rows.size(); k++) {
            out[0][k] = rows.get(k)[0];
            out[1][k] = rows.get(k)[1];
        }
        return out;
    }

    static ProfileRunner.Run play(ProfileShape shape, double target) {
        Profile p = MotionPlanner.plan(CURVE, LOAD, BANDS,
                new ProfileSettings(shape, target, 0.3, Double.POSITIVE_INFINITY, Double.NaN, 0.2, 0.001));
        double[][] t = columns(p.table(new RateUnits(16, 50, 40)).csv());
        return RUNNER.run(t[0], t[1], FRICTION, 0);
    }

    @Test
    void plannedTrapezoidAndSCurveRunThroughTheBandsWithoutLosingAStep() {
        for (ProfileShape shape : ProfileShape.values()) {
            ProfileRunner.Run r = play(shape, 3000);
            assertEquals(0, r.lostFullSteps(), shape + ": " + r);
            assertTrue(Math.abs(r.maxLagFullSteps()) < 2, shape + " lags at most half a tooth pitch: " + r);
        }
    }

    @Test
    void naiveConstantAccelerationToTheSamePeakLosesSteps() {
        // Sized on the low-speed torque without margin, as if the torque did not fall with speed.
        double target = 3000;
        double a = (CURVE.lowSpeedTorqueNm() - FRICTION) / (JR + JL) / (2 * Math.PI / 200);
        double up = target / a;
        int n = (int) Math.ceil((2 * up + 0.2) / 0.001) + 1;
        double[] t = new double[n];
        double[] v = new double[n];
        for (int k = 0; k < n; k++) {
            t[k] = Math.min(k * 0.001, 2 * up + 0.2);
            v[k] = t[k] < up ? a * t[k] : t[k] < up + 0.2 ? target : Math.max(0, target - a * (t[k] - up - 0.2));
        }
        ProfileRunner.Run r = RUNNER.run(t, v, FRICTION, 0);
        assertTrue(r.lostFullSteps() > 4, "the naive profile stalls: " + r);
    }
}
