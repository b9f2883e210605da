package org.lodestep.rig;

/**
 * Turns a commanded position in full steps into the drive's per-unit phase commands, and measures how far the rotor
 * lags that position. The command of the k-th (micro)step is the one {@link RotorDynamics} and
 * {@link DrivenMotor#phaseCommand} use; the rotor starts at the position of step 0.
 */
final class StepCommand {
    private final int microsteps;
    private final int rotorTeeth;
    private final double startElectricalRad;

    StepCommand(int microsteps, int rotorTeeth) {
        if (microsteps < 1 || microsteps > 256) {
            throw new IllegalArgumentException("microsteps must be 1 to 256, got " + microsteps);
        }
        this.microsteps = microsteps;
        this.rotorTeeth = rotorTeeth;
        this.startElectricalRad = electricalRad(0);
    }

    private double electricalRad(long k) {
        return microsteps == 1 ? Math.PI / 4 + k * Math.PI / 2 : k * Math.PI / (2.0 * microsteps);
    }

    /** Rotor angle of the start position, rad. */
    double startAngleRad() {
        return startElectricalRad / rotorTeeth;
    }

    /** Phase commands {u_A, u_B} at a commanded position, full steps. */
    double[] phases(double positionFullSteps) {
        long k = (long) Math.floor(positionFullSteps * microsteps + 1e-9);
        return DrivenMotor.phaseCommand(electricalRad(k), microsteps);
    }

    /** How far the rotor lags a commanded position, full steps (one full step is 90° electrical). */
    double lagFullSteps(double positionFullSteps, double rotorAngleRad) {
        double rotorFullSteps = (rotorAngleRad * rotorTeeth - startElectricalRad) / (Math.PI / 2);
        return positionFullSteps - rotorFullSteps;
    }
}
