/**
 * Talks to a bench rig: the line protocol of {@code firmware-protocol.md}, its transports (serial, TCP, in-process)
 * and the virtual rig with its motor physics. Produces {@code sample}'s channel and signal types; measures and streams,
 * never analyses what it measured. Entry points: {@link org.lodestep.rig.RigClient}, {@link org.lodestep.rig.Transports},
 * {@link org.lodestep.rig.VirtualRig}, {@link org.lodestep.rig.Scenarios}.
 *
 * <p>The virtual rig's physics is an independent oracle, on purpose: it integrates the motor's equations of motion and
 * circuits itself (rotor dynamics, winding network, current responses) and does not call the engine's formulas in
 * {@code motor} or {@code resonance}, so an engine bug cannot hide by appearing on both sides of an end-to-end test.
 * Where the oracle states a closed form the engine also has (the rotor's small-oscillation natural frequency in
 * {@code RotorDynamics} against {@code motor.NaturalFrequency}), a test checks the two against each other and against
 * the integrated motion; so is the RL current step of {@code BenchMotor} against {@code motor.RlStep}
 * ({@code BenchMotorTest}). Depends on {@code sample} and the domain types it produces
 * ({@code wiring.InsulationReading}, {@code drive.DriveMode}); never on {@code qa}, which judges what it measures.
 */
package org.lodestep.rig;
