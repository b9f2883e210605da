package org.lodestep.drive;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.lodestep.resonance.RateUnits;

class MotionPlannerTest {
    static final PhaseModel MOTOR = PhasorTorqueTest.MOTOR;
    static final Driver DRIVE = new Driver(DriveMode.CHOPPER, 24, 1.2, 16);
    static final TorqueCurve CURVE = TorqueCurves.of(MOTOR, DRIVE);
    static final Load LOAD = new Load(6e-5, 0.03, 0, 40);
    static final RateUnits UNITS = new RateUnits(16, 50, 40);
    // bands as a sweep of a belt axis would give them: f_n/2 and f_n, crossing accelerations a = span·f/N
    static final List<Band> BANDS = List.of(new Band(49, 70, 483), new Band(89, 157, 1500),
            new Band(600, 700, 0.9 * allowed(700) + 0.1 * allowed(2400)));

    /** Acceleration the torque with margin allows, computed here from the torque model: ((1−m)·T − T_L)/J. */
    static double allowed(double rate) {
        double t = 0.7 * PhasorTorque.pullOutTorqueNm(MOTOR, DRIVE, MOTOR.radPerS(rate)) - 0.03;
        return t / (MOTOR.rotorInertiaKgM2() + 6e-5) / (2 * Math.PI / 200);
    }

    record Row(double t, double v, double x) {
    }

    static List<Row> parse(String csv) {
        List<Row> rows = new ArrayList<>();
        boolean header = false;
        for (String line : csv.split("\n")) {
            if (line.startsWith("#")) {
                continue;
            }
            if (!header) {
                assertEquals(StepRateTable.HEADER, line);
                header = true;
                continue;
            }
            String[] c = line.split(",");
            assertEquals(4, c.length, line);
            double v = Double.parseDouble(c[1]);
            assertEquals(16 * v, Double.parseDouble(c[2]), 0.01, "pulses/s = 16 × full steps/s: " + line);
            rows.add(new Row(Double.parseDouble(c[0]), v, Double.parseDouble(c[3])));
        }
        return rows;
    }

    /** Every constraint checked between consecutive rows of the exported table. */
    static void checkPointByPoint(String csv, double target, List<Band> bands, double jerk) {
        List<Row> rows = parse(csv);
        assertEquals(0, rows.get(0).v(), 1e-9);
        assertEquals(0, rows.get(rows.size() - 1).v(), 2e-3);
        double peak = rows.stream().mapToDouble(Row::v).max().orElseThrow();
        assertEquals(target, peak, 1e-3 * target);
        double prevA = 0;
        double prevMid = Double.NaN;
        for (int k = 0; k + 1 < rows.size(); k++) {
            Row a = rows.get(k);
            Row b = rows.get(k + 1);
            double dt = b.t() - a.t();
            assertTrue(dt > 0, "time rises");
            double acc = (b.v() - a.v()) / dt;
            // rates are written to 0.001 full steps/s: that much slack per row
            double slack = 0.002 / dt;
            double allow = Math.min(allowed(a.v()), allowed(b.v()));
            assertTrue(Math.abs(acc) <= allow * (1 + 1e-6) + slack,
                    "torque with margin at t = " + a.t() + ": " + acc + " > " + allow);
            for (Band band : bands) {
                if (band.contains(a.v()) && band.contains(b.v())) {
                    assertTrue(Math.abs(acc) >= band.minAccelerationFullStepsPerS2() * (1 - 1e-3) - slack,
                            "band " + band + " at t = " + a.t() + ": " + acc);
                    assertTrue(Math.abs(b.v() - a.v()) > 0, "no dwelling in a band");
                }
            }
            // position is the integral of the rate (trapezoid rule over one row, error ≤ |jerk|·dt³/12 or a·dt²)
            assertEquals((a.v() + b.v()) / 2 * dt, b.x() - a.x(), 0.02 + 1e-3 * Math.abs(b.x() - a.x()));
            double mid = 0.5 * (a.t() + b.t());
            if (Double.isFinite(jerk) && !Double.isNaN(prevMid)) {
                double j = (acc - prevA) / (mid - prevMid);
                assertTrue(Math.abs(j) <= jerk * 1.001 + 2 * slack / dt, "jerk at t = " + a.t() + ": " + j);
            }
            prevA = acc;
            prevMid = mid;
        }
    }

