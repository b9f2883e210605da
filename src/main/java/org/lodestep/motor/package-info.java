/**
 * Electrical, magnetic and mechanical constants of a motor: inductance, back-EMF phasing, step geometry, constants,
 * the rotor's natural frequency and the motor card. May use {@code signal} and {@code wiring}, whose finding,
 * severity and connection types it shares (its own finding codes are {@link org.lodestep.motor.MotorFindingCode}; a
 * coil's ordered leads are {@link org.lodestep.motor.OrientedLeads}); never reads files or talks to a rig. What the
 * card leaves unknown is a coded {@link org.lodestep.motor.Unknown}, never text naming a front end's options.
 */
package org.lodestep.motor;
