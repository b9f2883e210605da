package org.lodestep.qa;

import org.lodestep.wiring.CopperTemperature;

/**
 * The one call site of copper temperature correction in QA: phase resistance referred to the spec's reference
 * temperature with {@link CopperTemperature} (its default constant, IEC 60034-1, k = 235 °C).
 */
final class WindingResistance {
    /** Standard named in check notes. */
    static final String STANDARD = CopperTemperature.DEFAULT.standard() + ", k = "
            + Inspection.fmt(CopperTemperature.DEFAULT.kC());

    private WindingResistance() {
    }

    /** Resistance at {@code toC} of a copper winding reading {@code ohm} at {@code fromC}. */
    static double toReference(double ohm, double fromC, double toC) {
        return CopperTemperature.correct(ohm, fromC, toC, CopperTemperature.DEFAULT);
    }
}
