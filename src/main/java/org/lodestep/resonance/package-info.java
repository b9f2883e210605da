/**
 * Finds step rates at which a motor and its load resonate, fits ring-downs and predicts natural frequencies.
 * May use {@code signal}; never reads files or talks to a rig.
 */
package org.lodestep.resonance;
