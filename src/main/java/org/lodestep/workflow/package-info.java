/**
 * Use cases, one class each, that tie the domains together so every front end (the command line, the bench
 * station) calls the same code: take settings records, read captures or drive a rig, analyse, and return result
 * records; report progress through {@link org.lodestep.workflow.Progress}, never by printing. May use every engine
 * package ({@code sample}, {@code capture}, {@code rig}, {@code signal}, {@code wiring}, {@code motor},
 * {@code resonance}, {@code drive}, {@code qa}); never picocli, exit codes or rendering.
 */
package org.lodestep.workflow;
