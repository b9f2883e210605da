package org.lodestep.rig;

import org.lodestep.drive.DriveMode;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The coupled phase-circuit and rotor model, integrated by its own RK4 at the steps stated in each test. */
class DrivenMotorTest {
    private static final RotorSettings ROTOR = new RotorSettings(5.4e-6, 0, 0, 50);

    @Test
    void constantVoltageCurrentRisesAsTheRlStepResponseWhileTheRotorIsHeld() {
        // Alexander & Sadiku, Fundamentals of Electric Circuits, first-order circuits: i(t) = V/R·(1 − e^(−t/τ)),
        // τ = L/R; V = 2 V, R = 2 Ω, L = 4 mH -> τ = 2 ms, i(τ) = 0.632121 A, i(2τ) = 0.864665 A.
        // Phase A alone holds the rotor at θ = 0, where its torque and back-EMF are zero, so the circuit is pure RL.
        DrivenMotor m = new DrivenMotor(DriveSettings.constantVoltage(2.0, 0.004, 0.1, 2.0), ROTOR, 0);
        double dt = 1e-6;
        for (int i = 0; i < 2000; i++) {
            m.step(dt, 1, 0, 0);
        }
        assertEquals(0.632121, m.currentA(0), 1e-5);
        for (int i = 0; i < 2000; i++) {
            m.step(dt, 1, 0, 0);
        }
        assertEquals(0.864665, m.currentA(0), 1e-5);
        assertEquals(0, m.angleRad(), 1e-12);
    }

    @Test
    void workDoneOnTheShaftEqualsStoredEnergyPlusCopperLossWithShortedWindings() {
        // Power balance e·i = T·ω (K_e = K_t in SI units): a load torque spins the rotor against windings shorted by
        // the bridge (0 V); the work ∫T·ω dt must equal ½Jω² + ½L·Σi² + ∫R·Σi² dt. Trapezoid sums at dt = 1 µs.
        DriveSettings d = DriveSettings.constantVoltage(1.5, 0.003, 0.1, 12);
        DrivenMotor m = new DrivenMotor(d, new RotorSettings(1e-5, 0, 0, 50), 0);
        double dt = 1e-6;
        double load = 0.01;
        double work = 0;
        double loss = 0;
        double prevW = 0;
        double prevLoss = 0;
        for (int i = 0; i < 200_000; i++) {
            m.step(dt, 0, 0, load);
            double p = d.phaseResistanceOhm() * (sq(m.currentA(0)) + sq(m.currentA(1)));
            work += 0.5 * dt * load * (prevW + m.speedRadPerS());
            loss += 0.5 * dt * (prevLoss + p);
            prevW = m.speedRadPerS();
            prevLoss = p;
        }
        double stored = 0.5 * 1e-5 * sq(m.speedRadPerS())
                + 0.5 * d.phaseInductanceH() * (sq(m.currentA(0)) + sq(m.currentA(1)));
        assertTrue(m.speedRadPerS() > 1, "the load must spin the rotor up, got " + m.speedRadPerS());
        assertTrue(loss > 0.05 * work, "the shorted windings must brake noticeably: loss " + loss + " J of " + work + " J, speed " + m.speedRadPerS());
        assertEquals(work, stored + loss, work * 1e-4);
    }

    @Test
    void chopperHeldRotorRingsAtTheLinearisedFrequencyIncludingDetentStiffness() {
        // Linearising J·θ'' = −√2·K·I·sin(N_r·δ) + T_d·sin(4·N_r·θ) about the two-phase-on position N_r·θ0 = π/4
        // (4·N_r·θ0 = π): stiffness k = √2·N_r·K·I + 4·N_r·T_d, f_n = √(k/J)/2π (Acarnley, Stepping Motors, 4th ed.,
        // ch. 4, static torque curve; the detent term derived here). K = 0.2, I = 2 A, T_d = 0.02 N·m, N_r = 50,
        // J = 1e-5 -> k = 28.2843 + 4.0 = 32.2843 N·m/rad, f_n = 285.96 Hz. A stiff chopper (f_c = 20 kHz) holds
        // the current, so the electrical side barely shifts the frequency. RK4 at 0.5 µs.
        DriveSettings d = new DriveSettings(1.5, 0.003, 0.2, 48, DriveMode.CHOPPER, 2.0, 20_000);
        double theta0 = Math.PI / 4 / 50;
        DrivenMotor m = new DrivenMotor(d, new RotorSettings(1e-5, 0, 0.02, 50), theta0 + 0.002 / 50);
        m.holdCurrents(1, 1);
        double dt = 0.5e-6;
        double prev = m.angleRad() - theta0;
        double first = -1;
        double last = -1;
        int crossings = 0;
        for (int i = 1; i <= 40_000; i++) {
            m.step(dt, 1, 1, 0);
            double x = m.angleRad() - theta0;
            if (prev < 0 && x >= 0) {
                double t = (i - 1 + -prev / (x - prev)) * dt;
                if (first < 0) {
                    first = t;
                } else {
                    crossings++;
                }
                last = t;
            }
            prev = x;
        }
        double f = crossings / (last - first);
        assertEquals(285.96, f, 285.96 * 0.005);
    }

