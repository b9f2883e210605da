package org.lodestep.drive;

import org.lodestep.motor.StepGeometry;

/**
 * The electrical and mechanical constants of one motor in one connection, as the torque model needs them.
 *
 * @param phaseResistanceOhm phase resistance in the connection used, ohm (add any series resistor of an L/R drive)
 * @param phaseInductanceH   phase inductance in the connection used, H
 * @param ktNmPerA           torque constant of a phase, N·m per peak A (= Ke in peak V per mechanical rad/s)
 * @param rotorTeeth         rotor teeth N_r (50 for a 1.8° motor)
 * @param rotorInertiaKgM2   rotor inertia, kg·m²
 * @param detentTorqueNm     peak detent (unenergised cogging) torque, N·m; 0 when unknown
 */
public record PhaseModel(double phaseResistanceOhm, double phaseInductanceH, double ktNmPerA, int rotorTeeth,
                         double rotorInertiaKgM2, double detentTorqueNm) {
    public PhaseModel {
        Require.positive(phaseResistanceOhm, "phase resistance", "ohm");
        Require.positive(phaseInductanceH, "phase inductance", "H");
        Require.positive(ktNmPerA, "torque constant Kt", "N·m/A");
        StepGeometry.fullStepsPerRevolution(rotorTeeth);
        Require.positive(rotorInertiaKgM2, "rotor inertia", "kg·m²");
        Require.nonNegative(detentTorqueNm, "detent torque", "N·m");
    }

    /** Full steps per revolution, 4·N_r. */
    public int fullStepsPerRev() {
        return StepGeometry.fullStepsPerRevolution(rotorTeeth);
    }

    /** Mechanical speed in rad/s at a full-step rate: 2π/(4·N_r) rad per full step. */
    public double radPerS(double rateFullStepsPerS) {
        return rateFullStepsPerS * 2 * Math.PI / fullStepsPerRev();
    }

    /** Full-step rate at a mechanical speed in rad/s. */
    public double fullStepsPerS(double speedRadPerS) {
        return speedRadPerS * fullStepsPerRev() / (2 * Math.PI);
    }

    /** The same motor with a series resistance added to each phase (an L/R drive's resistor), ohm. */
    public PhaseModel withSeriesResistance(double seriesOhm) {
        Require.nonNegative(seriesOhm, "series resistance", "ohm");
        return new PhaseModel(phaseResistanceOhm + seriesOhm, phaseInductanceH, ktNmPerA, rotorTeeth,
                rotorInertiaKgM2, detentTorqueNm);
    }
}
