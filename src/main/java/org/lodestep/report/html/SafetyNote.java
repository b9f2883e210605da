package org.lodestep.report.html;

/**
 * The cautions a report prints where its work can hurt someone. Wording is ours and general; each note defers to
 * local codes, the site's procedures and licensed practice, which take precedence.
 */
public enum SafetyNote {
    /** Insulation-resistance tests at hundreds of volts. */
    INSULATION_TEST("Insulation tests use hundreds of volts",
            "An insulation tester applies 250\u20131000 V DC between windings and frame. Test only a motor that is "
            + "disconnected from its driver and from every other circuit, keep hands off the leads and the frame while "
            + "the tester is on, and discharge the winding to the frame (the tester's discharge function or a "
            + "suitable resistor) for at least as long as the voltage was applied before touching a lead. "
            + "Follow local electrical codes, the site's procedures and licensed practice; they take precedence "
            + "over this note."),
    /** Energised coils: stored energy and inductive kick. */
    ENERGISED_COILS("Energised windings",
            "A winding carrying current stores energy and kicks back a high voltage when the circuit opens. Connect "
            + "and disconnect leads only with the driver or supply switched off and its capacitors discharged; never "
            + "unplug a motor from a running driver, which can destroy the driver and arc at the connector. "
            + "Use a current-limited supply for step-response tests. Local codes and licensed practice take "
            + "precedence over this note."),
    /** Step-rate sweeps on a moving axis. */
    MOVING_AXIS("Sweeps move the axis",
            "A step-rate sweep or ring-down test turns the motor and moves whatever it drives, and a motor that "
            + "stalls at a resonance can let a vertical load fall. Clamp or remove the load or brake vertical axes, "
            + "clear the travel and keep hands out of it, check the end stops and keep an emergency stop within "
            + "reach before starting. Follow the machine's lock-out procedure, local codes and licensed practice; "
            + "they take precedence over this note."),
    /** Hot motor housings after running. */
    HOT_MOTOR("Hot motors",
            "Stepper motors run hot by design: a housing at 80\u2013100 \u00B0C is normal at rated current and burns "
            + "skin. Let the motor cool or use gloves before handling it after a run or a hold test, and allow for "
            + "the winding temperature when comparing resistances with a specification.");

    private final String title;
    private final String text;

    SafetyNote(String title, String text) {
        this.title = title;
        this.text = text;
    }

    /** A short heading. */
    public String title() {
        return title;
    }

    /** The caution itself, in plain sentences. */
    public String text() {
        return text;
    }
}
