package org.lodestep.safety;

import java.util.List;

/**
 * What bench work on a stepper motor can do to a person, each with its caution in plain sentences. The wording is
 * ours and general, the usual cautions of the trade; the cautions of live work (test voltages, energised windings, a
 * moving axis) end by deferring to local codes, the site's procedures and licensed practice, which take precedence.
 */
public enum Hazard {
    /** Insulation-resistance tests at hundreds of volts. */
    INSULATION_TEST("Insulation tests use hundreds of volts", List.of(
            "An insulation test applies hundreds of volts DC (250 to 1000 V is usual) between a winding and the motor"
                    + " frame.",
            "Disconnect the motor from its driver and from every other circuit first, and test on an insulated bench,"
                    + " away from flammable vapour.",
            "Nobody touches the leads, the frame or the test clips while the voltage is on.",
            "Discharge the winding to the frame (the tester's or rig's discharge function, or a suitable resistor)"
                    + " for at least as long as the voltage was applied before anyone touches a lead."),
            Hazard.ELECTRICAL_CODES),
    /** Energised windings: stored energy and the inductive kick. */
    ENERGISED_WINDING("Energised windings", List.of(
            "A winding carrying current stores energy and kicks back a high voltage when the circuit opens.",
            "Connect and disconnect leads only with the driver or supply off and its capacitors discharged; unplugging"
                    + " a motor from a running driver can destroy the driver and arc at the connector.",
            "Use a current-limited supply for step-response tests."),
            Hazard.ELECTRICAL_CODES),
    /** Sweeps, ring-downs and motion profiles on a moving axis. */
    MOVING_AXIS("A sweep moves the axis", List.of(
            "A sweep, a ring-down test or a motion profile turns the motor and moves whatever it drives; at a"
                    + " resonance it can stall, jump or run away, and a motor that loses steps can jerk, stall and"
                    + " restart.",
            "Clear the travel, fit the guards, check the end stops, keep hands, hair and loose items away from belts,"
                    + " pulleys, screws and couplings, and keep an emergency stop within reach.",
            "A vertical axis can drop when the motor stalls or the drive is switched off: brake, counterweight or"
                    + " clamp the load, or remove it, before testing.",
            "Set the drive's current limit to the motor's rating, and try a new profile at reduced speed and current"
                    + " first."),
            "Follow the machine's lock-out procedure, local electrical and machine-safety codes and your site's"
                    + " licensed practice; they take precedence over anything printed here."),
    /** Hot housings after running. */
    HOT_MOTOR("Hot motors", List.of(
            "Stepper motors run hot by design (a housing at 80 to 100 \u00B0C is normal at rated current, and a"
                    + " stalled motor still carries its full current): let the motor and driver cool, or wear gloves,"
                    + " before handling them after a run or a hold test."), null),
    /** A shaft turned by hand or by the load makes the motor a generator. */
    TURNED_SHAFT("A turning shaft makes voltage", List.of(
            "Turning the shaft generates voltage at the leads, more the faster it turns: keep the leads apart and"
                    + " disconnected from any driver while it turns."), null);

    private static final String ELECTRICAL_CODES = "Local electrical codes, the site's procedures and licensed"
            + " practice take precedence.";

    private final String title;
    private final List<String> sentences;
    private final String deferral;

    Hazard(String title, List<String> sentences, String deferral) {
        this.title = title;
        this.sentences = sentences;
        this.deferral = deferral;
    }

    /** A short heading. */
    public String title() {
        return title;
    }

    /** What to do, one sentence each, without the deferral. */
    public List<String> sentences() {
        return sentences;
    }

    /** The sentence deferring to local codes and licensed practice, or null where the work needs none. */
    public String deferral() {
        return deferral;
    }

    /** The whole caution as one paragraph: the sentences, then the deferral. */
    public String text() {
        return deferral == null ? String.join(" ", sentences) : String.join(" ", sentences) + " " + deferral;
    }
}
