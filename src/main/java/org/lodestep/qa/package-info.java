/**
 * Incoming inspection: part specs, check verdicts, the record store (SQLite or PostgreSQL) and lot statistics.
 * Consumes results of {@code wiring} and {@code motor} (copper temperature correction from {@code wiring}) and
 * judges {@link org.lodestep.wiring.InsulationReading}, whether the rig or a hand-held tester took it; reads
 * its own small inputs (part specs, meter logs) with {@code sample}'s error type; the only package that speaks SQL.
 */
package org.lodestep.qa;
