package org.lodestep.qa;

/**
 * The one call site of copper temperature correction in QA: phase resistance referred to the spec's reference
 * temperature. Delegates to the project's copper formula (IEC 60034-1, k = 235 °C).
 */
final class WindingResistance {
    /** Standard named in check notes. */
    static final String STANDARD = "IEC 60034-1, k = 235";

    private WindingResistance() {
    }

    /** Resistance at {@code toC} of a copper winding reading {@code ohm} at {@code fromC}. */
    static double toReference(double ohm, double fromC, double toC) {
        // Placeholder until wiring.CopperTemperature lands on main: R2/R1 = (k + θ2)/(k + θ1), k = 235 (IEC 60034-1).
        return ohm * (235.0 + toC) / (235.0 + fromC);
    }
}
