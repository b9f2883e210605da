package org.lodestep.resonance;

/**
 * Test-scope simulation of a hybrid stepper's rotor and load driven open loop through a step-rate sweep: the rotor
 * obeys J·θ'' = -T_h·sin(N_r·(θ - θ_cmd)) - c·θ', with θ_cmd advancing one microstep (2π/(4·N_r·m) rad) per step
 * pulse (Acarnley, Stepping Motors, 4th ed., ch. 4, single-step response model), the equilibrium following the
 * command with the winding's electrical time constant L/R (a first-order lag: the phase currents cannot change
 * instantly). It produces the tangential
 * acceleration of a point on the load and the step-pulse train, the signals a bench sweep records; its small-angle
 * natural frequency is (1/2π)·√(N_r·T_h/J).
 */
public final class RotorSimulator {
    private final double holdingTorqueNm;
    private final int rotorTeeth;
    private final double inertiaKgm2;
    private final double dampingNmsPerRad;
    private final int microsteps;
    private final double radiusM;
    private final double electricalTimeConstantS;

    /**
     * @param dampingRatio viscous damping as a fraction of critical, about the detent
     * @param radiusM      radius at which the acceleration is "measured", m
     */
    public RotorSimulator(double holdingTorqueNm, int rotorTeeth, double inertiaKgm2, double dampingRatio,
                          int microsteps, double radiusM, double electricalTimeConstantS) {
        this.holdingTorqueNm = holdingTorqueNm;
        this.rotorTeeth = rotorTeeth;
        this.inertiaKgm2 = inertiaKgm2;
        this.dampingNmsPerRad = 2 * dampingRatio * Math.sqrt(rotorTeeth * holdingTorqueNm * inertiaKgm2);
        this.microsteps = microsteps;
        this.radiusM = radiusM;
        this.electricalTimeConstantS = electricalTimeConstantS;
    }

    public double naturalHz() {
        return Math.sqrt(rotorTeeth * holdingTorqueNm / inertiaKgm2) / (2 * Math.PI);
    }

    /** Rate law: full steps/s at time t. */
    public interface Rate {
        double at(double timeS);
    }

    /**
     * Simulates {@code frames} samples at {@code sampleRateHz}.
     *
     * @return {acceleration in g, step-pulse level in V (0 or 5, pulses 50 % duty)}
     */
    public double[][] run(Rate rate, double sampleRateHz, int frames) {
        int sub = 16;
        double dt = 1 / (sampleRateHz * sub);
        double microstepRad = 2 * Math.PI / (4.0 * rotorTeeth * microsteps);
        double theta = 0;
        double omega = 0;
        double phasePulses = 0;
        double[] accelG = new double[frames];
        double[] pulse = new double[frames];
        double t = 0;
        double cmd = 0;
        double lag = Math.exp(-dt / electricalTimeConstantS);
        for (int i = 0; i < frames; i++) {
            double accSum = 0;
            for (int s = 0; s < sub; s++) {
                phasePulses += rate.at(t) * microsteps * dt;
                cmd = Math.floor(phasePulses) * microstepRad + (cmd - Math.floor(phasePulses) * microstepRad) * lag;
                double torque = -holdingTorqueNm * Math.sin(rotorTeeth * (theta - cmd)) - dampingNmsPerRad * omega;
                double alpha = torque / inertiaKgm2;
                omega += alpha * dt;
                theta += omega * dt;
                accSum += alpha;
                t += dt;
            }
            accelG[i] = accSum / sub * radiusM / 9.80665;
            pulse[i] = (phasePulses - Math.floor(phasePulses)) < 0.5 ? 5.0 : 0.0;
        }
        return new double[][] {accelG, pulse};
    }

    /** The free response after a single full step from rest: rotor angle error in rad, sampled at sampleRateHz. */
    public double[] singleStep(double sampleRateHz, int frames) {
        int sub = 16;
        double dt = 1 / (sampleRateHz * sub);
        double cmd = 2 * Math.PI / (4.0 * rotorTeeth);
        double theta = 0;
        double omega = 0;
        double[] out = new double[frames];
        for (int i = 0; i < frames; i++) {
            for (int s = 0; s < sub; s++) {
                double torque = -holdingTorqueNm * Math.sin(rotorTeeth * (theta - cmd)) - dampingNmsPerRad * omega;
                omega += torque / inertiaKgm2 * dt;
                theta += omega * dt;
            }
            out[i] = theta;
        }
        return out;
    }
}
