/**
 * Drive performance and motion planning: the pull-out torque a motor has at each speed on a given driver and
 * supply, whether a load reaches its target speed with margin, and motion profiles that respect that torque and
 * cross resonance bands quickly, with their step-rate table export. May use {@code motor} (constants, step
 * geometry), {@code resonance} (avoid-list types, rate units) and {@code signal}; never reads files or talks to a rig.
 */
package org.lodestep.drive;
