/**
 * Talks to a bench rig: the line protocol of {@code firmware-protocol.md}, its transports (serial, TCP, in-process)
 * and the virtual rig with its motor physics. Produces {@code sample}'s channel and signal types; measures and streams,
 * never analyses what it measured. Entry points: {@link org.lodestep.rig.RigClient}, {@link org.lodestep.rig.Transports},
 * {@link org.lodestep.rig.VirtualRig}, {@link org.lodestep.rig.Scenarios}.
 *
 * <p>Rig physics is an independent oracle: the virtual rig's motor ({@code BenchMotor}, {@code WindingNetwork},
 * {@code RotorDynamics}) computes its own physics from the textbook relations rather than calling the analysis
 * packages, so that an error in an analysis formula cannot hide by being simulated the same way. Tests check each
 * simulated relation against the engine's formula class; for the RL current step, {@code BenchMotorTest} against
 * {@code motor.RlStep}.
 */
package org.lodestep.rig;
