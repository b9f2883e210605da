package org.lodestep.resonance;

import java.util.Random;
import java.util.function.DoubleUnaryOperator;

/**
 * Test-scope integration of a two-phase hybrid stepper driven open loop, written for these tests alone:
 * <pre>
 *   J·θ'' + c·θ' + T_h·sin(N_r·(θ − θ_cmd)) + T_d·sin(4·N_r·θ) = 0             (ideal current drive)
 * </pre>
 * with θ_cmd = k·π/(2·N_r·m) after the k-th of m microsteps per full step (P. P. Acarnley, Stepping Motors, 4th ed.,
 * IEE 2002, ch. 4: static torque curve and detent; from memory), or, with {@link #constantVoltage}, the torque of the
 * two phase currents, each obeying L·di/dt = v − R·i − e with e_A = −K·ω·sin(N_r·θ + π/4),
 * e_B = +K·ω·cos(N_r·θ + π/4) and v = ±V (full or half steps through an H-bridge), torque
 * K·(−i_A·sin(N_r·θ + π/4) + i_B·cos(N_r·θ + π/4)), so two phases on at V/R give T_h = √2·K·V/R.
 * Integrator: classical fourth-order Runge–Kutta, {@code substeps} steps per output sample, the command held
 * over each step. Outputs: tangential acceleration at a radius (g) with Gaussian noise, rotor and commanded angle,
 * phase currents, and a step-pulse channel (5 V for the first half of each pulse).
 */
public final class StepperSweepSimulator {
    public static final double G0 = 9.80665;
    public double inertiaKgM2 = 6.3e-5;
    public double holdingTorqueNm = 0.5;
    public double detentTorqueNm = 0;
    public double dampingNmsPerRad = 1.6e-3;
    public int rotorTeeth = 50;
    public int microsteps = 1;
    public double radiusM = 0.03;
    public double accelNoiseG = 0.0;
    public double currentNoiseA = 0.0;
    public long seed = 1;
    public int substeps = 16;
    /** Electrical drive: when {@code supplyV > 0}, a constant-voltage H-bridge with these winding values. */
    public double supplyV = 0;
    public double resistanceOhm = 1.3;
    public double inductanceH = 2.8e-3;
    public double motorConstant = 0.14;

    /** Results, one value per sample. */
    public record Run(double[] accelG, double[] angleRad, double[] commandRad, double[] currentA, double[] currentB,
               double[] pulses, double sampleRateHz) {
    }

    /** Small-signal natural frequency at a full-step rest position: √((N_r·T_h + 4·N_r·T_d)/J)/2π, Hz. */
    public double naturalHzAtFullStep() {
        return Math.sqrt((rotorTeeth * holdingTorque() + 4 * rotorTeeth * detentTorqueNm) / inertiaKgM2)
                / (2 * Math.PI);
    }

    /** Holding torque with both phases on: T_h, or √2·K·V/R under the constant-voltage drive. */
    public double holdingTorque() {
        return supplyV > 0 ? Math.sqrt(2) * motorConstant * supplyV / resistanceOhm : holdingTorqueNm;
    }

    /** Damping ratio about a full-step rest position, c/(2·√(k·J)). */
    public double dampingRatioAtFullStep() {
        double k = rotorTeeth * holdingTorque() + 4 * rotorTeeth * detentTorqueNm;
        return dampingNmsPerRad / (2 * Math.sqrt(k * inertiaKgM2));
    }

    /** Damping coefficient for a damping ratio about a full-step rest position. */
    public StepperSweepSimulator dampingRatio(double zeta) {
        double k = rotorTeeth * holdingTorque() + 4 * rotorTeeth * detentTorqueNm;
        dampingNmsPerRad = 2 * zeta * Math.sqrt(k * inertiaKgM2);
        return this;
    }

    /** A constant-voltage drive with these winding values (holding torque then √2·K·V/R). */
    public StepperSweepSimulator constantVoltage(double volts, double ohm, double henry, double k) {
        supplyV = volts;
        resistanceOhm = ohm;
        inductanceH = henry;
        motorConstant = k;
        return this;
    }

    /** A linear sweep from r0 to r1 full steps/s over the record. */
    public Run linearSweep(double r0, double r1, double seconds, double sampleRateHz) {
        double slope = (r1 - r0) / seconds;
        return run(t -> r0 * t + 0.5 * slope * t * t, seconds, sampleRateHz);
    }

