/**
 * Works out a motor's windings, centre taps and driver connections from lead-pair resistances.
 * Pure computation; may use {@code signal}; never reads files or talks to a rig.
 */
package org.lodestep.wiring;
