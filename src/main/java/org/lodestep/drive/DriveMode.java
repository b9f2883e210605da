package org.lodestep.drive;

/** How the driver feeds each phase. */
public enum DriveMode {
    /** Current-regulating chopper: holds the set current until the supply can no longer force it in. */
    CHOPPER,
    /** Constant-voltage H-bridge: the supply (through any series resistor) straight across the winding. */
    CONSTANT_VOLTAGE
}
