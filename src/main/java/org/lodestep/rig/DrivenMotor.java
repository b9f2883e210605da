package org.lodestep.rig;

import org.lodestep.drive.DriveMode;

/**
 * A two-phase hybrid stepper with its phase circuits and drive, coupled to the rotor, advanced one integration step
 * per call. State: rotor angle θ, speed ω and the phase currents i_A, i_B.
 *
 * <p>Equations (P. P. Acarnley, <i>Stepping Motors: A Guide to Theory and Practice</i>, 4th ed., IEE 2002, the
 * hybrid-motor model of chapters 4 and 5; T. Kenjo, A. Sugawara, <i>Stepping Motors and Their Microprocessor
 * Controls</i>, 2nd ed., Oxford 1994, from memory):
 * <pre>
 *   L·di_A/dt = v_A − R·i_A − e_A,   e_A = −K·ω·sin(N_r·θ)
 *   L·di_B/dt = v_B − R·i_B − e_B,   e_B = +K·ω·cos(N_r·θ)
 *   J·dω/dt  = K·(−i_A·sin(N_r·θ) + i_B·cos(N_r·θ)) + T_d·sin(4·N_r·θ) − c·ω + T_load
 * </pre>
 * K is both the back-EMF constant (V·s/rad) and the torque constant (N·m/A): the electrical power e·i equals the
 * mechanical power T·ω. With i_A = I·cos θ_e, i_B = I·sin θ_e the torque is −K·I·sin(N_r·θ − θ_e), the static
 * torque curve of the ideal current-fed model. The detent has its minima at the two-phase-on full-step positions.
 *
 * <p>Drives: a constant-voltage H-bridge puts v = V_s·u on a phase for a per-unit command u (−1 ... 1, see
 * {@link #phaseCommand}); a chopper regulates toward i_ref = I_set·u with its switching-period average
 * v = clamp(R·i_ref + 2π·f_c·L·(i_ref − i), −V_s, +V_s), a proportional current loop of bandwidth f_c with the
 * supply as its limit. Departures: the two phases are magnetically independent, the inductance does not vary with
 * rotor position, no saturation, no chopper ripple, no iron loss.
 *
 * <p>Integration: classical fourth-order Runge–Kutta with the command held over each call; the caller chooses the
 * step (well below L/R, the chopper's 1/(2π·f_c), the natural period and the step interval; see {@link #maxStepS}).
 */
public final class DrivenMotor {
    private final DriveSettings drive;
    private final RotorSettings rotor;
    private final double loopGainOhm;
    private double angleRad;
    private double speedRadPerS;
    private double currentAA;
    private double currentBA;
    private double lastAccelRadPerS2;

    /** A motor at rest at rotor angle {@code angleRad} with no current. */
    public DrivenMotor(DriveSettings drive, RotorSettings rotor, double angleRad) {
        this.drive = java.util.Objects.requireNonNull(drive, "drive");
        this.rotor = java.util.Objects.requireNonNull(rotor, "rotor");
        if (!Double.isFinite(angleRad)) {
            throw new IllegalArgumentException("start angle must be finite, got " + angleRad + " rad");
        }
        this.loopGainOhm = 2 * Math.PI * drive.chopperBandwidthHz() * drive.phaseInductanceH();
        this.angleRad = angleRad;
    }

    /**
     * Per-unit winding commands {u_A, u_B} for a commanded electrical angle: full steps (m = 1) and half steps
     * (m = 2) switch each phase fully on, off or reversed (the sign of cos θ_e and sin θ_e, off where it is below
     * one half); finer microsteps set sine-cosine levels.
     */
    public static double[] phaseCommand(double electricalAngleRad, int microsteps) {
        double c = Math.cos(electricalAngleRad);
        double s = Math.sin(electricalAngleRad);
        if (microsteps <= 2) {
            return new double[] {switched(c), switched(s)};
        }
        return new double[] {c, s};
    }

    private static double switched(double x) {
        return Math.abs(x) < 0.5 ? 0 : Math.signum(x);
    }

    /**
     * Largest integration step that keeps the fourth-order Runge–Kutta scheme accurate on the electrical side,
     * s: a twentieth of the fastest electrical time constant (L/R, or the chopper loop's).
     */
    public double maxStepS() {
        double fastest = drive.phaseResistanceOhm()
                + (drive.mode() == DriveMode.CHOPPER ? loopGainOhm : 0);
        return drive.phaseInductanceH() / fastest / 20;
    }

