package org.lodestep.rig;

import java.util.function.DoubleUnaryOperator;

/**
 * Rotor motion of a two-phase hybrid stepper under an ideal current-controlled driver:
 * J·θ'' + c·θ' + T_h·sin(N_r·θ − θ_e) + T_d·sin(4·N_r·θ − π) = 0, integrated with the classical fourth-order
 * Runge–Kutta method at a fixed step well below the natural period and the microstep interval.
 *
 * <p>Source: P. P. Acarnley, Stepping Motors: A Guide to Theory and Practice, 4th ed., IEE 2002, chapter 4 (static
 * torque T = −T_h·sin(N_r·θ), small-oscillation natural frequency f_n = sqrt(N_r·T_h/J)/2π). The commanded
 * electrical angle θ_e is π/4 + k·π/2 for full steps (two phases on) and k·π/(2m) for 1/m microsteps (sine-cosine
 * currents). Departures: the driver is ideal (currents follow the command at any speed, so no high-speed torque
 * fall-off or mid-frequency instability); the detent term has its minima at the two-phase-on full-step positions.
 */
final class RotorDynamics {
    private final double inertiaKgM2;
    private final double dampingNmsPerRad;
    private final double holdingTorqueNm;
    private final double detentTorqueNm;
    private final int rotorTeeth;
    private final int microsteps;

    RotorDynamics(double inertiaKgM2, double dampingNmsPerRad, double holdingTorqueNm, double detentTorqueNm,
                  int rotorTeeth, int microsteps) {
        if (!(inertiaKgM2 > 0) || !(holdingTorqueNm > 0) || !(dampingNmsPerRad >= 0) || !(detentTorqueNm >= 0)) {
            throw new IllegalArgumentException("inertia and holding torque must be positive, damping and detent >= 0");
        }
        if (microsteps < 1 || microsteps > 256) {
            throw new IllegalArgumentException("microsteps must be 1..256, got " + microsteps);
        }
        this.inertiaKgM2 = inertiaKgM2;
        this.dampingNmsPerRad = dampingNmsPerRad;
        this.holdingTorqueNm = holdingTorqueNm;
        this.detentTorqueNm = detentTorqueNm;
        this.rotorTeeth = rotorTeeth;
        this.microsteps = microsteps;
    }

    /** Small-oscillation natural frequency, Hz: f_n = sqrt(N_r·T_h/J)/(2π) (Acarnley ch. 4). */
    double naturalFrequencyHz() {
        return Math.sqrt(rotorTeeth * holdingTorqueNm / inertiaKgM2) / (2 * Math.PI);
    }

    /** Commanded electrical angle after {@code k} (micro)steps, rad. */
    double electricalAngleRad(long k) {
        return microsteps == 1 ? Math.PI / 4 + k * Math.PI / 2 : k * Math.PI / (2.0 * microsteps);
    }

    /** Angular acceleration θ'' for a state, rad/s². */
    double accelerationRadPerS2(double theta, double omega, double thetaE) {
        double torque = -holdingTorqueNm * Math.sin(rotorTeeth * theta - thetaE)
                - detentTorqueNm * Math.sin(4 * rotorTeeth * theta - Math.PI)
                - dampingNmsPerRad * omega;
        return torque / inertiaKgM2;
    }

    /** What {@link #run} returns, one value per sample. */
    record Trace(double[] angleRad, double[] speedRadPerS, double[] accelRadPerS2, double[] thetaERad,
                 double[] stepPhase) {
    }

    /**
     * Integrates from rest at the position of step 0.
     *
     * @param fullSteps    full steps commanded by time t (real-valued; the k-th microstep happens when
     *                     {@code fullSteps(t)·m} passes k), from t = 0
     * @param seconds      duration, s
     * @param sampleRateHz samples per second of the returned trace
     * @param maxFullStepsPerS highest step rate in the schedule, to choose the integration step
     */
    Trace run(DoubleUnaryOperator fullSteps, double seconds, double sampleRateHz, double maxFullStepsPerS) {
        int frames = (int) Math.round(seconds * sampleRateHz);
        double samplePeriodS = 1.0 / sampleRateHz;
        double naturalPeriodS = 1.0 / naturalFrequencyHz();
        double target = Math.min(naturalPeriodS / 200, 1.0 / (Math.max(1, maxFullStepsPerS) * microsteps * 20));
        int sub = Math.max(2, (int) Math.ceil(samplePeriodS / target));
        double dt = samplePeriodS / sub;

        double[] angle = new double[frames];
        double[] speed = new double[frames];
        double[] accel = new double[frames];
        double[] thetaEs = new double[frames];
        double[] phase = new double[frames];
        double theta = electricalAngleRad(0) / rotorTeeth;
        double omega = 0;
        for (int i = 0; i < frames; i++) {
            double t = i * samplePeriodS;
            double ph = fullSteps.applyAsDouble(t);
            double thetaE = electricalAngleRad((long) Math.floor(ph * microsteps + 1e-9));
            angle[i] = theta;
            speed[i] = omega;
            accel[i] = accelerationRadPerS2(theta, omega, thetaE);
            thetaEs[i] = thetaE;
            phase[i] = ph * microsteps;
            for (int s = 0; s < sub; s++) {
                double ts = t + s * dt;
                double te = electricalAngleRad((long) Math.floor(fullSteps.applyAsDouble(ts) * microsteps + 1e-9));
                // classical RK4 on (θ, ω) with the command held over the step
                double k1t = omega;
                double k1w = accelerationRadPerS2(theta, omega, te);
                double k2t = omega + 0.5 * dt * k1w;
                double k2w = accelerationRadPerS2(theta + 0.5 * dt * k1t, k2t, te);
                double k3t = omega + 0.5 * dt * k2w;
                double k3w = accelerationRadPerS2(theta + 0.5 * dt * k2t, k3t, te);
                double k4t = omega + dt * k3w;
                double k4w = accelerationRadPerS2(theta + dt * k3t, k4t, te);
                theta += dt / 6 * (k1t + 2 * k2t + 2 * k3t + k4t);
                omega += dt / 6 * (k1w + 2 * k2w + 2 * k3w + k4w);
            }
        }
        return new Trace(angle, speed, accel, thetaEs, phase);
    }
}
