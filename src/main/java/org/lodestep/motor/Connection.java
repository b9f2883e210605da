package org.lodestep.motor;

/** How the coils of each phase are connected to a driver. */
public enum Connection {
    /** Bipolar, both coils of a phase in series aiding (8-lead, or 6-lead end to end). */
    SERIES,
    /** Bipolar, both coils of a phase in parallel (8-lead only). */
    PARALLEL,
    /** Bipolar on one coil per phase (6-lead end to centre tap, or one coil of an 8-lead motor). */
    HALF,
    /** Unipolar: centre taps (or joined coil ends) to the supply, four coil ends switched. */
    UNIPOLAR
}