    /**
     * Integrates from rest at step 0.
     *
     * @param fullSteps full steps commanded by time t (the k-th microstep happens when fullSteps·m passes k)
     */
    public Run run(DoubleUnaryOperator fullSteps, double seconds, double sampleRateHz) {
        int n = (int) Math.round(seconds * sampleRateHz);
        double h = 1 / sampleRateHz / substeps;
        Random rnd = new Random(seed);
        double[] acc = new double[n];
        double[] ang = new double[n];
        double[] cmd = new double[n];
        double[] ia = new double[n];
        double[] ib = new double[n];
        double[] pul = new double[n];
        double[] y = {0, 0, 0, 0};
        if (supplyV > 0) {
            double[] u = bridge(0);
            y[2] = u[0] * supplyV / resistanceOhm;
            y[3] = u[1] * supplyV / resistanceOhm;
        }
        for (int i = 0; i < n; i++) {
            double t = i / sampleRateHz;
            long k = (long) Math.floor(fullSteps.applyAsDouble(t) * microsteps + 1e-9);
            double pulsePhase = fullSteps.applyAsDouble(t) * microsteps - k;
            acc[i] = derivative(y, k)[1] * radiusM / G0 + accelNoiseG * rnd.nextGaussian();
            ang[i] = y[0];
            cmd[i] = k * Math.PI / (2.0 * rotorTeeth * microsteps);
            ia[i] = y[2] + currentNoiseA * rnd.nextGaussian();
            ib[i] = y[3] + currentNoiseA * rnd.nextGaussian();
            pul[i] = pulsePhase < 0.5 ? 5 : 0;
            for (int s = 0; s < substeps; s++) {
                long ks = (long) Math.floor(fullSteps.applyAsDouble(t + s * h) * microsteps + 1e-9);
                double[] k1 = derivative(y, ks);
                double[] k2 = derivative(axpy(y, k1, h / 2), ks);
                double[] k3 = derivative(axpy(y, k2, h / 2), ks);
                double[] k4 = derivative(axpy(y, k3, h), ks);
                for (int j = 0; j < 4; j++) {
                    y[j] += h / 6 * (k1[j] + 2 * k2[j] + 2 * k3[j] + k4[j]);
                }
            }
        }
        return new Run(acc, ang, cmd, ia, ib, pul, sampleRateHz);
    }

    /** H-bridge signs {u_A, u_B} after k microsteps (full or half steps; the rest position of step 0 is θ = 0). */
    private double[] bridge(long k) {
        double te = Math.PI / 4 + k * Math.PI / (2.0 * microsteps);
        double c = Math.cos(te);
        double s = Math.sin(te);
        return new double[] {Math.abs(c) < 0.5 ? 0 : Math.signum(c), Math.abs(s) < 0.5 ? 0 : Math.signum(s)};
    }

    private double[] derivative(double[] y, long k) {
        double theta = y[0];
        double omega = y[1];
        double torque = -dampingNmsPerRad * omega - detentTorqueNm * Math.sin(4 * rotorTeeth * theta);
        double di = 0;
        double dj = 0;
        if (supplyV > 0) {
            double x = rotorTeeth * theta + Math.PI / 4;
            double sin = Math.sin(x);
            double cos = Math.cos(x);
            double[] u = bridge(k);
            torque += motorConstant * (-y[2] * sin + y[3] * cos);
            di = (u[0] * supplyV - resistanceOhm * y[2] + motorConstant * omega * sin) / inductanceH;
            dj = (u[1] * supplyV - resistanceOhm * y[3] - motorConstant * omega * cos) / inductanceH;
        } else {
            double thetaCmd = k * Math.PI / (2.0 * rotorTeeth * microsteps);
            torque -= holdingTorqueNm * Math.sin(rotorTeeth * (theta - thetaCmd));
        }
        return new double[] {omega, torque / inertiaKgM2, di, dj};
    }

    private static double[] axpy(double[] y, double[] k, double h) {
        return new double[] {y[0] + h * k[0], y[1] + h * k[1], y[2] + h * k[2], y[3] + h * k[3]};
    }

    /** Steps lost at each sample: (θ_cmd − θ) in full steps, rounded. */
    public static double[] lagFullSteps(Run r, int rotorTeeth) {
        double[] lag = new double[r.angleRad().length];
        for (int i = 0; i < lag.length; i++) {
            lag[i] = (r.commandRad()[i] - r.angleRad()[i]) / (Math.PI / (2 * rotorTeeth));
        }
        return lag;
    }
}
