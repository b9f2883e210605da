package org.lodestep.motor;

import java.util.Objects;

/**
 * One coil of a phase, oriented: current entering {@code startLead} and leaving {@code endLead} in each coil of a
 * phase magnetises the stator the same way.
 *
 * @param startLead      lead where the coil starts
 * @param endLead        lead where it ends
 * @param resistanceOhm  coil resistance, ohm; null when not measured
 * @param inductanceH    coil inductance, H; null when not measured
 * @param keVsPerRad     coil back-EMF constant, peak V per mechanical rad/s; null when not measured
 */
public record HalfWinding(String startLead, String endLead, Double resistanceOhm, Double inductanceH,
                          Double keVsPerRad) {
    public HalfWinding {
        Objects.requireNonNull(startLead, "startLead");
        Objects.requireNonNull(endLead, "endLead");
        Checks.positiveOrNull(resistanceOhm, "coil resistance", "ohm");
        Checks.positiveOrNull(inductanceH, "coil inductance", "H");
        Checks.positiveOrNull(keVsPerRad, "coil Ke", "V·s/rad");
    }
}
