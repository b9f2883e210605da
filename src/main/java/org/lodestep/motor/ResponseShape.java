package org.lodestep.motor;

/** How a current step response departs from a single exponential. */
public enum ResponseShape {
    /** One time constant explains the whole rise. */
    EXPONENTIAL,
    /** The rise speeds up as the current grows: inductance falls with current (iron saturating). */
    SATURATION,
    /** The rise starts faster than it continues: eddy currents in the iron lower the inductance at first. */
    EDDY_CURRENT
}
