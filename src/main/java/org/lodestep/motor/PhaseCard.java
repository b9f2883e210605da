package org.lodestep.motor;

import java.util.List;
import java.util.Objects;

/**
 * One phase of the motor and its values for the chosen connection.
 *
 * @param name            {@code A} or {@code B}
 * @param halfWindings    its coils, in series order (one for a 4-lead motor)
 * @param polarityKnown   true when back-EMF set which end of each coil starts; false when the orientation shown is
 *                        one arbitrary choice (fine for 4- and 6-lead motors: it only sets the direction)
 * @param resistanceOhm   phase resistance for the connection, ohm; null when unknown
 * @param inductanceH     phase inductance for the connection, H; null when unknown
 * @param couplingFactor  mutual coupling {@code kappa} of its two coils; null when not measured
 * @param timeConstantS   {@code L/R} for the connection, s; null when unknown
 * @param keVsPerRad      phase back-EMF constant for the connection, peak V per mechanical rad/s; null when unknown
 */
public record PhaseCard(String name, List<HalfWinding> halfWindings, boolean polarityKnown, Double resistanceOhm,
                        Double inductanceH, Double couplingFactor, Double timeConstantS, Double keVsPerRad) {
    public PhaseCard {
        Objects.requireNonNull(name, "name");
        halfWindings = List.copyOf(halfWindings);
        Checks.positiveOrNull(resistanceOhm, "phase resistance", "ohm");
        Checks.positiveOrNull(inductanceH, "phase inductance", "H");
        Checks.finiteOrNull(couplingFactor, "coupling factor", "");
        Checks.positiveOrNull(timeConstantS, "time constant", "s");
        Checks.positiveOrNull(keVsPerRad, "phase Ke", "V·s/rad");
    }
}
