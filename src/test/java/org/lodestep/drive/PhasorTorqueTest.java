package org.lodestep.drive;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class PhasorTorqueTest {
    // A 1.8° motor in bipolar series, invented but typical of a 42 mm frame.
    static final PhaseModel MOTOR = new PhaseModel(2.4, 8.0e-3, 0.18, 50, 5.4e-6, 0.01);

    @Test
    void lowSpeedTorqueOfSineCosineMicrosteppingIsKtTimesCurrent() {
        Driver d = new Driver(DriveMode.CHOPPER, 24, 1.2, 16);
        // Two-phase machine, sinusoidal back-EMF, quadrature currents of peak I: T = Kt·I (power balance e·i = T·ω;
        // Acarnley, Stepping Motors, 4th ed., hybrid-motor model, from memory).
        assertEquals(0.18 * 1.2, PhasorTorque.pullOutTorqueNm(MOTOR, d, 1e-6), 1e-9);
        assertEquals(0.18 * 1.2, PhasorTorque.holdingTorqueNm(MOTOR, d), 1e-12);
    }

    @Test
    void fullStepHoldingTorqueIsRootTwoKtTimesCurrentWithTwoPhasesOn() {
        Driver d = new Driver(DriveMode.CHOPPER, 24, 1.2, 1);
        // Two phases on: the static torque curves of both phases, 90° electrical apart, add to √2·Kt·I at their
        // peak (Acarnley, ch. on static torque, two-phase-on excitation; from memory).
        assertEquals(Math.sqrt(2) * 0.18 * 1.2, PhasorTorque.holdingTorqueNm(MOTOR, d), 1e-12);
    }

    @Test
    void fullStepRunningTorqueAtLowSpeedIsTheSquareWaveFundamental() {
        Driver d = new Driver(DriveMode.CHOPPER, 24, 1.2, 1);
        // A square wave of amplitude I has a fundamental of (4/π)·I (Fourier series of a square wave, any
        // signals text); the harmonics give ripple but no mean torque at constant speed. Same figure by direct
        // averaging: √2·Kt·I·sin(45°)/(π/4) = (4/π)·Kt·I over each 90° step.
        double expected = 4 / Math.PI * 0.18 * 1.2;
        assertEquals(expected, PhasorTorque.pullOutTorqueNm(MOTOR, d, 1e-6), 1e-9);
        assertEquals(Math.sqrt(2) * Math.sin(Math.PI / 4) / (Math.PI / 4) * 0.18 * 1.2, expected, 1e-12);
    }

    @Test
    void constantVoltageDriveAtStandstillGivesOhmsLawCurrent() {
        Driver d = new Driver(DriveMode.CONSTANT_VOLTAGE, 4.8, Double.NaN, 16);
        // Ohm's law: I = V/R = 2 A at standstill, T = Kt·I.
        assertEquals(0.18 * 4.8 / 2.4, PhasorTorque.pullOutTorqueNm(MOTOR, d, 0), 1e-12);
    }

    @Test
    void aboveTheCornerTheTorqueIsTheClosedFormVoltageLimitedPullOut() {
        Driver d = new Driver(DriveMode.CHOPPER, 24, 1.2, 16);
        double corner = PhasorTorque.fullCurrentSpeedRadPerS(MOTOR, d);
        for (double w = 1.5 * corner; w < 40 * corner; w *= 1.7) {
            double r = 2.4;
            double x = 50 * w * 8.0e-3;
            double z = Math.hypot(r, x);
            double e = 0.18 * w;
            // Constant-voltage pull-out of a synchronous machine, load angle = impedance angle:
            // T = (Ke/|Z|)·(V − Ke·ω·R/|Z|) (derived from T = Re(E·I*)/ω; Acarnley, steady-state characteristics,
            // from memory).
            double expected = 0.18 / z * (24 - e * r / z);
            assertEquals(expected, PhasorTorque.pullOutTorqueNm(MOTOR, d, w), 1e-9 * expected + 1e-12);
            // the voltage-limited current V/|Z| and its in-phase share: torque/Kt cannot exceed |I| = |V − E|/|Z|
            assertTrue(PhasorTorque.pullOutTorqueNm(MOTOR, d, w) / 0.18 <= (24 + e) / z);
        }
    }

    @Test
    void atHighSpeedTorqueFallsAsOneOverSpeedTowardsTheVoltageLimit() {
        Driver d = new Driver(DriveMode.CHOPPER, 24, 1.2, 16);
        // For X >> R: T ≈ Ke·V/(N_r·L·ω) − Ke²·R/(N_r²·L²·ω): the power T·ω tends to a constant (derived from the
        // closed form above).
        double limitPowerW = 0.18 * 24 / (50 * 8.0e-3) - 0.18 * 0.18 * 2.4 / (50 * 50 * 8.0e-3 * 8.0e-3);
        double w = 5000;
        assertEquals(limitPowerW, PhasorTorque.pullOutTorqueNm(MOTOR, d, w) * w, 0.01 * limitPowerW);
    }

    @Test
    void agreesWithBruteForceSearchOverLoadAngleAndCurrent() {
        // Independent oracle: search every current phasor inside both limits on a fine polar grid and keep the
        // largest in-phase component (T = Kt·Re(I) with E real); circuit V = (R + jX)·I + E.
        for (int micro : new int[] {1, 16}) {
            Driver d = new Driver(DriveMode.CHOPPER, 24, 1.2, micro);
            double ic = PhasorTorque.currentLimitA(d);
            double vf = PhasorTorque.voltageLimitV(d);
            for (double w : new double[] {10, 60, 120, 200, 400, 1000}) {
                double r = 2.4;
                double x = 50 * w * 8.0e-3;
                double e = 0.18 * w;
                double best = 0;
                for (int a = 0; a <= 20000; a++) {
                    double ang = -Math.PI / 2 + Math.PI * a / 20000;
                    // I = t·(cos, sin); |t·u·Z + E|² <= V² is a quadratic in t: keep its roots inside [0, I_f]
                    double wr = r * Math.cos(ang) - x * Math.sin(ang);
                    double wi = x * Math.cos(ang) + r * Math.sin(ang);
                    double qa = wr * wr + wi * wi;
                    double qb = 2 * wr * e;
                    double qc = e * e - vf * vf;
                    double disc = qb * qb - 4 * qa * qc;
                    if (disc < 0) {
                        continue;
                    }
                    double t1 = (-qb - Math.sqrt(disc)) / (2 * qa);
                    double t2 = Math.min(ic, (-qb + Math.sqrt(disc)) / (2 * qa));
                    if (t2 < Math.max(0, t1)) {
                        continue;
                    }
                    best = Math.max(best, 0.18 * t2 * Math.cos(ang));
                }
                assertEquals(best, PhasorTorque.pullOutTorqueNm(MOTOR, d, w), 2e-3 * best + 1e-9,
                        "microsteps " + micro + ", " + w + " rad/s");
            }
        }
    }

    @Test
    void cornerSpeedIsWhereTheSupplyJustDrivesTheSetCurrent() {
        Driver d = new Driver(DriveMode.CHOPPER, 24, 1.2, 16);
        double w = PhasorTorque.fullCurrentSpeedRadPerS(MOTOR, d);
        // |I·(R + jX) + E| = V at the corner, with I in phase with E.
        double vr = 1.2 * 2.4 + 0.18 * w;
        double vi = 1.2 * 50 * w * 8.0e-3;
        assertEquals(24, Math.hypot(vr, vi), 1e-9);
        assertEquals(0.18 * 1.2, PhasorTorque.pullOutTorqueNm(MOTOR, d, 0.999 * w), 1e-9);
        assertTrue(PhasorTorque.pullOutTorqueNm(MOTOR, d, 1.01 * w) < 0.18 * 1.2);
    }

    @Test
    void supplyBelowIRMeansTheSetCurrentIsNeverReached() {
        Driver d = new Driver(DriveMode.CHOPPER, 2.0, 1.2, 16);
        assertEquals(0, PhasorTorque.fullCurrentSpeedRadPerS(MOTOR, d));
        assertEquals(0.18 * 2.0 / 2.4, PhasorTorque.pullOutTorqueNm(MOTOR, d, 0), 1e-12);
    }

    @Test
    void zeroTorqueSpeedIsFiniteOnlyWhenBackEmfOutrunsTheSupply() {
        // A low-inductance, high-Ke winding on a low supply: Ke·R > V·N_r·L.
        PhaseModel m = new PhaseModel(10, 1e-4, 0.3, 50, 5e-6, 0);
        Driver d = new Driver(DriveMode.CONSTANT_VOLTAGE, 6, Double.NaN, 16);
        double w0 = PhasorTorque.zeroTorqueSpeedRadPerS(m, d);
        assertTrue(Double.isFinite(w0));
        // closed form ω0 = V·R/sqrt(Ke²R² − V²N_r²L²) (set the constant-voltage pull-out to zero)
        assertEquals(6 * 10 / Math.sqrt(0.09 * 100 - 36 * 25e-6), w0, 1e-9 * w0);
        assertTrue(PhasorTorque.pullOutTorqueNm(m, d, 0.99 * w0) > 0);
        assertEquals(0, PhasorTorque.pullOutTorqueNm(m, d, 1.01 * w0));
        assertEquals(Double.POSITIVE_INFINITY, PhasorTorque.zeroTorqueSpeedRadPerS(MOTOR,
                new Driver(DriveMode.CHOPPER, 24, 1.2, 16)));
    }

    @Test
    void workedExampleOfReferenceMotorConstants() {
        // Motor constants check values: Ke = 0.159155 V·s/rad (5.00 V peak at 300 rpm) gives Kt = 0.159155 N·m/A,
        // and 2.0 A peak in quadrature gives T = 0.318310 N·m (SI energy balance e·i = T·ω).
        PhaseModel m = new PhaseModel(1.0, 2e-3, 5.0 / (300 * 2 * Math.PI / 60), 50, 5e-6, 0);
        Driver d = new Driver(DriveMode.CHOPPER, 48, 2.0, 8);
        assertEquals(0.318310, PhasorTorque.pullOutTorqueNm(m, d, 1e-9), 1e-6);
    }
}
