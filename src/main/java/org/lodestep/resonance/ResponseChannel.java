package org.lodestep.resonance;

/** What the analysed channel of a sweep measures, which decides how bands and lost steps are read from it. */
public enum ResponseChannel {
    /** An accelerometer, velocity probe or microphone on the motor or its load. */
    VIBRATION,
    /** A phase current under a constant-voltage (L/R) drive: the rotor's oscillation shows through its back-EMF. */
    CURRENT_CONSTANT_VOLTAGE,
    /** A phase current under a current-regulating chopper, which holds the current and hides the rotor's motion. */
    CURRENT_CHOPPER;

    /** Whether the channel is a phase current. */
    public boolean isCurrent() {
        return this != VIBRATION;
    }

    /** The period, in full steps, over which a locked response repeats: 2 for vibration, 4 (one electrical cycle) for a current. */
    double synchronousPeriodFullSteps() {
        return this == VIBRATION ? 2 : 4;
    }
}
