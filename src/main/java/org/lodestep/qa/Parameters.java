package org.lodestep.qa;

/** The stable parameter keys used in specs, records, statistics, JSON and CSV export. */
public final class Parameters {
    /** Phase resistance referred to the spec's reference temperature, Ω. */
    public static final String PHASE_RESISTANCE = "phase_resistance";
    /** Phase balance: 100·(max − min)/mean of the phase resistances, %. */
    public static final String PHASE_IMBALANCE = "phase_imbalance";
    /** Phase inductance, H. */
    public static final String PHASE_INDUCTANCE = "phase_inductance";
    /** Insulation resistance at the spec's test voltage, raw room-temperature reading, Ω. */
    public static final String INSULATION_RESISTANCE = "insulation_resistance";
    /** Back-EMF constant, V·s/rad (peak per phase). */
    public static final String BACK_EMF_CONSTANT = "back_emf_constant";
    /** Full-step angle, degrees. */
    public static final String STEP_ANGLE = "step_angle";

    private Parameters() {
    }
}
