/**
 * Electrical and magnetic identification of a motor: inductance, back-EMF phasing, step angle and constants.
 * May use {@code signal} and {@code wiring}; never reads files or talks to a rig.
 */
package org.lodestep.motor;
