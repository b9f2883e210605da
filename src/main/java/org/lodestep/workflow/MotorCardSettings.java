package org.lodestep.workflow;

import org.lodestep.wiring.Connection;

/**
 * What the motor card should assume where the measurements leave a choice; every part is optional.
 *
 * @param connection    how to wire the motor; null for the usual one (series, unipolar for 5-lead)
 * @param phaseCurrentA phase current for the torque and step-rate figures, A; null for the estimated rating
 * @param supplyV       driver supply voltage, V; null for the rule-of-thumb suggestion
 * @param inertiaKgM2   rotor plus load inertia, kg·m², for the natural frequency; null when unknown
 */
public record MotorCardSettings(Connection connection, Double phaseCurrentA, Double supplyV, Double inertiaKgM2) {
    /** Nothing assumed. */
    public static final MotorCardSettings NONE = new MotorCardSettings(null, null, null, null);
}
