package org.lodestep.motor;

import java.util.List;

import org.lodestep.wiring.Connection;

/**
 * Everything {@link MotorIdentifier} may combine; every part is optional.
 *
 * @param windings       coils from a resistance matrix, or null
 * @param stepResponses  fitted current step responses (per coil, or across a whole phase), possibly empty
 * @param backEmf        a phased back-EMF capture, or null
 * @param connection     how the card should wire the motor; null for the usual one (series for 6- and 8-lead)
 * @param phaseCurrentA  phase current for the torque and rate figures, A; null to use the estimated rating
 * @param supplyV        driver supply voltage, V; null to use the rule-of-thumb suggestion
 * @param inertiaKgM2    rotor plus load inertia, kg·m²; null when unknown
 */
public record IdentifyRequest(WindingInput windings, List<StepInput> stepResponses, BackEmfResult backEmf,
                              Connection connection, Double phaseCurrentA, Double supplyV, Double inertiaKgM2) {
    public IdentifyRequest {
        // A 4-lead winding is its whole phase: for the card that is the series connection with one coil per phase.
        connection = connection == Connection.WHOLE ? Connection.SERIES : connection;
        stepResponses = stepResponses == null ? List.of() : List.copyOf(stepResponses);
        Checks.positiveOrNull(phaseCurrentA, "phase current", "A");
        Checks.positiveOrNull(supplyV, "supply voltage", "V");
        Checks.positiveOrNull(inertiaKgM2, "inertia", "kg·m²");
    }
}