    /**
     * Advances the state by {@code dtS}.
     *
     * @param commandA     per-unit command of phase A, −1 ... 1 (fraction of the supply or of the current setting)
     * @param commandB     per-unit command of phase B
     * @param loadTorqueNm external torque on the shaft, N·m (positive drives forward)
     */
    public void step(double dtS, double commandA, double commandB, double loadTorqueNm) {
        if (!(dtS > 0) || !Double.isFinite(dtS)) {
            throw new IllegalArgumentException("integration step must be positive, got " + dtS + " s");
        }
        double[] y = {angleRad, speedRadPerS, currentAA, currentBA};
        double[] k1 = derivative(y, commandA, commandB, loadTorqueNm);
        double[] k2 = derivative(add(y, k1, dtS / 2), commandA, commandB, loadTorqueNm);
        double[] k3 = derivative(add(y, k2, dtS / 2), commandA, commandB, loadTorqueNm);
        double[] k4 = derivative(add(y, k3, dtS), commandA, commandB, loadTorqueNm);
        angleRad += dtS / 6 * (k1[0] + 2 * k2[0] + 2 * k3[0] + k4[0]);
        speedRadPerS += dtS / 6 * (k1[1] + 2 * k2[1] + 2 * k3[1] + k4[1]);
        currentAA += dtS / 6 * (k1[2] + 2 * k2[2] + 2 * k3[2] + k4[2]);
        currentBA += dtS / 6 * (k1[3] + 2 * k2[3] + 2 * k3[3] + k4[3]);
        lastAccelRadPerS2 = derivative(new double[] {angleRad, speedRadPerS, currentAA, currentBA}, commandA,
                commandB, loadTorqueNm)[1];
    }

    /**
     * Sets the phase currents to their steady values at standstill for these commands (V_s·u/R, or I_set·u for a
     * chopper), so a run starts with the rotor held rather than with a switch-on transient.
     */
    public void holdCurrents(double commandA, double commandB) {
        currentAA = standstillCurrentA(commandA);
        currentBA = standstillCurrentA(commandB);
    }

    private double standstillCurrentA(double command) {
        if (drive.mode() == DriveMode.CONSTANT_VOLTAGE) {
            return drive.supplyV() * Math.max(-1, Math.min(1, command)) / drive.phaseResistanceOhm();
        }
        // unclamped, the loop settles on i = i_ref; a supply below R·i_ref holds V_s/R instead
        double ref = drive.currentSettingA() * command;
        return Math.signum(ref) * Math.min(Math.abs(ref), drive.supplyV() / drive.phaseResistanceOhm());
    }

    private static double[] add(double[] y, double[] k, double h) {
        return new double[] {y[0] + h * k[0], y[1] + h * k[1], y[2] + h * k[2], y[3] + h * k[3]};
    }

    private double[] derivative(double[] y, double uA, double uB, double loadNm) {
        double nrTheta = rotor.rotorTeeth() * y[0];
        double sin = Math.sin(nrTheta);
        double cos = Math.cos(nrTheta);
        double k = drive.keVsPerRad();
        double eA = -k * y[1] * sin;
        double eB = k * y[1] * cos;
        double vA = voltage(uA, y[2]);
        double vB = voltage(uB, y[3]);
        double l = drive.phaseInductanceH();
        double r = drive.phaseResistanceOhm();
        double torque = k * (-y[2] * sin + y[3] * cos)
                + rotor.detentTorqueNm() * Math.sin(4 * nrTheta)
                - rotor.dampingNmsPerRad() * y[1] + loadNm;
        return new double[] {y[1], torque / rotor.inertiaKgM2(), (vA - r * y[2] - eA) / l, (vB - r * y[3] - eB) / l};
    }

    private double voltage(double command, double current) {
        double vs = drive.supplyV();
        if (drive.mode() == DriveMode.CONSTANT_VOLTAGE) {
            return vs * Math.max(-1, Math.min(1, command));
        }
        double ref = drive.currentSettingA() * command;
        double v = drive.phaseResistanceOhm() * ref + loopGainOhm * (ref - current);
        return Math.max(-vs, Math.min(vs, v));
    }

    /** Rotor angle, rad. */
    public double angleRad() {
        return angleRad;
    }

    /** Rotor speed, rad/s. */
    public double speedRadPerS() {
        return speedRadPerS;
    }

    /** Rotor acceleration at the end of the last step, rad/s². */
    public double accelRadPerS2() {
        return lastAccelRadPerS2;
    }

    /** Current of phase A (0) or B (1), A. */
    public double currentA(int phase) {
        return phase == 0 ? currentAA : currentBA;
    }

    /** Back-EMF of phase A (0) or B (1) now, V. */
    public double backEmfV(int phase) {
        double nrTheta = rotor.rotorTeeth() * angleRad;
        return drive.keVsPerRad() * speedRadPerS * (phase == 0 ? -Math.sin(nrTheta) : Math.cos(nrTheta));
    }

    /** Electromagnetic torque of the phase currents now (detent, damping and load excluded), N·m. */
    public double electromagneticTorqueNm() {
        double nrTheta = rotor.rotorTeeth() * angleRad;
        return drive.keVsPerRad() * (-currentAA * Math.sin(nrTheta) + currentBA * Math.cos(nrTheta));
    }

    public DriveSettings drive() {
        return drive;
    }

    public RotorSettings rotor() {
        return rotor;
    }
}
