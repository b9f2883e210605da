/**
 * Electrical and magnetic identification of a motor: inductance, back-EMF phasing, step angle and constants.
 * May use {@code signal}, {@code wiring} and the natural-frequency formula of {@code resonance}; never reads files
 * or talks to a rig.
 */
package org.lodestep.motor;