    static ProfileSettings settings(ProfileShape shape, double target) {
        return new ProfileSettings(shape, target, 0.3, Double.POSITIVE_INFINITY, Double.NaN, 0.1, 0.0005);
    }

    @Test
    void trapezoidalProfileRespectsTorqueAndBandsRowByRow() {
        double target = 2400;
        Profile p = MotionPlanner.plan(CURVE, LOAD, BANDS, settings(ProfileShape.TRAPEZOIDAL, target));
        checkPointByPoint(p.table(UNITS).csv(), target, BANDS, Double.POSITIVE_INFINITY);
        // the torque is lowest at the target, so the base acceleration is what it allows there
        assertEquals(allowed(target), p.baseAccelerationFullStepsPerS2(), 1e-6 * allowed(target));
        BandCrossing third = p.crossings().get(2);
        assertTrue(third.raised(), "the band above the base level is crossed faster");
        assertTrue(third.accelerationFullStepsPerS2() >= BANDS.get(2).minAccelerationFullStepsPerS2() * (1 - 1e-9));
    }

    @Test
    void sCurveProfileRespectsTorqueBandsAndJerkRowByRow() {
        double target = 2400;
        Profile p = MotionPlanner.plan(CURVE, LOAD, BANDS, settings(ProfileShape.S_CURVE, target));
        checkPointByPoint(p.table(UNITS).csv(), target, BANDS, p.jerkFullStepsPerS3());
        // default jerk: the ramp from 0 to the base acceleration gains at most a tenth of the target, a²/(2j)
        double a = p.baseAccelerationFullStepsPerS2();
        assertTrue(a * a / (2 * p.jerkFullStepsPerS3()) <= 0.1 * target * (1 + 1e-9));
        assertEquals(p.rateAt(p.accelerationS() + 0.05), target, 1e-6);
    }

    @Test
    void decelerationMirrorsAcceleration() {
        Profile p = MotionPlanner.plan(CURVE, LOAD, BANDS, settings(ProfileShape.S_CURVE, 1500));
        double up = p.accelerationS();
        double end = p.durationS();
        for (double f = 0; f <= 1; f += 0.05) {
            assertEquals(p.rateAt(f * up), p.rateAt(end - f * up), 1e-6 * 1500);
        }
        assertEquals(2 * up + 0.1, end, 1e-9);
    }

    @Test
    void targetBeyondTheTorqueWithMarginIsRefusedWithTheHighestRate() {
        PlanningException e = assertThrows(PlanningException.class,
                () -> MotionPlanner.plan(CURVE, new Load(0, 0.14, 0, 40), List.of(),
                        settings(ProfileShape.TRAPEZOIDAL, 5000)));
        assertTrue(e.getMessage().contains("beyond the torque curve") && e.getMessage().contains("highest rate"),
                e.getMessage());
    }

    @Test
    void avoidListThatBlocksTheWholeRangeIsRefused() {
        PlanningException e = assertThrows(PlanningException.class, () -> MotionPlanner.plan(CURVE, LOAD,
                List.of(new Band(0, 1e6, 100)), settings(ProfileShape.TRAPEZOIDAL, 1500)));
        assertTrue(e.getMessage().contains("lies inside the avoid band"), e.getMessage());
    }

    @Test
    void bandNeedingMoreThanTheTorqueAllowsIsRefusedWithTheFigures() {
        double need = 2 * allowed(157);
        PlanningException e = assertThrows(PlanningException.class, () -> MotionPlanner.plan(CURVE, LOAD,
                List.of(new Band(89, 157, need)), settings(ProfileShape.TRAPEZOIDAL, 1500)));
        assertTrue(e.getMessage().contains("needs at least") && e.getMessage().contains("allows only"),
                e.getMessage());
    }

    @Test
    void jerkTooLowToReachABandNearStandstillIsRefused() {
        ProfileSettings s = new ProfileSettings(ProfileShape.S_CURVE, 1500, 0.3, Double.POSITIVE_INFINITY, 1e4,
                0.1, 0.001);
        PlanningException e = assertThrows(PlanningException.class,
                () -> MotionPlanner.plan(CURVE, LOAD, List.of(new Band(20, 40, 5000)), s));
        assertTrue(e.getMessage().contains("jerk limit"), e.getMessage());
    }
}
