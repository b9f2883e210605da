/**
 * Works out a motor's windings, centre taps and driver connections from lead-pair resistances.
 * Pure computation; may use {@code signal}; never reads files or talks to a rig. Also the home of the vocabulary
 * every analysis shares: {@link org.lodestep.wiring.Finding} with its {@link org.lodestep.wiring.Severity},
 * {@link org.lodestep.wiring.Connection} (series, parallel, half, unipolar, with the one table of their factors) and
 * {@link org.lodestep.wiring.LeadPair} (the unordered pair a resistance is read across) and
 * {@link org.lodestep.wiring.InsulationReading} (a winding's insulation resistance at a test voltage).
 */
package org.lodestep.wiring;
