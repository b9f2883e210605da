/**
 * Talks to a bench rig: the line protocol of {@code firmware-protocol.md}, its transports (serial, TCP, in-process)
 * and the virtual rig with its motor physics. Produces {@code sample}'s channel and signal types; measures and streams,
 * never analyses what it measured. Entry points: {@link org.lodestep.rig.RigClient}, {@link org.lodestep.rig.Transports},
 * {@link org.lodestep.rig.VirtualRig}, {@link org.lodestep.rig.Scenarios}.
 */
package org.lodestep.rig;
