/**
 * Incoming inspection: part specs, check verdicts, the record store (SQLite or PostgreSQL) and lot statistics.
 * Consumes results of {@code wiring} and {@code motor}; the only package that speaks SQL.
 */
package org.lodestep.qa;
