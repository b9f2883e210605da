package org.lodestep.rig;

import java.util.List;

/**
 * One virtual-rig scenario: a motor on the bench (windings, wiring, labels, faults, rotor and load), as written in
 * {@code scenarios.toml}. SI units throughout; inductances are per half-winding, the back-EMF constant per whole
 * phase (both halves in series).
 *
 * @param description        one line shown by {@code rig info sim:}
 * @param seed               seeds lead shuffling and every noise source, so a scenario is reproducible
 * @param serial             the motor's serial number (invented), written into capture sidecars
 * @param leads              4, 6 or 8
 * @param rotorTeeth         50 (1.8 degree) or 100 (0.9 degree)
 * @param shuffleLeads       whether the relay positions reach the leads in a shuffled order (a salvaged motor)
 * @param leadLabels         the lead colours in the motor's own order: A1 start, A1 end, A2 start, A2 end, then B
 *                           (8 leads); A start, A centre, A end, then B (6 leads); A start, A end, B start, B end (4)
 * @param halfWindingOhm     resistance of one half-winding at bench temperature, ohm
 * @param halfWindingH       self-inductance of one half-winding, henry
 * @param coupling           magnetic coupling factor k between the two halves of a phase, 0..1
 * @param keVsPerRad         back-EMF constant of a whole phase, V·s/rad
 * @param ratedCurrentA      phase current the virtual driver sets during sweeps, A
 * @param holdingTorqueNm    peak static torque with that current, N·m
 * @param detentTorqueNm     peak detent torque with no current, N·m
 * @param rotorInertiaKgM2   rotor inertia, kg·m²
 * @param loadInertiaKgM2    coupled load inertia referred to the shaft, kg·m²
 * @param dampingNmsPerRad   viscous damping, N·m·s/rad
 * @param insulationOhm      insulation resistance of each phase to the frame, ohm (each half-winding carries
 *                           half the conductance, so an isolated half of an 8-lead motor reads twice this)
 * @param accelRadiusM       radius at which the accelerometer reads tangential acceleration, m
 * @param accelNoiseG        accelerometer noise, g RMS
 * @param handTurnRpm        peak speed of the simulated hand turn for back-EMF, rev/min
 * @param faults             faults built into this motor
 */
public record Scenario(String description, long seed, String serial, int leads, int rotorTeeth, boolean shuffleLeads,
                       List<String> leadLabels, double halfWindingOhm, double halfWindingH, double coupling,
                       double keVsPerRad, double ratedCurrentA, double holdingTorqueNm, double detentTorqueNm,
                       double rotorInertiaKgM2, double loadInertiaKgM2, double dampingNmsPerRad, double insulationOhm,
                       double accelRadiusM, double accelNoiseG, double handTurnRpm, List<Fault> faults) {

    public Scenario {
        faults = faults == null ? List.of() : List.copyOf(faults);
        if (description == null) {
            description = "";
        }
        if (leads != 4 && leads != 6 && leads != 8) {
            throw new IllegalArgumentException("leads must be 4, 6 or 8, got " + leads);
        }
        if (rotorTeeth != 50 && rotorTeeth != 100) {
            throw new IllegalArgumentException("rotor_teeth must be 50 or 100, got " + rotorTeeth);
        }
        if (leadLabels == null || leadLabels.size() != leads) {
            throw new IllegalArgumentException("lead_labels must name " + leads + " leads");
        }
        leadLabels = List.copyOf(leadLabels);
        positive("half_winding_ohm", halfWindingOhm, "ohm");
        positive("half_winding_h", halfWindingH, "H");
        if (!(coupling >= 0 && coupling <= 1)) {
            throw new IllegalArgumentException("coupling must be 0..1, got " + coupling);
        }
        positive("ke_vs_per_rad", keVsPerRad, "V·s/rad");
        positive("rated_current_a", ratedCurrentA, "A");
        positive("holding_torque_nm", holdingTorqueNm, "N·m");
        nonNegative("detent_torque_nm", detentTorqueNm, "N·m");
        positive("rotor_inertia_kg_m2", rotorInertiaKgM2, "kg·m²");
        nonNegative("load_inertia_kg_m2", loadInertiaKgM2, "kg·m²");
        nonNegative("damping_nms_per_rad", dampingNmsPerRad, "N·m·s/rad");
        positive("insulation_ohm", insulationOhm, "ohm");
        positive("accel_radius_m", accelRadiusM, "m");
        nonNegative("accel_noise_g", accelNoiseG, "g");
        positive("hand_turn_rpm", handTurnRpm, "rev/min");
    }

    /** The same motor with another seed (another lead shuffle and other noise). */
    public Scenario withSeed(long newSeed) {
        return new Scenario(description, newSeed, serial, leads, rotorTeeth, shuffleLeads, leadLabels, halfWindingOhm,
                halfWindingH, coupling, keVsPerRad, ratedCurrentA, holdingTorqueNm, detentTorqueNm, rotorInertiaKgM2,
                loadInertiaKgM2, dampingNmsPerRad, insulationOhm, accelRadiusM, accelNoiseG, handTurnRpm, faults);
    }

    /** Rotor plus load inertia, kg·m². */
    public double totalInertiaKgM2() {
        return rotorInertiaKgM2 + loadInertiaKgM2;
    }

    private static void positive(String name, double v, String unit) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(name + " must be positive and finite, got " + v + " " + unit);
        }
    }

    private static void nonNegative(String name, double v, String unit) {
        if (!(v >= 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(name + " must be zero or positive, got " + v + " " + unit);
        }
    }

    /**
     * A fault built into the motor.
     *
     * @param kind     {@code open} (half-winding broken), {@code shorted-turns} (a fraction of a half-winding's
     *                 turns shorted), {@code leakage} (resistance between phase A and phase B),
     *                 {@code low-insulation} (a half-winding's insulation to the frame), {@code swapped-leads}
     *                 (two lead labels exchanged: the colour code lies)
     * @param winding  {@code A1}, {@code A2}, {@code B1} or {@code B2} (not used by leakage and swapped-leads)
     * @param fraction fraction of turns shorted, 0..1 (shorted-turns)
     * @param ohm      leakage or insulation resistance, ohm
     * @param labels   the two lead indices (1-based, in lead_labels order) whose labels are exchanged
     */
    public record Fault(String kind, String winding, double fraction, double ohm, List<Integer> labels) {
        public Fault {
            if (!List.of("open", "shorted-turns", "leakage", "low-insulation", "swapped-leads").contains(kind)) {
                throw new IllegalArgumentException("fault kind '" + kind
                        + "' is not open, shorted-turns, leakage, low-insulation or swapped-leads");
            }
            labels = labels == null ? List.of() : List.copyOf(labels);
        }
    }
}
