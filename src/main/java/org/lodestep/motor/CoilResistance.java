package org.lodestep.motor;

import java.util.Objects;

/**
 * One coil found by a resistance measurement: a whole winding of a 4-lead motor, an end-to-tap half of a 5- or
 * 6-lead motor, or one of the four isolated coils of an 8-lead motor.
 *
 * @param leads         the coil's two leads (order carries no polarity)
 * @param resistanceOhm coil resistance, ohm
 */
public record CoilResistance(OrientedLeads leads, double resistanceOhm) {
    public CoilResistance {
        Objects.requireNonNull(leads, "leads");
        Checks.positive(resistanceOhm, "coil resistance", "ohm");
    }
}
