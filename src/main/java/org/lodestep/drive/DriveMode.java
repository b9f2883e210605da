package org.lodestep.drive;

/** How a step drive feeds each phase winding; the drive model and the virtual rig's simulation share it. */
public enum DriveMode {
    /**
     * A current-regulating chopper: the bridge switches the supply to hold the commanded current, as far as the
     * supply voltage allows (modelled by its switching-period average; ripple not modelled).
     */
    CHOPPER,
    /**
     * An H-bridge that switches the supply voltage (through any series resistor) straight onto the winding (L/R
     * drive): the current follows the winding's R-L response and falls with speed as back-EMF and inductance take over.
     */
    CONSTANT_VOLTAGE
}