    @Test
    void chopperHoldsItsSettingUnlessTheSupplyCannotDriveIt() {
        // Ohm's law at standstill: a 2 A setting on 1.5 Ω needs 3 V; from 2 V the chopper holds only 2/1.5 A.
        DrivenMotor ok = new DrivenMotor(DriveSettings.chopper(1.5, 0.003, 0.2, 24, 2.0), ROTOR, 0);
        DrivenMotor limited = new DrivenMotor(DriveSettings.chopper(1.5, 0.003, 0.2, 2, 2.0), ROTOR, 0);
        for (int i = 0; i < 20_000; i++) {
            ok.step(1e-6, 1, 0, 0);
            limited.step(1e-6, 1, 0, 0);
        }
        assertEquals(2.0, ok.currentA(0), 2e-3);
        assertEquals(2.0 / 1.5, limited.currentA(0), 1e-3);
    }

    @Test
    void fullAndHalfStepCommandsSwitchPhasesAndMicrostepsSetSineCosineLevels() {
        // full step two-phase-on at θ_e = π/4 + kπ/2; half step adds one-phase-on positions (Acarnley ch. 1)
        assertArrayEquals(new double[] {1, 1}, DrivenMotor.phaseCommand(Math.PI / 4, 1), 1e-12);
        assertArrayEquals(new double[] {-1, 1}, DrivenMotor.phaseCommand(3 * Math.PI / 4, 1), 1e-12);
        assertArrayEquals(new double[] {0, 1}, DrivenMotor.phaseCommand(Math.PI / 2, 2), 1e-12);
        assertArrayEquals(new double[] {Math.cos(0.3), Math.sin(0.3)}, DrivenMotor.phaseCommand(0.3, 8), 1e-12);
    }

    @Test
    void settingsRejectImpossibleValuesNamingTheUnit() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> DriveSettings.constantVoltage(0, 0.003, 0.2, 12));
        assertTrue(e.getMessage().contains("ohm"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> DriveSettings.chopper(1, 0.003, 0.2, 12, Double.NaN));
    }

    @Test
    void virtualRigSweepThroughAConstantVoltageDriveRecordsBothPhaseCurrents() throws Exception {
        // At standstill the constant-voltage supply (rated current × R) drives rated current; at speed the
        // back-EMF and the winding's reactance lower it (Acarnley ch. 5, L/R drive): the mean |i| over the last 20 %
        // of a sweep to 600 full steps/s is well below that over the first 5 % (20 ... 49 full steps/s, step
        // intervals ten times L/R, so the current reaches V/R between steps).
        BenchMotor b = new BenchMotor(Scenarios.get("gantry-axis"));
        DriveSettings d = b.driveSettings(DriveMode.CONSTANT_VOLTAGE, 0);
        double[][] ch = b.sweepDriven(20, 600, 4, 1, 5000, d);
        assertEquals(4, ch.length);
        int n = ch[1].length;
        double early = meanAbs(ch[1], 0, n / 20);
        double late = meanAbs(ch[1], 4 * n / 5, n);
        assertEquals(Scenarios.get("gantry-axis").ratedCurrentA(), early, 0.1 * early);
        assertEquals(early, meanAbs(ch[2], 0, n / 20), 0.05 * early);
        assertTrue(late < 0.8 * early, "current falls with speed: early " + early + " A, late " + late + " A");
    }

    private static double meanAbs(double[] x, int from, int to) {
        double s = 0;
        for (int i = from; i < to; i++) {
            s += Math.abs(x[i]);
        }
        return s / (to - from);
    }

    private static double sq(double x) {
        return x * x;
    }
}
