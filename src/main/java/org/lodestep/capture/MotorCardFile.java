package org.lodestep.capture;

/**
 * The values of a motor card JSON (written by {@code motor identify --json}) that the drive model needs. Phase values
 * are for the card's connection, the mean of its phases; a value the card does not give is null.
 *
 * @param source             file name
 * @param topology           {@code 4-lead} ... {@code 8-lead}, or {@code unknown}
 * @param connection         {@code series}, {@code parallel}, {@code half} or {@code unipolar}
 * @param rotorTeeth         rotor teeth
 * @param phaseResistanceOhm phase resistance, ohm
 * @param phaseInductanceH   phase inductance, H
 * @param ktNmPerA           torque constant of a phase in the connection, N·m/A
 * @param phaseCurrentA      the card's phase current, A
 * @param supplyV            the card's supply voltage, V
 * @param inertiaKgM2        the card's inertia (rotor plus any load it was given), kg·m²
 */
public record MotorCardFile(String source, String topology, String connection, Integer rotorTeeth,
                            Double phaseResistanceOhm, Double phaseInductanceH, Double ktNmPerA,
                            Double phaseCurrentA, Double supplyV, Double inertiaKgM2) {
}
