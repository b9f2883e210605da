/**
 * Electrical, magnetic and mechanical constants of a motor: inductance, back-EMF phasing, step geometry, constants,
 * the rotor's natural frequency and the motor card. May use {@code signal} and {@code wiring}; never reads files or
 * talks to a rig.
 */
package org.lodestep.motor;
