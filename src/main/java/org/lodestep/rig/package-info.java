/**
 * Talks to a bench rig: the line protocol, its transports (serial, TCP, in-process) and the virtual rig.
 * May use {@code capture} to write captures; never analyses what it measures.
 */
package org.lodestep.rig;
