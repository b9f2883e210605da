/**
 * Finds step rates at which a motor and its load resonate, fits ring-downs and turns natural frequencies into
 * rates to avoid. May use {@code signal} and the motor's physics in {@code motor}; never reads files or talks to a
 * rig.
 */
package org.lodestep.resonance;
